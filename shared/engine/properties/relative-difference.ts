/**
 * Relative difference |actual − expected| / |expected|, the one comparison helper
 * used with the named tolerances of property-tolerances.ts.
 *
 * @param actual value obtained
 * @param expected reference value (non-zero)
 * @returns non-negative relative difference (Infinity when expected is 0 and actual is not)
 * @throws never
 * @example relativeDifference(101.4, 101.325) // ≈ 7.4e-4
 */
export function relativeDifference(actual: number, expected: number): number {
  if (actual === expected) return 0;
  return Math.abs(actual - expected) / Math.abs(expected);
}
