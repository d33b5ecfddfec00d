import { ziviVoidFraction } from "./zivi-void-fraction.ts";

/** A void-fraction model: vapour share of the cross-section from quality and the two densities. */
export type VoidFractionModel = (quality: number, vapourDensity: number, liquidDensity: number) => number;

/** Simpson panels over the quality span: the integrand is smooth except near x = 0, where 64 panels still hold 0.1 %. */
const PANELS = 64;

/**
 * Mean density of a two-phase region whose quality changes linearly along its length from
 * `qualityLow` to `qualityHigh` (uniform heat flux, the usual assumption of lumped charge models):
 *
 *   ρ̄ = 1/(x_high − x_low) · ∫ [α(x)·ρ_vapour + (1 − α(x))·ρ_liquid] dx,  α from Zivi (default)
 *   or another `VoidFractionModel`
 *
 * integrated by Simpson's rule. Source: the lumped charge-inventory approach of the ORNL heat
 * pump model and later condenser/evaporator charge models (from memory); void fraction Zivi 1964.
 *
 * Units: kg/m³ in and out; qualities 0–1, low < high (equal returns the local density).
 *
 * @throws never
 * @example meanTwoPhaseDensity(0, 1, 100, 1000) // ≈ 336.4 kg/m³ (homogeneous would give 255.8)
 */
export function meanTwoPhaseDensity(
  qualityLow: number,
  qualityHigh: number,
  vapourDensity: number,
  liquidDensity: number,
  voidFractionModel: VoidFractionModel = ziviVoidFraction,
): number {
  const local = (quality: number) => {
    const voidFraction = voidFractionModel(quality, vapourDensity, liquidDensity);
    return voidFraction * vapourDensity + (1 - voidFraction) * liquidDensity;
  };
  const span = qualityHigh - qualityLow;
  if (span <= 1e-9) return local(qualityLow);
  const step = span / PANELS;
  let sum = local(qualityLow) + local(qualityHigh);
  for (let panel = 1; panel < PANELS; panel += 1) sum += local(qualityLow + panel * step) * (panel % 2 === 1 ? 4 : 2);
  return (sum * step) / 3 / span;
}
