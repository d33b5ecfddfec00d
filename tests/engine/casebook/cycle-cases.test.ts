/**
 * Casebook cases that ask about the measured cycle (issue 18): their stored answers still come
 * from measuredCycle() on their readings, the cases without cycle questions score exactly as
 * before, and the two new marks use their own tolerances (±5 kJ/kg, ±0.5 K).
 */
import { beforeAll, describe, expect, it } from "vitest";
import { diagnose, expectedAnswers, measuredCycle, scoreAttempt } from "@shared/engine/index.ts";
import { loadSinglePhaseTable } from "@shared/property-tables/load-single-phase-table.ts";
import {
  asksChargeToAdd,
  BuiltInCaseFileSchema,
  cycleQuestionsOf,
  REFRIGERATING_EFFECT_TOLERANCE_KJ_PER_KG,
  type AttemptAnswers,
  type CaseExpected,
} from "@shared/schemas/casebook.ts";
import rawFile from "../../../data/casebook/built-in-cases.json" with { type: "json" };

const file = BuiltInCaseFileSchema.parse(rawFile);
const asking = file.cases.filter((worked) => cycleQuestionsOf(worked.expected).length > 0);

function rightAnswers(expected: CaseExpected): AttemptAnswers {
  return {
    evaporatingTempC: expected.evaporatingTempC,
    condensingTempC: expected.condensingTempC,
    superheatK: expected.superheatK,
    subcoolingK: expected.subcoolingK,
    chargeState: expected.chargeState,
    reasoning: "worked it out",
    ...(expected.refrigeratingEffectKJPerKg !== undefined
      ? { refrigeratingEffectKJPerKg: expected.refrigeratingEffectKJPerKg }
      : {}),
    ...(expected.dischargeSuperheatK !== undefined ? { dischargeSuperheatK: expected.dischargeSuperheatK } : {}),
  };
}

describe("casebook cases with measured-cycle questions", () => {
  beforeAll(async () => {
    await Promise.all(
      [...new Set(asking.map((worked) => worked.input.refrigerant))].map((id) => loadSinglePhaseTable(id)),
    );
  });

  it("has at least three, on three refrigerants, each asking both questions", () => {
    expect(asking.length).toBeGreaterThanOrEqual(3);
    expect(new Set(asking.map((worked) => worked.input.refrigerant)).size).toBeGreaterThanOrEqual(3);
    for (const worked of asking)
      expect(cycleQuestionsOf(worked.expected)).toEqual(["refrigeratingEffectKJPerKg", "dischargeSuperheatK"]);
  });

  it.each(asking.map((worked) => [worked.id, worked] as const))(
    "%s: the stored cycle answers are the engine's",
    (_id, worked) => {
      const input = Object.freeze({ ...worked.input });
      const now = expectedAnswers(diagnose(input), measuredCycle(input));
      // stored to 0.001; a regenerated table may move them a hair
      expect(Math.abs(now.refrigeratingEffectKJPerKg! - worked.expected.refrigeratingEffectKJPerKg!)).toBeLessThan(
        0.05,
      );
      expect(Math.abs(now.dischargeSuperheatK! - worked.expected.dischargeSuperheatK!)).toBeLessThan(0.02);
    },
  );

  it("marks the two cycle answers with their own tolerances", () => {
    const expected = asking[0]!.expected;
    const right = rightAnswers(expected);
    expect(scoreAttempt(expected, right)).toMatchObject({
      total: 7,
      correctCount: 7,
      toleranceKJPerKg: REFRIGERATING_EFFECT_TOLERANCE_KJ_PER_KG,
    });
    const near = scoreAttempt(expected, {
      ...right,
      refrigeratingEffectKJPerKg: expected.refrigeratingEffectKJPerKg! + 4.9,
      dischargeSuperheatK: expected.dischargeSuperheatK! - 0.4,
    });
    expect(near.allCorrect).toBe(true);
    const off = scoreAttempt(expected, {
      ...right,
      refrigeratingEffectKJPerKg: expected.refrigeratingEffectKJPerKg! - 6,
    });
    expect(off.marks.find((mark) => mark.field === "refrigeratingEffectKJPerKg")).toMatchObject({
      correct: false,
      differenceKJPerKg: expect.closeTo(-6, 9),
      differenceK: null,
    });
    // left blank: not right
    const { refrigeratingEffectKJPerKg: _omitted, ...blank } = right;
    expect(scoreAttempt(expected, blank).correctCount).toBe(6);
  });

  it("leaves the scoring of every other case as it was: five marks", () => {
    // The cases that ask the charge to add (issue 14) have a sixth mark of their own (charge-cases.test.ts).
    for (const worked of file.cases.filter(
      (each) => cycleQuestionsOf(each.expected).length === 0 && !asksChargeToAdd(each.expected),
    )) {
      const score = scoreAttempt(worked.expected, rightAnswers(worked.expected));
      expect(score.total).toBe(5);
      expect(score.allCorrect).toBe(true);
      expect(score).not.toHaveProperty("toleranceKJPerKg");
    }
  });
});
