import type { CompiledPhaseGrid } from "./single-phase-registry.ts";

export interface PhaseGridRows {
  start: number;
  weights: [number, number, number, number];
}

/**
 * The four rows of a single-phase grid around a pressure and their cubic Lagrange weights in
 * the row coordinate y = ln(p / (1 − p/p_s)) (rows are uniform in y; at the ends the window of
 * four rows shifts inwards).
 * Source: four-point Lagrange interpolation, e.g. Abramowitz & Stegun 25.2.13.
 *
 * @param grid compiled phase grid (at least 4 rows)
 * @param pressureKPa kPa absolute, inside the grid's rows (the caller checks the range)
 * @returns first row of the window and the weights of its four rows (they sum to 1)
 * @throws never
 * @example phaseGridRows(grid, grid.minimumPressureKPa).weights // [1, 0, 0, 0] (to rounding)
 */
export function phaseGridRows(grid: CompiledPhaseGrid, pressureKPa: number): PhaseGridRows {
  const coordinate = Math.log(pressureKPa) - Math.log1p(-pressureKPa / grid.pressureScaleKPa);
  const position = (coordinate - grid.coordinateStart) / grid.coordinateStep;
  const start = Math.min(Math.max(Math.floor(position) - 1, 0), grid.rows - 4);
  const x = position - start;
  const a = x - 1;
  const b = x - 2;
  const c = x - 3;
  return {
    start,
    weights: [(-a * b * c) / 6, (x * b * c) / 2, (-x * a * c) / 2, (x * a * b) / 6],
  };
}
