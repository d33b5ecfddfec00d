import {
  ANSWER_FIELDS,
  ANSWER_TOLERANCE_K,
  asksChargeToAdd,
  CHARGE_ANSWER_FIELD,
  cycleQuestionsOf,
  REFRIGERATING_EFFECT_TOLERANCE_KJ_PER_KG,
  type AnswerMark,
  type AttemptAnswers,
  type AttemptScore,
  type CaseExpected,
} from "../../schemas/casebook.ts";
import { chargeToAdd } from "./charge-to-add.ts";

/** A hair of slack so that a displayed value rounded on the boundary still counts. */
const BOUNDARY_SLACK = 1e-9;

/**
 * Scores an apprentice's attempt at a case: each of evaporating and condensing saturation
 * temperature, superheat and subcooling is right within ±0.5 K of the engine's answer, and the
 * charge state must match exactly. Where the case has no valid value (null: e.g. subcooling
 * taken on the discharge line), the right answer is to leave it blank. The one line of
 * reasoning is kept for the senior to read, not marked.
 *
 * Units: answers and expected values SI-metric (°C, K); convert display units first. The
 * tolerance is in kelvin whatever the display unit (0.5 K = 0.9 °F). Source: issue 7 (±0.5 K);
 * about one gauge graduation's worth of saturation temperature (common practice).
 *
 * A case that asks measured-cycle questions (issue 18; its expected answers carry them) adds a
 * mark for each: the refrigerating effect right within ±5 kJ/kg (read off a pressure–enthalpy
 * diagram), the discharge superheat within ±0.5 K. Cases without them score as before.
 *
 * A case that asks the charge to add (issue 14) adds one more mark: right when the amount (kg to
 * add, negative to recover) lies within the range the engine states for its estimate, ends
 * included, since the method cannot tell those amounts apart (virtual refrigerant charge, Li &
 * Braun 2009); blank is right only when the engine gives no estimate for the readings.
 *
 * @throws never
 * @example scoreAttempt(expected, { ...answers, superheatK: expected.superheatK! + 0.4 }).marks[2].correct // true
 */
export function scoreAttempt(
  expected: CaseExpected,
  answers: AttemptAnswers,
  toleranceK: number = ANSWER_TOLERANCE_K,
): AttemptScore {
  const marks: AnswerMark[] = ANSWER_FIELDS.map((field) => {
    if (field === "chargeState") {
      return {
        field,
        expected: expected.chargeState,
        given: answers.chargeState,
        correct: answers.chargeState === expected.chargeState,
        differenceK: null,
      };
    }
    const want = expected[field];
    const given = answers[field];
    if (want === null || given === null)
      return { field, expected: want, given, correct: want === given, differenceK: null };
    const differenceK = given - want;
    // A hair of slack so that a displayed value rounded to 0.1 on the boundary still counts.
    return { field, expected: want, given, correct: Math.abs(differenceK) <= toleranceK + BOUNDARY_SLACK, differenceK };
  });
  const asked = cycleQuestionsOf(expected);
  for (const field of asked) {
    const want = expected[field] ?? null;
    const given = answers[field] ?? null;
    const energy = field === "refrigeratingEffectKJPerKg";
    if (want === null || given === null) {
      marks.push({
        field,
        expected: want,
        given,
        correct: want === given,
        differenceK: null,
        ...(energy ? { differenceKJPerKg: null } : {}),
      });
      continue;
    }
    const difference = given - want;
    const tolerance = energy ? REFRIGERATING_EFFECT_TOLERANCE_KJ_PER_KG : toleranceK;
    marks.push({
      field,
      expected: want,
      given,
      correct: Math.abs(difference) <= tolerance + BOUNDARY_SLACK,
      differenceK: energy ? null : difference,
      ...(energy ? { differenceKJPerKg: difference } : {}),
    });
  }
  if (asksChargeToAdd(expected)) {
    const toAdd = expected.chargeDeviation ? chargeToAdd(expected.chargeDeviation) : null;
    const given = answers[CHARGE_ANSWER_FIELD] ?? null;
    marks.push({
      field: CHARGE_ANSWER_FIELD,
      expected: toAdd === null ? null : toAdd.kg,
      given,
      correct:
        toAdd === null || given === null
          ? toAdd === given
          : given >= toAdd.lowKg - BOUNDARY_SLACK && given <= toAdd.highKg + BOUNDARY_SLACK,
      differenceK: null,
      rangeKg: toAdd === null ? null : { lowKg: toAdd.lowKg, highKg: toAdd.highKg },
    });
  }
  const correctCount = marks.filter((mark) => mark.correct).length;
  return {
    marks,
    correctCount,
    total: marks.length,
    allCorrect: correctCount === marks.length,
    toleranceK,
    ...(asked.includes("refrigeratingEffectKJPerKg")
      ? { toleranceKJPerKg: REFRIGERATING_EFFECT_TOLERANCE_KJ_PER_KG }
      : {}),
  };
}
