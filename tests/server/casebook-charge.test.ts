import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";

// Built-in cases that ask the charge to add (issue 14; data/casebook/built-in-cases.json).
/** R410A TXV split measured against its own reference point: 0.55 kg short, range 0.30–0.80 kg to add. */
const REFERENCE_CASE = "banksia-dental-txv-how-much-to-add";
/** R404A cool room with a receiver: no estimate, so the right answer is a blank. */
const NO_ESTIMATE_CASE = "wattle-lane-cool-room-how-much-to-add";
/** The usual five answers, right for the reference case (dew 5 °C, bubble 41 °C, 12 K and 2 K, short). */
const USUAL = { evaporatingTempC: 5, condensingTempC: 41, superheatK: 12, subcoolingK: 2, chargeState: "undercharged" };

/** A senior's own case: an R410A TXV split 4 K short of its subcooling target. */
const authored = {
  title: "Clinic split after a flare repair",
  difficulty: "intermediate",
  story: {
    site: "A two-storey clinic",
    equipment: "Wall split on R410A with a TXV",
    complaint: "Warm afternoons after a flare was re-made",
    conditions: "Hot afternoon, running 25 minutes",
  },
  input: {
    refrigerant: "R410A",
    meteringDevice: "txv",
    suctionPressureKPa: 833,
    suctionLineTempC: 17,
    liquidPressureKPa: 2390,
    liquidLineTempC: 39,
    targetSubcoolingK: 6,
    outdoorAirDryBulbC: 33,
    returnAirDryBulbC: 26,
    runMinutes: 25,
  },
  reasoning: "Subcooling well under the nameplate target with high superheat: short of charge.",
  safetyTopics: [],
};

type Mark = {
  field: string;
  correct: boolean;
  expected: number | null;
  rangeKg?: { lowKg: number; highKg: number } | null;
};
const chargeMark = (marks: Mark[]) => marks.find((mark) => mark.field === "chargeToAddKg");

describe("casebook API: the charge to add", () => {
  let testApp: TestApp;
  let apprentice: Awaited<ReturnType<typeof signedIn>>;
  let senior: Awaited<ReturnType<typeof signedIn>>;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    apprentice = await signedIn(testApp.app, BELLBIRD.apprentice);
    senior = await signedIn(testApp.app, BELLBIRD.senior);
  });
  afterAll(() => testApp.close());

  it("says a case asks the charge to add, without the estimate", async () => {
    const response = await apprentice.get(`/api/cases/${REFERENCE_CASE}`);
    expect(response.status).toBe(200);
    expect(response.body.case.chargeQuestion).toBe(true);
    expect(response.body.case.expected).toBeNull();
    expect(JSON.stringify(response.body)).not.toMatch(/chargeDeviation/);
    // the apprentice needs the correct charge and the reference point to work it out
    expect(response.body.case.input).toMatchObject({ chargeKg: 3.2, chargeReference: { subcoolingK: 6.2 } });
    const plain = await apprentice.get("/api/cases/wattle-lane-rtu1-c2-oily-flare");
    expect(plain.body.case.chargeQuestion).toBe(false);
  });

  it("marks an amount within the estimate's range right and one outside it wrong (Li & Braun 2009 range)", async () => {
    const inside = await apprentice.post("/api/attempts").send({
      caseId: REFERENCE_CASE,
      answers: { ...USUAL, chargeToAddKg: 0.7, reasoning: "2 K against its 6.2 K reference: about half a kilo short" },
    });
    expect(inside.status).toBe(201);
    const { score, expected } = inside.body.attempt;
    expect(score).toMatchObject({ total: 6, correctCount: 6, allCorrect: true });
    expect(chargeMark(score.marks)).toMatchObject({
      correct: true,
      expected: 0.55,
      rangeKg: { lowKg: 0.3, highKg: 0.8 },
    });
    // after the attempt the estimate itself is shown, with its basis
    expect(expected.chargeDeviation).toMatchObject({ kg: -0.55, basis: "unit-reference" });

    const outside = await apprentice.post("/api/attempts").send({
      caseId: REFERENCE_CASE,
      answers: { ...USUAL, chargeToAddKg: 1.2, reasoning: "topped up to be sure" },
    });
    expect(chargeMark(outside.body.attempt.score.marks)?.correct).toBe(false);
  });

  it("marks a blank right when the engine gives no estimate", async () => {
    const response = await apprentice.post("/api/attempts").send({
      caseId: NO_ESTIMATE_CASE,
      answers: {
        evaporatingTempC: -14,
        condensingTempC: 34,
        superheatK: 11,
        subcoolingK: 0.5,
        chargeState: "undercharged",
        chargeToAddKg: null,
        reasoning: "Receiver: no amount from subcooling",
      },
    });
    expect(response.status).toBe(201);
    expect(chargeMark(response.body.attempt.score.marks)).toMatchObject({
      correct: true,
      expected: null,
      rangeKg: null,
    });
    expect(response.body.attempt.expected.chargeDeviationNote).toMatch(/receiver/);
  });

  it("refuses a charge to add beyond any one circuit", async () => {
    const response = await apprentice
      .post("/api/attempts")
      .send({ caseId: REFERENCE_CASE, answers: { ...USUAL, chargeToAddKg: 900, reasoning: "x y z" } });
    expect(response.status).toBe(400);
  });

  it("asks a senior's own case the charge to add when it gives the circuit's correct charge", async () => {
    const without = await senior.post("/api/cases").send(authored);
    expect(without.status).toBe(201);
    expect(without.body.case.chargeQuestion).toBe(false);
    expect(without.body.case.expected).not.toHaveProperty("chargeDeviation");

    const withCharge = await senior
      .post("/api/cases")
      .send({ ...authored, input: { ...authored.input, chargeKg: 2.8 } });
    expect(withCharge.status).toBe(201);
    expect(withCharge.body.case.chargeQuestion).toBe(true);
    expect(withCharge.body.case.expected.chargeDeviation).toMatchObject({ basis: "generic" });
    expect(withCharge.body.case.expected.chargeDeviation.kg).toBeLessThan(0);
  });
});
