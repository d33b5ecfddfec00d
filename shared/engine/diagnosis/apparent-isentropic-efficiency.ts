import { isSinglePhaseTableLoaded } from "../properties/is-single-phase-table-loaded.ts";
import { PropertyRangeError } from "../properties/property-range-error.ts";
import { saturationPressure } from "../properties/saturation-pressure.ts";
import { singlePhaseStateFromEntropy } from "../properties/single-phase-state-from-entropy.ts";
import { singlePhaseState } from "../properties/single-phase-state.ts";
import { DISCHARGE_PRESSURE_ALLOWANCE_K } from "../cycle/cycle-limits.ts";
import type { DiagnosisSnapshot } from "./types.ts";

/**
 * Apparent isentropic efficiency of the compressor from one reading: (h₂s − h₁)/(h₂ − h₁), with
 * h₁ from the suction pressure and line temperature, h₂ from the discharge pressure (or the liquid
 * pressure plus 1 K of dew temperature) and the discharge line temperature, and h₂s at the
 * discharge pressure and the suction entropy (ASHRAE Handbook—Fundamentals ch. 2, cycle
 * relations; the same states `measuredCycle` draws). From a pipe temperature it is "apparent":
 * shell heat loss makes it read high, a hermetic motor's heat in the gas low.
 *
 * Only when the diagnosis asked for the measured cycle and the refrigerant's single-phase table
 * is loaded (by the caller, see shared/property-tables); null otherwise, without a discharge
 * line temperature, or when a state is outside the table.
 *
 * Units: kPa absolute and °C from the snapshot; dimensionless out.
 *
 * @throws never; unknown refrigerants are caught upstream by the snapshot
 * @example apparentIsentropicEfficiency(snapshot) // ≈ 0.62 for a healthy R410A scroll reading
 */
export function apparentIsentropicEfficiency(snapshot: DiagnosisSnapshot): number | null {
  const refrigerant = snapshot.input.refrigerant;
  const dischargeLineTempC = snapshot.dischargeLineTempC;
  if (dischargeLineTempC === null || snapshot.transcritical || snapshot.superheatK === null || snapshot.superheatK < 0)
    return null;
  if (!snapshot.withMeasuredCycle || !isSinglePhaseTableLoaded(refrigerant)) return null;
  try {
    const dischargeKPa =
      snapshot.dischargePressureKPaAbs ??
      (snapshot.condensingDewTempC === null
        ? null
        : saturationPressure(refrigerant, snapshot.condensingDewTempC + DISCHARGE_PRESSURE_ALLOWANCE_K, "dew"));
    if (dischargeKPa === null) return null;
    const suction = singlePhaseState(refrigerant, snapshot.suctionPressureKPaAbs, snapshot.input.suctionLineTempC);
    const discharge = singlePhaseState(refrigerant, dischargeKPa, dischargeLineTempC);
    const ideal = singlePhaseStateFromEntropy(refrigerant, dischargeKPa, suction.entropyKJPerKgK);
    const work = discharge.enthalpyKJPerKg - suction.enthalpyKJPerKg;
    return work > 0 ? (ideal.enthalpyKJPerKg - suction.enthalpyKJPerKg) / work : null;
  } catch (error) {
    if (error instanceof PropertyRangeError) return null;
    throw error;
  }
}
