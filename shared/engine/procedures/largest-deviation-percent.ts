/**
 * Largest deviation from the mean as a percentage of the mean: 100 × max|xᵢ − x̄| / x̄. This is
 * the NEMA MG-1 definition of voltage unbalance, applied the same way to currents and winding
 * resistances [S44]; the trade notes give it as "largest deviation from the average ÷ average".
 *
 * @param values readings of one kind (V, A or Ω), each finite and ≥ 0
 * @param caller name of the public function, for the error message
 * @returns percent, ≥ 0 (exactly 0 for equal readings)
 * @throws RangeError "<caller> requires ..." for an empty list, a negative or non-finite value, or a zero mean
 * @example largestDeviationPercent([460, 467, 450], "voltageImbalance") // ≈ 1.97
 */
export function largestDeviationPercent(values: readonly number[], caller: string): number {
  if (values.length === 0) throw new RangeError(`${caller} requires at least one reading`);
  let sum = 0;
  for (const value of values) {
    if (!Number.isFinite(value) || value < 0)
      throw new RangeError(`${caller} requires finite readings of zero or more`);
    sum += value;
  }
  const mean = sum / values.length;
  if (!(mean > 0)) throw new RangeError(`${caller} requires at least one reading above zero`);
  // Equal readings are exactly balanced; (3v)/3 can differ from v in the last bit.
  if (values.every((value) => value === values[0])) return 0;
  let largest = 0;
  for (const value of values) largest = Math.max(largest, Math.abs(value - mean));
  return (100 * largest) / mean;
}
