import { describe, expect, it } from "vitest";
import { scoreAttempt } from "@shared/engine/index.ts";
import { ANSWER_TOLERANCE_K, type AttemptAnswers, type CaseExpected } from "@shared/schemas/casebook.ts";

// Worked R410A TXV case (the engine's normal-r410a-txv fixture): dew 7 °C at 890 kPa g,
// bubble 46 °C at 2697 kPa g, superheat 5 K, subcooling 6 K.
const expected: CaseExpected = Object.freeze({
  evaporatingTempC: 7,
  condensingTempC: 46,
  superheatK: 5,
  subcoolingK: 6,
  chargeState: "normal",
  targetSuperheatK: 5,
  targetSubcoolingK: 6,
  warnings: [],
});
const right: AttemptAnswers = Object.freeze({
  evaporatingTempC: 7,
  condensingTempC: 46,
  superheatK: 5,
  subcoolingK: 6,
  chargeState: "normal",
  reasoning: "All on target",
});

describe("scoreAttempt", () => {
  it("marks a fully right attempt 5 of 5", () => {
    const score = scoreAttempt(expected, right);
    expect(score).toMatchObject({ correctCount: 5, total: 5, allCorrect: true, toleranceK: 0.5 });
  });

  it("accepts answers within ±0.5 K and refuses them beyond (issue 7 tolerance)", () => {
    expect(ANSWER_TOLERANCE_K).toBe(0.5);
    const edge = scoreAttempt(expected, { ...right, superheatK: 5.5, subcoolingK: 5.5, evaporatingTempC: 6.5 });
    expect(edge.allCorrect).toBe(true);
    const off = scoreAttempt(expected, { ...right, superheatK: 5.6 });
    const superheat = off.marks.find((mark) => mark.field === "superheatK")!;
    expect(superheat.correct).toBe(false);
    expect(superheat.differenceK).toBeCloseTo(0.6, 9);
    expect(off.correctCount).toBe(4);
  });

  it("catches the classic blend mistake: the bubble point used for superheat is off by the glide", () => {
    // R407C glide ≈ 5 K at evaporator pressures (TRADE.md §1.1, from memory: 5–7 K): a bubble-point
    // evaporating temperature of 2 °C instead of the dew point 7 °C is a wrong answer.
    const score = scoreAttempt(expected, { ...right, evaporatingTempC: 2, superheatK: 10 });
    expect(score.marks.filter((mark) => !mark.correct).map((mark) => mark.field)).toEqual([
      "evaporatingTempC",
      "superheatK",
    ]);
  });

  it("wants the exact charge state", () => {
    const score = scoreAttempt(expected, { ...right, chargeState: "overcharged" });
    expect(score.marks.at(-1)).toMatchObject({
      field: "chargeState",
      expected: "normal",
      given: "overcharged",
      correct: false,
    });
  });

  it("wants a blank where the case has no valid value (subcooling on a discharge line, TRADE.md §1.2)", () => {
    const noSubcooling = { ...expected, subcoolingK: null, chargeState: "insufficient-data" as const };
    expect(
      scoreAttempt(noSubcooling, { ...right, subcoolingK: null, chargeState: "insufficient-data" }).allCorrect,
    ).toBe(true);
    expect(
      scoreAttempt(noSubcooling, { ...right, subcoolingK: 6, chargeState: "insufficient-data" }).marks[3]!.correct,
    ).toBe(false);
  });
});
