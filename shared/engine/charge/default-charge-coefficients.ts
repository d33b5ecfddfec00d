import type { MeteringFamily } from "../diagnosis/signature-table.ts";
import {
  LIQUID_LINE_KG_PER_M,
  MIN_REFERENCE_SUBCOOLING_K,
  SUBCOOLED_SHARE_OF_CHARGE,
  SUPERHEAT_TO_SUBCOOLING_RATIO,
} from "./charge-deviation-limits.ts";
import type { VirtualChargeCoefficients } from "./virtual-charge-fraction.ts";

/**
 * Coefficients of the virtual charge relation from the circuit's rated figures, as the later
 * Purdue evaluations set default parameters from the rated subcooling, rated charge and liquid
 * line length: the subcooled share of the unit's own charge empties when the subcooling reaches
 * zero, so k_ch = SC_ref / share, and liquid in a long line set (charge the subcooling does not
 * see) dilutes that share.
 *
 * Units: K, m, kg in; k_ch in K per unit charge fraction.
 * Source: see `VIRTUAL_CHARGE_SOURCE`; share and line charge are common practice.
 *
 * @throws never
 * @example defaultChargeCoefficients("expansion-valve", 6, 3, 7.5).kChK // 6 / (0.25 × 2.625/3) ≈ 27.4
 */
export function defaultChargeCoefficients(
  family: MeteringFamily,
  referenceSubcoolingK: number,
  chargeKg: number,
  liquidLineLengthM: number | undefined,
): VirtualChargeCoefficients {
  const lineKg = Math.min((liquidLineLengthM ?? 0) * LIQUID_LINE_KG_PER_M, chargeKg * 0.5);
  const share = (SUBCOOLED_SHARE_OF_CHARGE * (chargeKg - lineKg)) / chargeKg;
  return {
    kChK: Math.max(referenceSubcoolingK, MIN_REFERENCE_SUBCOOLING_K) / share,
    superheatToSubcooling: family === "fixed" ? SUPERHEAT_TO_SUBCOOLING_RATIO : 0,
  };
}
