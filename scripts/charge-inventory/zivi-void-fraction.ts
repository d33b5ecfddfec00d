/**
 * Zivi void fraction: the share of a two-phase flow's cross-section taken by vapour, from the
 * minimum-entropy-production slip ratio S = (ρ_liquid/ρ_vapour)^(1/3):
 *
 *   α = 1 / (1 + ((1 − x)/x) · (ρ_vapour/ρ_liquid)^(2/3))
 *
 * Source: S. M. Zivi, "Estimation of steady-state steam void-fraction by means of the principle
 * of minimum entropy production", J. Heat Transfer 86 (1964) 247–252 (formula from memory; it is
 * the model most charge-inventory studies of air conditioners start from, e.g. Rice's 1987 ORNL
 * charge-inventory comparison, also from memory). Zivi holds more liquid than the homogeneous
 * model (slip 1) and less than Lockhart–Martinelli-based ones, so it sits mid-field.
 *
 * Units: quality 0–1, densities kg/m³ (any consistent unit); void fraction 0–1 out.
 *
 * @throws never; x ≤ 0 gives 0 and x ≥ 1 gives 1
 * @example ziviVoidFraction(0.5, 100, 1000) // 1 / (1 + 0.1^(2/3)) ≈ 0.823
 */
export function ziviVoidFraction(quality: number, vapourDensity: number, liquidDensity: number): number {
  if (quality <= 0) return 0;
  if (quality >= 1) return 1;
  return 1 / (1 + ((1 - quality) / quality) * Math.pow(vapourDensity / liquidDensity, 2 / 3));
}
