import type { PhaseGridRows } from "./phase-grid-rows.ts";
import { SINGLE_PHASE_TOLERANCES } from "./property-tolerances.ts";
import type { CompiledPhaseGrid } from "./single-phase-registry.ts";

/** Node j of the row interpolated at the query pressure (no closures: this runs on every lookup). */
function rowValue(
  array: Float64Array,
  weights: PhaseGridRows["weights"],
  start: number,
  columns: number,
  j: number,
): number {
  // phaseGridRows keeps start ≤ rows − 4 and callers pass j < columns: all four cells are in the grid.
  return (
    weights[0] * array[start * columns + j]! +
    weights[1] * array[(start + 1) * columns + j]! +
    weights[2] * array[(start + 2) * columns + j]! +
    weights[3] * array[(start + 3) * columns + j]!
  );
}

/**
 * Reduced temperature r at which one phase grid, at a fixed pressure, has a given enthalpy or
 * entropy: the inverse of interpolatePhaseGrid along r. Both rise with temperature at constant
 * pressure (c_p > 0), so along r they rise for the vapour (r grows with T) and fall for the
 * liquid (r grows as T falls). The node interval comes from a binary search on the node values
 * of the interpolated row; inside it the Hermite cubic is solved by Newton's method kept inside
 * the interval by bisection.
 *
 * @param grid compiled phase grid
 * @param rows window and weights from phaseGridRows at the pressure
 * @param property "enthalpy" (kJ/kg) or "entropy" (kJ/(kg·K))
 * @param target the value sought
 * @returns r in [0, 1]; "saturation-side" when the value lies beyond the saturation curve (in the
 *   dome or the other phase); "beyond-bound" when it lies past the far temperature bound by more
 *   than the table's promised error (within it, the bound: r = 1)
 * @throws never
 * @example invertPhaseGrid(r32.vapour, phaseGridRows(r32.vapour, 1000), "enthalpy", 560) // ≈ 0.2469
 */
export function invertPhaseGrid(
  grid: CompiledPhaseGrid,
  rows: PhaseGridRows,
  property: "enthalpy" | "entropy",
  target: number,
): number | "saturation-side" | "beyond-bound" {
  const values = property === "enthalpy" ? grid.enthalpy : grid.entropy;
  const slopes = property === "enthalpy" ? grid.enthalpyByR : grid.entropyByR;
  const { columns, nodes } = grid;
  const direction = grid.phase === "vapour" ? 1 : -1;
  const { start, weights } = rows;
  // g rises with r: g(r) = direction · (value(r) − target)
  if (direction * (rowValue(values, weights, start, columns, 0) - target) > 0) return "saturation-side";
  // A value past the far bound by less than the table's own error is the bound itself.
  const last = direction * (rowValue(values, weights, start, columns, columns - 1) - target);
  if (last < 0)
    return -last <= SINGLE_PHASE_TOLERANCES[property === "enthalpy" ? "enthalpyKJPerKg" : "entropyKJPerKgK"]
      ? 1
      : "beyond-bound";
  let low = 0;
  let high = columns - 1;
  while (high - low > 1) {
    const middle = (low + high) >> 1;
    if (direction * (rowValue(values, weights, start, columns, middle) - target) <= 0) low = middle;
    else high = middle;
  }
  // 0 ≤ low < high ≤ columns − 1: both are nodes.
  const width = nodes[high]! - nodes[low]!;
  const v0 = rowValue(values, weights, start, columns, low) - target;
  const v1 = rowValue(values, weights, start, columns, high) - target;
  const m0 = rowValue(slopes, weights, start, columns, low) * width;
  const m1 = rowValue(slopes, weights, start, columns, high) * width;
  // Newton on the Hermite cubic in t ∈ [0, 1] (minus the target), kept inside the bracket.
  let lowT = 0;
  let highT = 1;
  let t = v0 === v1 ? 0 : v0 / (v0 - v1);
  for (let iteration = 0; iteration < 40; iteration++) {
    const t2 = t * t;
    const t3 = t2 * t;
    const value = (2 * t3 - 3 * t2 + 1) * v0 + (t3 - 2 * t2 + t) * m0 + (-2 * t3 + 3 * t2) * v1 + (t3 - t2) * m1;
    const slope = (6 * t2 - 6 * t) * (v0 - v1) + (3 * t2 - 4 * t + 1) * m0 + (3 * t2 - 2 * t) * m1;
    if (direction * value <= 0) lowT = t;
    else highT = t;
    let next = slope !== 0 ? t - value / slope : Number.NaN;
    // Converged: checked before the bracket, since at the root Newton lands on a bracket end.
    if (Math.abs(next - t) < 1e-12) {
      t = Math.min(Math.max(next, 0), 1);
      break;
    }
    if (!(next > lowT && next < highT)) next = 0.5 * (lowT + highT);
    t = next;
  }
  return nodes[low]! + t * width; // low is a node (above)
}
