/**
 * Homogeneous void fraction: liquid and vapour move at one speed (slip ratio 1), so the vapour's
 * share of the cross-section is its share of the volume flow:
 *
 *   α = 1 / (1 + ((1 − x)/x) · (ρ_vapour/ρ_liquid))
 *
 * Source: the textbook no-slip limit (e.g. Collier & Thome, Convective Boiling and Condensation,
 * from memory). It holds the least liquid of the common models, so it bounds how much
 * refrigerant a two-phase zone can hold from below; the validation uses it only as a check on
 * how far its figures rest on the Zivi model.
 *
 * Units: quality 0–1, densities kg/m³ (any consistent unit); void fraction 0–1 out.
 *
 * @throws never; x ≤ 0 gives 0 and x ≥ 1 gives 1
 * @example homogeneousVoidFraction(0.5, 100, 1000) // 1 / 1.1 ≈ 0.909
 */
export function homogeneousVoidFraction(quality: number, vapourDensity: number, liquidDensity: number): number {
  if (quality <= 0) return 0;
  if (quality >= 1) return 1;
  return 1 / (1 + ((1 - quality) / quality) * (vapourDensity / liquidDensity));
}
