import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";

// A built-in case that asks about the measured cycle (issue 18): R407C RTU-1, circuit 1.
const CYCLE_CASE = "wattle-lane-rtu1-c1-cycle-on-the-chart";
/** The usual five answers, right for that case (dew 7 °C, bubble 45 °C, 6 K and 5 K, normal). */
const USUAL = { evaporatingTempC: 7, condensingTempC: 45, superheatK: 6, subcoolingK: 5, chargeState: "normal" };

describe("casebook API: measured-cycle questions", () => {
  let testApp: TestApp;
  let apprentice: Awaited<ReturnType<typeof signedIn>>;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    apprentice = await signedIn(testApp.app, BELLBIRD.apprentice);
  });
  afterAll(() => testApp.close());

  it("says which cycle questions a case asks, without the answers", async () => {
    const response = await apprentice.get(`/api/cases/${CYCLE_CASE}`);
    expect(response.status).toBe(200);
    expect(response.body.case.cycleQuestions).toEqual(["refrigeratingEffectKJPerKg", "dischargeSuperheatK"]);
    expect(response.body.case.expected).toBeNull();
    const plain = await apprentice.get("/api/cases/wattle-lane-rtu1-c2-oily-flare");
    expect(plain.body.case.cycleQuestions).toEqual([]);
  });

  it("marks the refrigerating effect within ±5 kJ/kg and the discharge superheat within ±0.5 K", async () => {
    const response = await apprentice.post("/api/attempts").send({
      caseId: CYCLE_CASE,
      answers: {
        ...USUAL,
        reasoning: "Both on target; read the enthalpies off the chart",
        // the stored answers are 158.343 kJ/kg and 23.312 K (data/casebook/built-in-cases.json)
        refrigeratingEffectKJPerKg: 155,
        dischargeSuperheatK: 24,
      },
    });
    expect(response.status).toBe(201);
    const { score } = response.body.attempt;
    expect(score.total).toBe(7);
    const byField = Object.fromEntries(
      score.marks.map((mark: { field: string; correct: boolean }) => [mark.field, mark.correct]),
    );
    expect(byField).toMatchObject({ refrigeratingEffectKJPerKg: true, dischargeSuperheatK: false });
  });

  it("refuses a refrigerating effect outside the schema's range", async () => {
    const response = await apprentice
      .post("/api/attempts")
      .send({ caseId: CYCLE_CASE, answers: { ...USUAL, reasoning: "x y z", refrigeratingEffectKJPerKg: -3 } });
    expect(response.status).toBe(400);
  });
});
