import type { CylinderFillLimit } from "../../schemas/procedures.ts";
import { saturatedState } from "../properties/saturated-state.ts";
import { CYLINDER_FILL_LIMITS, type CylinderFillLimits } from "./procedure-limits.ts";
import { resolveLimits } from "./resolve-limits.ts";

const KG_PER_M3_PER_KG_PER_L = 1000;

/**
 * Largest mass of refrigerant a recovery cylinder may hold: liquid may fill at most 80 % of the
 * internal volume at the hottest temperature the cylinder may see [S79][S78], so
 * maxContents (kg) = 0.8 × water capacity (L) × saturated-liquid density (kg/L) at that
 * temperature (computed from the definition). The default 54 °C (130 °F) is the worked
 * example's temperature [S79]. "80 % of the water-capacity mass" is only safe for liquids
 * denser than water; this formula holds for all.
 *
 * Water capacity (WC) is stamped in kg of water; it is taken as litres (water is 0.999 kg/L at
 * 15 °C, so this understates the volume by 0.1 %, on the safe side). The liquid density comes
 * from `saturatedState()` (bubble-point liquid for blends).
 *
 * @param input water capacity (kg > 0), refrigerant (ASHRAE designation), reference temperature (°C, default 54)
 * @param limits organisation override of CYLINDER_FILL_LIMITS (liquidVolumeFraction, referenceTempC)
 * @returns largest contents (kg), the liquid density used (kg/L) and the reference temperature (°C)
 * @throws RangeError "cylinderFillLimit requires a water capacity above zero"
 * @throws PropertyRangeError for an unknown refrigerant or a temperature outside its table
 *   (including above its critical temperature, e.g. R744 at 54 °C)
 * @example cylinderFillLimit({ waterCapacityKg: 10.9, refrigerant: "R410A" }).maxContentsKg // ≈ 7.6
 */
export function cylinderFillLimit(
  input: { waterCapacityKg: number; refrigerant: string; referenceTempC?: number },
  limits?: Partial<CylinderFillLimits>,
): CylinderFillLimit {
  if (!Number.isFinite(input.waterCapacityKg) || !(input.waterCapacityKg > 0))
    throw new RangeError("cylinderFillLimit requires a water capacity above zero");
  const { limits: applied } = resolveLimits(CYLINDER_FILL_LIMITS, limits);
  const referenceTempC = input.referenceTempC ?? applied.referenceTempC;
  const liquidDensityKgPerL =
    saturatedState(input.refrigerant, referenceTempC).liquidDensityKgPerM3 / KG_PER_M3_PER_KG_PER_L;
  const waterCapacityL = input.waterCapacityKg;
  return {
    maxContentsKg: applied.liquidVolumeFraction * waterCapacityL * liquidDensityKgPerL,
    liquidDensityKgPerL,
    referenceTempC,
  };
}
