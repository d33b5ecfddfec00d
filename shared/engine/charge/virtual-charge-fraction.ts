/** Coefficients of the virtual charge relation, from a reference point. */
export interface VirtualChargeCoefficients {
  /** k_ch: subcooling change for the whole charge, K per unit charge fraction. */
  kChK: number;
  /** k_sh/k_sc: weight of the superheat deviation beside the subcooling deviation (≤ 0). */
  superheatToSubcooling: number;
}

/**
 * Charge deviation as a fraction of the reference (correct) charge, by the virtual refrigerant
 * charge relation (Li & Braun 2009, eq. for the charge as recalled, not re-read):
 *
 *   (m − m_ref)/m_ref = [ (SC − SC_ref) + (k_sh/k_sc)·(SH − SH_ref) ] / k_ch
 *
 * Units: K in (superheat deviation 0 when the superheat does not move with the charge);
 * dimensionless out, negative when short. Valid for a circuit with no receiver or accumulator
 * holding the liquid the subcooling would show.
 *
 * @throws {RangeError} when k_ch is not above 0
 * @example virtualChargeFraction(-3, 10, { kChK: 25, superheatToSubcooling: -0.2 }) // -0.2 (20 % short)
 */
export function virtualChargeFraction(
  subcoolingDeviationK: number,
  superheatDeviationK: number,
  coefficients: VirtualChargeCoefficients,
): number {
  if (!(coefficients.kChK > 0)) throw new RangeError(`k_ch must be above 0 K; got ${coefficients.kChK}`);
  return (subcoolingDeviationK + coefficients.superheatToSubcooling * superheatDeviationK) / coefficients.kChK;
}
