import type { CaseExpected } from "../../schemas/casebook.ts";
import type { DiagnosisResult } from "../../schemas/diagnosis.ts";
import type { MeasuredCycle } from "../cycle/measured-cycle.ts";

/**
 * Expected answers of a worked case, taken from the engine's diagnosis of its readings: dew
 * point at suction (evaporating), bubble point at the liquid pressure (condensing), superheat,
 * subcooling, charge state, the targets used and the warning codes. Answers are never typed by
 * hand, so a case cannot disagree with what the run log would say for the same readings.
 *
 * Units: °C for saturation temperatures, K for differences. Range: any `diagnose()` result.
 * Source: TRADE.md §1.1 (dew for superheat, bubble for subcooling [S1][S2][S3]).
 *
 * With the case's measured cycle (a case that asks about the cycle, issue 18) the answers also
 * carry its refrigerating effect (kJ/kg) and discharge superheat (K), from measuredCycle().
 * A case that asks the charge to add (issue 14) also carries the engine's charge deviation, or
 * null with the reason there is none: then the right answer is to leave it blank.
 *
 * @throws never
 * @example expectedAnswers(diagnose(input)).chargeState // "undercharged"
 */
export function expectedAnswers(result: DiagnosisResult, cycle?: MeasuredCycle, asksChargeToAdd = false): CaseExpected {
  const answers: CaseExpected = {
    evaporatingTempC: result.evaporatingTempC,
    condensingTempC: result.condensingTempC,
    superheatK: result.superheatK,
    subcoolingK: result.subcoolingK,
    chargeState: result.chargeState,
    targetSuperheatK: result.targets.superheat?.targetK ?? null,
    targetSubcoolingK: result.targets.subcooling?.targetK ?? null,
    warnings: result.warnings.map((warning) => warning.code),
  };
  if (cycle) {
    answers.refrigeratingEffectKJPerKg = cycle.refrigeratingEffectKJPerKg;
    answers.dischargeSuperheatK = cycle.dischargeSuperheatK;
  }
  if (asksChargeToAdd) {
    answers.chargeDeviation = result.chargeDeviation;
    answers.chargeDeviationNote = result.chargeDeviationNote;
  }
  return answers;
}
