/**
 * Casebook cases that ask the charge to add (issue 14): their stored estimates are the engine's
 * for their readings, and the answer is right anywhere within the estimate's stated range
 * (virtual refrigerant charge method, Li & Braun 2009: the method cannot tell amounts inside
 * its range apart), blank right only when the engine gives no estimate.
 */
import { describe, expect, it } from "vitest";
import {
  authoredAnswers,
  chargeToAdd,
  chargingPlan,
  diagnose,
  expectedAnswers,
  getRefrigerant,
  scoreAttempt,
} from "@shared/engine/index.ts";
import {
  asksChargeToAdd,
  BuiltInCaseFileSchema,
  CHARGE_ANSWER_FIELD,
  type AttemptAnswers,
  type BuiltInCase,
  type CaseExpected,
} from "@shared/schemas/casebook.ts";
import rawFile from "../../../data/casebook/built-in-cases.json" with { type: "json" };

const file = BuiltInCaseFileSchema.parse(rawFile);
const asking = file.cases.filter((worked) => asksChargeToAdd(worked.expected));
const byId = (id: string): BuiltInCase => file.cases.find((worked) => worked.id === id)!;

const REFERENCE_CASE = "banksia-dental-txv-how-much-to-add";
const GENERIC_CASE = "ironbark-bowls-piston-how-much-to-add";
const RECOVER_CASE = "banksia-dental-r32-how-much-to-recover";
const NO_ESTIMATE_CASE = "wattle-lane-cool-room-how-much-to-add";

function rightAnswers(expected: CaseExpected, chargeToAddKg: number | null): AttemptAnswers {
  return {
    evaporatingTempC: expected.evaporatingTempC,
    condensingTempC: expected.condensingTempC,
    superheatK: expected.superheatK,
    subcoolingK: expected.subcoolingK,
    chargeState: expected.chargeState,
    reasoning: "worked it out",
    chargeToAddKg,
  };
}

const chargeMark = (expected: CaseExpected, given: number | null) =>
  scoreAttempt(expected, rightAnswers(expected, given)).marks.find((mark) => mark.field === CHARGE_ANSWER_FIELD);

describe("casebook cases that ask the charge to add", () => {
  it("turns the engine's deviation into an amount to add with the range turned the same way (Li & Braun 2009 sign: negative deviation = short)", () => {
    const deviation = Object.freeze({
      kg: -0.55,
      lowKg: -0.8,
      highKg: -0.35,
      basis: "unit-reference" as const,
      source: "",
    });
    expect(chargeToAdd(deviation)).toEqual({ kg: 0.55, lowKg: 0.35, highKg: 0.8 });
    expect(chargeToAdd({ ...deviation, kg: 0.45, lowKg: 0.1, highKg: 0.8 })).toEqual({
      kg: -0.45,
      lowKg: -0.8,
      highKg: -0.1,
    });
    // regression guard: no "−0.00 kg" for a deviation of exactly nothing
    expect(Object.is(chargeToAdd({ ...deviation, kg: 0, lowKg: -0.2, highKg: 0.2 }).kg, 0)).toBe(true);
  });

  it("has at least three built-in cases with an estimate: a unit reference, a generic one and one to recover", () => {
    const withEstimate = asking.filter((worked) => worked.expected.chargeDeviation);
    expect(withEstimate.length).toBeGreaterThanOrEqual(3);

    const reference = byId(REFERENCE_CASE);
    expect(reference.input).toMatchObject({ refrigerant: "R410A", meteringDevice: "txv" });
    expect(reference.input.chargeReference).toBeDefined();
    expect(reference.expected.chargeState).toBe("undercharged");
    expect(reference.expected.chargeDeviation).toMatchObject({ basis: "unit-reference" });

    const generic = byId(GENERIC_CASE);
    expect(generic.input).toMatchObject({ refrigerant: "R22", meteringDevice: "fixed-orifice" });
    expect(generic.input.chargeReference).toBeUndefined();
    expect(generic.expected.chargeState).toBe("undercharged");
    expect(generic.expected.chargeDeviation).toMatchObject({ basis: "generic" });

    const recover = byId(RECOVER_CASE);
    expect(recover.input).toMatchObject({ refrigerant: "R32", meteringDevice: "txv" });
    expect(recover.expected.chargeState).toBe("overcharged");
    expect(chargeToAdd(recover.expected.chargeDeviation!).kg).toBeLessThan(0);

    // Li & Braun 2009: against the unit's own reference point the range is narrower, as a share of the charge, than with generic coefficients.
    const share = (worked: BuiltInCase) =>
      (worked.expected.chargeDeviation!.highKg - worked.expected.chargeDeviation!.lowKg) / worked.input.chargeKg!;
    expect(share(reference)).toBeLessThan(share(generic));
  });

  it.each(asking.map((worked) => [worked.id, worked] as const))(
    "%s: the stored estimate is the engine's",
    (_id, worked) => {
      const now = expectedAnswers(diagnose(Object.freeze({ ...worked.input })), undefined, true);
      expect(now.chargeDeviation).toEqual(worked.expected.chargeDeviation);
      expect(now.chargeDeviationNote).toEqual(worked.expected.chargeDeviationNote);
      // the estimate points the same way as the verdict, so the charging plan exists (common practice: charge in steps)
      if (now.chargeDeviation && (now.chargeState === "undercharged" || now.chargeState === "overcharged")) {
        const plan = chargingPlan(
          now.chargeDeviation,
          now.chargeState,
          worked.input.chargeKg!,
          getRefrigerant(worked.input.refrigerant).kind === "blend",
        );
        expect(plan?.action).toBe(now.chargeState === "undercharged" ? "add" : "recover");
        expect(plan!.steps.length).toBeGreaterThanOrEqual(2);
      }
    },
  );

  it("marks an amount right anywhere within the estimate's range, ends included, and wrong just outside (Li & Braun 2009 range)", () => {
    for (const id of [REFERENCE_CASE, GENERIC_CASE, RECOVER_CASE]) {
      const { expected } = byId(id);
      const range = chargeToAdd(expected.chargeDeviation!);
      for (const inside of [range.lowKg, range.kg, range.highKg, (range.lowKg + range.kg) / 2])
        expect(chargeMark(expected, inside), `${id} ${inside}`).toMatchObject({
          correct: true,
          expected: range.kg,
          rangeKg: { lowKg: range.lowKg, highKg: range.highKg },
        });
      for (const outside of [range.lowKg - 0.01, range.highKg + 0.01])
        expect(chargeMark(expected, outside)?.correct, `${id} ${outside}`).toBe(false);
    }
    // recovering when the circuit is short is wrong whatever the amount
    expect(chargeMark(byId(REFERENCE_CASE).expected, -0.55)?.correct).toBe(false);
  });

  it("scores six marks, and a blank is wrong when the engine gives an estimate", () => {
    const { expected } = byId(REFERENCE_CASE);
    const score = scoreAttempt(expected, rightAnswers(expected, chargeToAdd(expected.chargeDeviation!).kg));
    expect(score).toMatchObject({ total: 6, correctCount: 6, allCorrect: true });
    expect(chargeMark(expected, null)?.correct).toBe(false);
    const { chargeToAddKg: _omitted, ...absent } = rightAnswers(expected, null);
    expect(scoreAttempt(expected, absent).correctCount).toBe(5);
  });

  it("marks a blank right, and any amount wrong, when the engine gives no estimate (a receiver hides the liquid: issue 14 limits)", () => {
    const { expected } = byId(NO_ESTIMATE_CASE);
    expect(expected.chargeDeviation).toBeNull();
    expect(expected.chargeDeviationNote).toMatch(/receiver/);
    expect(chargeMark(expected, null)).toMatchObject({ correct: true, expected: null, rangeKg: null });
    expect(chargeMark(expected, 0.5)?.correct).toBe(false);
  });

  it("adds no charge mark to a case that does not ask it, whatever is sent", () => {
    const plain = byId("wattle-lane-rtu1-c2-oily-flare");
    expect(asksChargeToAdd(plain.expected)).toBe(false);
    const score = scoreAttempt(plain.expected, rightAnswers(plain.expected, 1));
    expect(score.total).toBe(5);
    expect(score.marks.map((mark) => mark.field)).not.toContain(CHARGE_ANSWER_FIELD);
  });

  it("asks an authored case the charge to add only when the engine gives an estimate (issue 14)", () => {
    const reference = byId(REFERENCE_CASE).input;
    const { chargeKg: _chargeKg, chargeReference: _reference, ...withoutCharge } = reference;
    expect(asksChargeToAdd(authoredAnswers(diagnose(reference)))).toBe(true);
    expect(asksChargeToAdd(authoredAnswers(diagnose(withoutCharge)))).toBe(false);
    // a refrigeration circuit with a receiver: a correct charge, but no estimate, so no question
    expect(asksChargeToAdd(authoredAnswers(diagnose(byId(NO_ESTIMATE_CASE).input)))).toBe(false);
  });
});
