/**
 * Registry of the generated refrigerant tables. The JSON files are imported
 * statically (refrigerant-table-files.ts, written by `npm run tables`), so the
 * same code works in the browser bundle, the server and tests with no I/O.
 * Each table is validated with its zod schema and compiled into typed arrays the
 * first time it is used; later lookups are a Map hit.
 */
import { PropertyRangeError } from "./property-range-error.ts";
import { REFRIGERANT_TABLE_FILES } from "./refrigerant-table-files.ts";
import { RefrigerantTableSchema, type RefrigerantTable } from "./refrigerant-table-schema.ts";

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

const rawById = new Map<string, unknown>();
for (const raw of REFRIGERANT_TABLE_FILES) {
  const id = (raw as { id?: unknown }).id;
  if (typeof id === "string") rawById.set(id, raw);
}
const compiledById = new Map<string, CompiledRefrigerant>();

/** Every refrigerant id with a table, in file order. */
export const REFRIGERANT_IDS: readonly string[] = [...rawById.keys()];

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

function uniformGrid(temperatureC: Float64Array): { gridStart: number; gridStep: number } {
  const n = temperatureC.length;
  if (n < 4) return { gridStart: temperatureC[0]!, gridStep: 0 };
  const step = temperatureC[2]! - temperatureC[1]!;
  for (let i = 2; i < n - 1; i++) {
    if (Math.abs(temperatureC[i]! - temperatureC[i - 1]! - step) > 1e-9)
      return { gridStart: temperatureC[0]!, gridStep: 0 };
  }
  return { gridStart: temperatureC[1]!, gridStep: step };
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
    ...uniformGrid(temperatureC),
    bubble: compileCurve(columns.bubblePressure, columns.bubbleSlope),
    dew: compileCurve(columns.dewPressure, columns.dewSlope),
    liquidDensity: Float64Array.from(columns.liquidDensity),
    vapourDensity: Float64Array.from(columns.vapourDensity),
    liquidEnthalpy: Float64Array.from(columns.liquidEnthalpy),
    vapourEnthalpy: Float64Array.from(columns.vapourEnthalpy),
    minimumC: temperatureC[0]!,
    maximumC: temperatureC[temperatureC.length - 1]!,
  };
}

/**
 * Resolve a refrigerant id to its compiled table.
 *
 * @param id ASHRAE designation as in the table file names, e.g. "R32", "R1234ze(E)" (exact spelling)
 * @returns the compiled table (cached)
 * @throws PropertyRangeError UNKNOWN_REFRIGERANT for an id without a table; INVALID_TABLE when the file fails its schema
 * @example resolveRefrigerant("R32").maximumC // 78.005
 */
export function resolveRefrigerant(id: string): CompiledRefrigerant {
  const cached = compiledById.get(id);
  if (cached) return cached;
  const raw = rawById.get(id);
  if (raw === undefined) {
    throw new PropertyRangeError(
      "UNKNOWN_REFRIGERANT",
      String(id),
      `${String(id)} is not a refrigerant Satura has tables for (known: ${REFRIGERANT_IDS.join(", ")})`,
    );
  }
  const compiled = compile(id, raw);
  compiledById.set(id, compiled);
  return compiled;
}
