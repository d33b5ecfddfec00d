import { SUCTION_LINE_ALLOWANCE } from "./diagnosis-limits.ts";

/**
 * How much more superheat the outdoor unit's suction service valve shows than the evaporator
 * outlet: the suction line's pressure drop (sized for about 1 K of saturation drop) plus its
 * heat gain through the insulation, growing with the line set's length and capped.
 * allowance = 0.5 K + 0.1 K/m × length, at most 4 K; 7.5 m assumed when none is recorded.
 *
 * Units: m in, K out. Source: ASHRAE Handbook—Refrigeration, refrigerant piping (suction lines
 * sized for about 1 K drop; memory); heat gain: common practice.
 *
 * @throws {RangeError} when the length is negative or not finite
 * @example suctionLineAllowance(15) // 2
 */
export function suctionLineAllowance(liquidLineLengthM: number | undefined): number {
  const length = liquidLineLengthM ?? SUCTION_LINE_ALLOWANCE.defaultLengthM;
  if (!(length >= 0) || !Number.isFinite(length))
    throw new RangeError("suctionLineAllowance requires a length of 0 m or more");
  return Math.min(
    SUCTION_LINE_ALLOWANCE.maxK,
    SUCTION_LINE_ALLOWANCE.baseK + SUCTION_LINE_ALLOWANCE.perMetreK * length,
  );
}
