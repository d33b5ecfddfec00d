/**
 * Registry of the saturation tables. No table is imported statically: `loadRefrigerant` fetches
 * one refrigerant's JSON (its own chunk in the browser; README decision "Saturation tables loaded per refrigerant") and registers it
 * here, where it is validated with its zod schema and compiled into typed arrays once; every
 * lookup after that is synchronous, a Map hit. A lookup before its table is loaded throws
 * TABLE_NOT_LOADED, naming the call that fixes it.
 */
import { PropertyRangeError } from "./property-range-error.ts";
import { RefrigerantTableSchema, type RefrigerantTable } from "./refrigerant-table-schema.ts";
import { SATURATION_TABLE_IMPORTS } from "./saturation-table-imports.ts";

/** Refrigerant metadata: everything in a table except its rows. */
export type RefrigerantInfo = Readonly<Omit<RefrigerantTable, "columns" | "units" | "interpolation">>;

/** One saturation curve (bubble or dew) prepared for cubic Hermite interpolation of p against T. */
export interface CompiledCurve {
  /** kPa absolute, strictly increasing */
  readonly pressure: Float64Array;
  /** dp/dT in kPa/K */
  readonly slope: Float64Array;
  /** dT/dp in K/kPa (for the inverse interpolation) */
  readonly inverseSlope: Float64Array;
}

export interface CompiledRefrigerant {
  readonly info: RefrigerantInfo;
  readonly units: RefrigerantTable["units"];
  readonly rowCount: number;
  /** °C, strictly increasing */
  readonly temperatureC: Float64Array;
  /**
   * Rows 1 … n−2 lie on a uniform grid (the first and last rows sit at the triple
   * point / −60 °C and just below critical); this lets lookups find the interval by
   * direct index instead of a search. gridStep is 0 when the table is not uniform.
   */
  readonly gridStart: number;
  readonly gridStep: number;
  readonly bubble: CompiledCurve;
  readonly dew: CompiledCurve;
  readonly liquidDensity: Float64Array;
  readonly vapourDensity: Float64Array;
  readonly liquidEnthalpy: Float64Array;
  readonly vapourEnthalpy: Float64Array;
  readonly minimumC: number;
  readonly maximumC: number;
}

/**
 * Loaded tables by refrigerant id, as loaded and once compiled (module state: caches filled by
 * loadRefrigerant). A table is validated and compiled on its first lookup, so loading all of
 * them at a server's or a test's start costs only the import.
 */
const rawById = new Map<string, unknown>();
const compiledById = new Map<string, CompiledRefrigerant>();

/** Every refrigerant id with a table, loaded or not, in file order. */
export const REFRIGERANT_IDS: readonly string[] = Object.keys(SATURATION_TABLE_IMPORTS);

/** Whether Satura has a table for this id (exact spelling). */
export function isKnownRefrigerantId(id: string): boolean {
  return Object.hasOwn(SATURATION_TABLE_IMPORTS, id);
}

/** The error for an id Satura has no saturation table for (UNKNOWN_REFRIGERANT), naming the known ones. */
export function unknownRefrigerantError(id: string): PropertyRangeError {
  return new PropertyRangeError(
    "UNKNOWN_REFRIGERANT",
    String(id),
    `${String(id)} is not a refrigerant Satura has tables for (known: ${REFRIGERANT_IDS.join(", ")})`,
  );
}

function deepFreeze<T>(value: T): T {
  if (value && typeof value === "object") {
    for (const inner of Object.values(value)) deepFreeze(inner);
    Object.freeze(value);
  }
  return value;
}

function compileCurve(pressure: number[], slope: number[]): CompiledCurve {
  return {
    pressure: Float64Array.from(pressure),
    slope: Float64Array.from(slope),
    inverseSlope: Float64Array.from(slope, (dpdT) => 1 / dpdT),
  };
}

/**
 * Rows one step apart, from the second to the second-last (the end intervals may be shorter),
 * let a lookup compute its row instead of searching for it: their start and step, or step 0
 * when they are not evenly spaced or too few to tell.
 */
function uniformGrid(temperatureC: readonly number[], minimumC: number): { gridStart: number; gridStep: number } {
  const notUniform = { gridStart: minimumC, gridStep: 0 };
  const [start, ...rest] = temperatureC.slice(1, -1);
  const second = rest[0];
  if (start === undefined || second === undefined) return notUniform;
  const step = second - start;
  let previous = start;
  for (const value of rest) {
    if (Math.abs(value - previous - step) > 1e-9) return notUniform;
    previous = value;
  }
  return { gridStart: start, gridStep: step };
}

function compile(id: string, raw: unknown): CompiledRefrigerant {
  const parsed = RefrigerantTableSchema.safeParse(raw);
  if (!parsed.success) {
    throw new PropertyRangeError(
      "INVALID_TABLE",
      id,
      `The ${id} table is damaged: ${parsed.error.issues[0]?.message ?? "schema check failed"}`,
    );
  }
  const { columns, units, interpolation: _interpolation, ...metadata } = parsed.data;
  const temperatureC = Float64Array.from(columns.temperature);
  const info = deepFreeze(metadata);
  return {
    info,
    units,
    rowCount: temperatureC.length,
    temperatureC,
    ...uniformGrid(columns.temperature, metadata.validRange.minimumC),
    bubble: compileCurve(columns.bubblePressure, columns.bubbleSlope),
    dew: compileCurve(columns.dewPressure, columns.dewSlope),
    liquidDensity: Float64Array.from(columns.liquidDensity),
    vapourDensity: Float64Array.from(columns.vapourDensity),
    liquidEnthalpy: Float64Array.from(columns.liquidEnthalpy),
    vapourEnthalpy: Float64Array.from(columns.vapourEnthalpy),
    // The schema holds the first and last rows to the valid range.
    minimumC: metadata.validRange.minimumC,
    maximumC: metadata.validRange.maximumC,
  };
}

/**
 * Register a loaded saturation table (the parsed JSON of data/refrigerants/<id>.json) so that
 * the lookups can use it; it is validated and compiled on first use. Registering the same
 * refrigerant again replaces the table.
 *
 * @param raw the table as loaded (unknown until validated)
 * @returns the refrigerant id
 * @throws PropertyRangeError UNKNOWN_REFRIGERANT for an id Satura has no table for
 * @example registerRefrigerantTable((await import("data/refrigerants/R32.json")).default) // "R32"
 */
export function registerRefrigerantTable(raw: unknown): string {
  const id = String((raw as { id?: unknown } | null)?.id ?? "unknown");
  if (!isKnownRefrigerantId(id)) throw unknownRefrigerantError(id);
  rawById.set(id, raw);
  compiledById.delete(id);
  return id;
}

/** Whether a refrigerant's saturation table is loaded, so that its lookups run synchronously. */
export function isRefrigerantTableLoaded(id: string): boolean {
  return rawById.has(id);
}

/**
 * Resolve a refrigerant id to its compiled table.
 *
 * @param id ASHRAE designation as in the table file names, e.g. "R32", "R1234ze(E)" (exact spelling)
 * @returns the compiled table (cached)
 * @throws PropertyRangeError UNKNOWN_REFRIGERANT for an id without a table; TABLE_NOT_LOADED when its table has not been loaded yet (`await loadRefrigerant(id)` first)
 * @example (await loadRefrigerant("R32"), resolveRefrigerant("R32").maximumC) // 78.005
 */
export function resolveRefrigerant(id: string): CompiledRefrigerant {
  const cached = compiledById.get(id);
  if (cached) return cached;
  const raw = rawById.get(id);
  if (raw !== undefined) {
    const compiled = compile(id, raw);
    compiledById.set(id, compiled);
    return compiled;
  }
  if (!isKnownRefrigerantId(id)) throw unknownRefrigerantError(id);
  throw new PropertyRangeError(
    "TABLE_NOT_LOADED",
    id,
    `The ${id} saturation table is not loaded: await loadRefrigerant("${id}") before using it`,
  );
}
