/**
 * Registry of single-phase tables. Unlike the saturation tables these are never imported
 * statically: a caller loads a refrigerant's table (the browser with a dynamic import, the
 * server and tests likewise; see shared/property-tables) and registers it here, and the
 * lookups then run synchronously. The engine itself does no I/O.
 *
 * A registered table is validated with its zod schema and compiled into typed arrays, with the
 * node derivatives already scaled to the reduced temperature of each row.
 */
import { PropertyRangeError } from "./property-range-error.ts";
import { KELVIN_OFFSET } from "./property-tolerances.ts";
import { SinglePhaseTableSchema, type SinglePhaseGrid, type SinglePhaseTable } from "./single-phase-table-schema.ts";

export type SinglePhase = "liquid" | "vapour";

export interface CompiledPhaseGrid {
  readonly phase: SinglePhase;
  readonly rows: number;
  readonly columns: number;
  /** rows are uniform in y = ln(p / (1 − p/p_s)) */
  readonly pressureScaleKPa: number;
  readonly coordinateStart: number;
  readonly coordinateStep: number;
  /** kPa absolute, first and last row */
  readonly minimumPressureKPa: number;
  readonly maximumPressureKPa: number;
  /** °C: highest vapour or lowest liquid temperature */
  readonly boundC: number;
  /** K, per row */
  readonly saturationK: Float64Array;
  readonly nodes: Float64Array;
  /** values (row-major) and their derivatives with respect to the reduced temperature r */
  readonly enthalpy: Float64Array;
  readonly enthalpyByR: Float64Array;
  readonly entropy: Float64Array;
  readonly entropyByR: Float64Array;
  readonly logDensity: Float64Array;
  readonly logDensityByR: Float64Array;
}

export interface CompiledSinglePhaseTable {
  readonly id: string;
  readonly accuracy: SinglePhaseTable["accuracy"];
  readonly source: SinglePhaseTable["source"];
  readonly vapour: CompiledPhaseGrid;
  readonly liquid: CompiledPhaseGrid;
}

/** Registered tables by refrigerant id (module state: a cache, filled by registerSinglePhaseTable). */
export const SINGLE_PHASE_TABLES = new Map<string, CompiledSinglePhaseTable>();

function compileGrid(phase: SinglePhase, grid: SinglePhaseGrid): CompiledPhaseGrid {
  const columns = grid.nodes.length;
  const saturationK = Float64Array.from(grid.saturationC, (c) => c + KELVIN_OFFSET);
  const boundK = grid.boundC + KELVIN_OFFSET;
  const size = grid.rows * columns;
  const enthalpyByR = new Float64Array(size);
  const entropyByR = new Float64Array(size);
  const logDensityByR = new Float64Array(size);
  // The schema checked one value per row and node; a miss here is a damaged table, said loudly.
  const valueAt = (values: readonly number[], k: number): number => {
    const value = values[k];
    if (value === undefined) throw new RangeError(`registerSinglePhaseTable requires a complete ${phase} grid`);
    return value;
  };
  saturationK.forEach((rowK, i) => {
    // dT/dr along a row is its width T_bound − T_sat (negative for the liquid)
    const width = boundK - rowK;
    grid.nodes.forEach((node, j) => {
      const k = i * columns + j;
      const temperatureK = rowK + node * width;
      const enthalpySlope = valueAt(grid.enthalpySlope, k);
      enthalpyByR[k] = enthalpySlope * width;
      // (∂s/∂T)_p = c_p / T
      entropyByR[k] = (enthalpySlope / temperatureK) * width;
      logDensityByR[k] = valueAt(grid.logDensitySlope, k) * width;
    });
  });
  const coordinateEnd = grid.coordinateStart + (grid.rows - 1) * grid.coordinateStep;
  // p from y: e^y = p / (1 − p/p_s)  ⇒  p = e^y / (1 + e^y/p_s)
  const pressureAt = (y: number) => Math.exp(y) / (1 + Math.exp(y) / grid.pressureScaleKPa);
  return {
    phase,
    rows: grid.rows,
    columns,
    pressureScaleKPa: grid.pressureScaleKPa,
    coordinateStart: grid.coordinateStart,
    coordinateStep: grid.coordinateStep,
    minimumPressureKPa: pressureAt(grid.coordinateStart),
    maximumPressureKPa: pressureAt(coordinateEnd),
    boundC: grid.boundC,
    saturationK,
    nodes: Float64Array.from(grid.nodes),
    enthalpy: Float64Array.from(grid.enthalpy),
    enthalpyByR,
    entropy: Float64Array.from(grid.entropy),
    entropyByR,
    logDensity: Float64Array.from(grid.logDensity),
    logDensityByR,
  };
}

/**
 * Register a loaded single-phase table so that singlePhaseState and its inverses can use it.
 * Registering the same refrigerant again replaces the table (a regenerated file in tests).
 *
 * Input: the parsed JSON of data/refrigerants/single-phase/<id>.json. Output: the refrigerant
 * id. Valid for any table written by `npm run tables`.
 * Source: tables generated from the published equations of state (the table's `source`).
 *
 * @param raw the table as loaded (unknown until validated)
 * @returns the id of the registered refrigerant
 * @throws PropertyRangeError INVALID_TABLE when the data fails its schema
 * @example registerSinglePhaseTable((await import("data/refrigerants/single-phase/R32.json")).default) // "R32"
 */
export function registerSinglePhaseTable(raw: unknown): string {
  const parsed = SinglePhaseTableSchema.safeParse(raw);
  if (!parsed.success) {
    const id = String((raw as { id?: unknown } | null)?.id ?? "unknown");
    const issue = parsed.error.issues[0];
    throw new PropertyRangeError(
      "INVALID_TABLE",
      id,
      `The ${id} single-phase table is damaged: ${issue ? `${issue.path.join(".")} ${issue.message}` : "schema check failed"}`,
    );
  }
  const table = parsed.data;
  SINGLE_PHASE_TABLES.set(table.id, {
    id: table.id,
    accuracy: table.accuracy,
    source: table.source,
    vapour: compileGrid("vapour", table.vapour),
    liquid: compileGrid("liquid", table.liquid),
  });
  return table.id;
}
