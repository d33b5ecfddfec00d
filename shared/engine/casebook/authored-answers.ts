import type { CaseExpected } from "../../schemas/casebook.ts";
import type { DiagnosisResult } from "../../schemas/diagnosis.ts";
import { expectedAnswers } from "./expected-answers.ts";

/**
 * Expected answers of a case a senior writes (or turns from a visit reading): the usual five,
 * plus the charge to add whenever the engine gives an estimate for the readings — that is, when
 * the author gave the circuit's correct charge and the readings support one (issue 14). Without
 * an estimate the question is not asked: an authored case never asks a question whose only
 * right answer is a blank the author did not mean. The measured-cycle questions stay with the
 * built-in cases (issue 18).
 *
 * Units: as `expectedAnswers`. Source: as `expectedAnswers`; the estimate's own
 * (virtual refrigerant charge method, Li & Braun 2009).
 *
 * @throws never
 * @example authoredAnswers(diagnose({ ...input, chargeKg: 3.2 })).chargeDeviation?.kg // -0.55 for a 3.2 kg circuit short of its subcooling
 */
export function authoredAnswers(result: DiagnosisResult): CaseExpected {
  return expectedAnswers(result, undefined, result.chargeDeviation !== null);
}
