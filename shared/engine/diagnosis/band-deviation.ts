import type { Band } from "./diagnosis-limits.ts";

/**
 * Signed distance of a value outside a band: negative below `lowK`, positive above `highK`,
 * 0 inside (edges included). Units follow the band (K for superheat, subcooling, splits).
 *
 * @throws {RangeError} when the band is inverted
 * @example bandDeviation(9, { lowK: 4.4, highK: 8.3 }) // 0.7
 */
export function bandDeviation(value: number, band: Band): number {
  if (band.lowK > band.highK) throw new RangeError("bandDeviation requires lowK ≤ highK");
  if (value < band.lowK) return value - band.lowK;
  if (value > band.highK) return value - band.highK;
  return 0;
}
