import { largestDeviationPercent } from "./largest-deviation-percent.ts";

/**
 * Three-phase current imbalance, same formula as the voltage imbalance: 100 × the largest
 * deviation of a phase current from the average, divided by the average. One compressor maker
 * allows at most 10 % [S45]; it typically runs 6–10 times the voltage imbalance [S44].
 *
 * @param amps running current in each phase, A (≥ 0)
 * @returns imbalance, percent of the mean
 * @throws RangeError "currentImbalance requires ..." for a negative or non-finite current or all zero
 * @example currentImbalance([10, 11, 9]) // 10
 */
export function currentImbalance(amps: readonly [number, number, number]): number {
  return largestDeviationPercent(amps, "currentImbalance");
}
