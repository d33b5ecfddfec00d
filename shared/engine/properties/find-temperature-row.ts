import { findInterval } from "./find-interval.ts";
import type { CompiledRefrigerant } from "./resolve-refrigerant.ts";

/**
 * Row i of a refrigerant table with temperature[i] ≤ T ≤ temperature[i+1], by
 * direct index on the uniform part of the grid (falls back to a binary search for
 * a table without a uniform grid). Constant time, no allocation.
 *
 * @param refrigerant compiled table
 * @param temperatureC °C inside the table (the caller checks the range)
 * @returns i in 0 … rowCount − 2
 * @throws never
 * @example findTemperatureRow(resolveRefrigerant("R32"), 0.2) // 120 (the row of 0 °C)
 */
export function findTemperatureRow(refrigerant: CompiledRefrigerant, temperatureC: number): number {
  const { gridStep, temperatureC: rows, rowCount } = refrigerant;
  if (gridStep === 0) return findInterval(rows, temperatureC);
  let i = Math.floor((temperatureC - refrigerant.gridStart) / gridStep) + 1;
  if (i < 0) i = 0;
  else if (i > rowCount - 2) i = rowCount - 2;
  // the first and last intervals are shorter than the step; rounding can land one off
  // (i is clamped to 0 … rowCount − 2 above, so i and i + 1 are rows)
  if (rows[i]! > temperatureC && i > 0) i--;
  else if (rows[i + 1]! < temperatureC && i < rowCount - 2) i++;
  return i;
}
