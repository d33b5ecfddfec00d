import { FULL_STRENGTH_DEVIATION_K } from "./diagnosis-limits.ts";

/**
 * Strength (0–1) of a deviation beyond a band edge: rises linearly from 0 at the edge to 1 at
 * `fullStrengthK` beyond it, then stays at 1. Linear and clamped so that every rule's evidence
 * moves monotonically with its reading.
 *
 * Units: K in (magnitude; the sign is ignored), dimensionless out.
 *
 * @throws {RangeError} when fullStrengthK is not positive
 * @example deviationStrength(1.4) // 0.5 (with the default 2.8 K)
 */
export function deviationStrength(deviationK: number, fullStrengthK: number = FULL_STRENGTH_DEVIATION_K): number {
  if (!(fullStrengthK > 0)) throw new RangeError("deviationStrength requires a positive fullStrengthK");
  const magnitude = Math.abs(deviationK);
  return magnitude >= fullStrengthK ? 1 : magnitude / fullStrengthK;
}
