import { largestDeviationPercent } from "./largest-deviation-percent.ts";

/**
 * Three-phase voltage imbalance (unbalance) by the NEMA MG-1 definition: 100 × the largest
 * deviation of a line voltage from the average of the three, divided by that average [S41][S43][S44].
 *
 * @param volts line-to-line voltages L1–L2, L2–L3, L3–L1, V (≥ 0; a lost phase may read 0)
 * @returns imbalance, percent of the mean
 * @throws RangeError "voltageImbalance requires ..." for a negative or non-finite voltage or all zero
 * @example voltageImbalance([460, 467, 450]) // 1.97… (mean 459, largest deviation 9 V)
 */
export function voltageImbalance(volts: readonly [number, number, number]): number {
  return largestDeviationPercent(volts, "voltageImbalance");
}
