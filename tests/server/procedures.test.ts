import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  analyseDecay,
  judgeInsulationResistance,
  pressureTestResult,
  singlePhaseWindings,
  voltageImbalance,
} from "@shared/engine/index.ts";
import { ElectricalCheckListSchema } from "@shared/schemas/procedure-records.ts";
import { electricalCheckKind } from "@server/db/procedures.ts";
import { organisations, users } from "@server/db/schema.ts";
import { electricalCheckResult } from "@server/procedures/record-results.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn, signUpOtherCompany } from "../setup/demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

/**
 * Nitrogen hold worked example of a VRF maker, quoted in the trade notes §5.3 [S65]: charged to
 * 3.80 MPa g at 27 °C and read at 20 °C, the expected pressure is 3.71 MPa g, so a reading of
 * 3.73 MPa g is no leak. The rated pressure (4150 kPa) is the R32 wall split's design pressure
 * PS, commonly 4.15 MPa (trade notes §5.2, memory), entered by the technician as the app expects.
 */
const VRF_HOLD = {
  startGaugeKPa: 3800,
  startTempC: 27,
  endGaugeKPa: 3730,
  endTempC: 20,
  holdMinutes: 24 * 60,
  ratedKPa: 4150,
};

/** Pull-down then decay readings (microns) shaped like the three curves of the trade notes §4.1 [S58][S55][S54]. */
const PULL_DOWN = [
  { minutes: 0, microns: 25_000 },
  { minutes: 10, microns: 2_400 },
  { minutes: 20, microns: 700 },
  { minutes: 30, microns: 400 },
];
/** Stays under the 500 µm target after valving off: tight and dry [S52][S53]. */
const HELD = [420, 440, 450, 455].map((microns, index) => ({ minutes: 35 + index * 5, microns }));
/** Keeps rising in a straight line past 5000 µm: a leak [S54][S55]. */
const LEAKING = [1_400, 2_400, 3_400, 4_400, 5_400].map((microns, index) => ({ minutes: 35 + index * 5, microns }));

describe("procedure records API", () => {
  let testApp: TestApp;
  let technician: Agent;
  let senior: Agent;
  let apprentice: Agent;
  let outsider: Agent;
  let visitId: string;
  let organisationId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    const ids = await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    senior = await signedIn(testApp.app, BELLBIRD.senior);
    apprentice = await signedIn(testApp.app, BELLBIRD.apprentice);
    outsider = (await signUpOtherCompany(testApp.app)).agent;
    const [tech] = await testApp.database.db
      .select({ organisationId: users.organisationId })
      .from(users)
      .where(eq(users.id, ids[BELLBIRD.technician]!));
    organisationId = tech!.organisationId;
    const units = (await technician.get("/api/equipment")).body.equipment as { id: string; refrigerant: string }[];
    const rooftop = units.find((unit) => unit.refrigerant === "R407C")!;
    visitId = (
      await technician
        .post("/api/visits")
        .send({ equipmentId: rooftop.id, reason: "Leak repair, pressure test and evacuation" })
    ).body.visit.id;
  });
  afterAll(() => testApp.close());

  it("records an electrical check with the nameplate RLA filled in and every check judged by the engine", async () => {
    const response = await technician.post(`/api/visits/${visitId}/electrical-checks`).send({
      target: "compressor",
      circuit: 1,
      // The usual NEMA MG-1 worked example: 460, 467, 450 V → mean 459 V, largest deviation 9 V, 1.96 % [S43][S44].
      supplyVolts: [460, 467, 450],
      nameplateV: 460,
      insulation: [{ point: "C to earth", megohms: 1.2, testVoltageV: 500 }],
      windingOhms: [2.1, 2.12, 2.09],
      runningAmps: [10.4, 10.8, 10.6],
      // A client cannot store its own verdict: unknown keys are dropped and the server judges.
      result: { overall: { verdict: "pass" } },
    });
    expect(response.status).toBe(201);
    const { input, result } = response.body.electricalCheck;
    expect(input.ratedA).toBe(11.8); // the rooftop's compressor RLA (demo nameplate)
    expect(result.voltageImbalancePercent).toBeCloseTo(1.96, 2);
    expect(result.voltageImbalancePercent).toBe(voltageImbalance([460, 467, 450]));
    expect(result.voltageImbalance.verdict).toBe("pass"); // ≤ 2 %, the HVAC makers' maximum [S41][S42]
    // 1.2 MΩ on a hermetic compressor: below one maker's 2 MΩ, above a scroll maker's 0.5 MΩ [S48][S49] → warn.
    expect(result.insulation[0]).toEqual({
      ...judgeInsulationResistance({ megohms: 1.2, testVoltageV: 500, kind: "compressor" }),
      point: "C to earth",
    });
    expect(result.insulation[0].verdict).toBe("warn");
    expect(result.runningCurrent).toHaveLength(3);
    expect(result.runningCurrent.every((current: { verdict: string }) => current.verdict === "pass")).toBe(true);
    expect(result.overall).toMatchObject({ verdict: "warn", check: "Insulation C to earth" });
  });

  it("refuses an empty or malformed electrical check with field messages", async () => {
    const empty = await technician.post(`/api/visits/${visitId}/electrical-checks`).send({ target: "fan" });
    expect(empty.status).toBe(400);
    expect(empty.body.fields.supplyVolts).toMatch(/at least one measurement/);
    const bad = await technician
      .post(`/api/visits/${visitId}/electrical-checks`)
      .send({ target: "supply", supplyVolts: [415, "x", 410], runningAmps: [3] });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toEqual(expect.arrayContaining(["supplyVolts.1"]));
  });

  it("records a single-phase compressor's C–R, C–S, R–S and judges them by R–S = C–R + C–S ([S46]; memory)", async () => {
    const units = (await technician.get("/api/equipment")).body.equipment as { id: string; refrigerant: string }[];
    const wallSplit = units.find((unit) => unit.refrigerant === "R32")!; // single phase, 230 V, RLA 6.4 A (demo nameplate)
    const splitVisit = (
      await technician.post("/api/visits").send({ equipmentId: wallSplit.id, reason: "Compressor trips on start" })
    ).body.visit.id;
    // 1.9 + 4.6 = 6.5 Ω against 6.5 Ω read; start above run.
    const response = await technician.post(`/api/visits/${splitVisit}/electrical-checks`).send({
      target: "compressor",
      singlePhaseWindingOhms: { commonRun: 1.9, commonStart: 4.6, runStart: 6.5 },
      runningAmps: [5.8],
    });
    expect(response.status).toBe(201);
    const { input, result } = response.body.electricalCheck;
    expect(input.singlePhaseWindingOhms).toEqual({ commonRun: 1.9, commonStart: 4.6, runStart: 6.5 });
    expect(result.singlePhaseWindings).toEqual(
      singlePhaseWindings({ commonRun: 1.9, commonStart: 4.6, runStart: 6.5 }),
    );
    expect(result.singlePhaseWindings.verdict).toBe("pass");
    expect(result.overall.verdict).toBe("pass");
    // Open start winding read as a huge R–S: the sum is far off → fail, and the record says which check.
    const open = await technician
      .post(`/api/visits/${splitVisit}/electrical-checks`)
      .send({ target: "compressor", singlePhaseWindingOhms: { commonRun: 1.9, commonStart: 4.6, runStart: 40 } });
    expect(open.body.electricalCheck.result.overall).toMatchObject({
      verdict: "fail",
      check: "Windings C–R, C–S, R–S",
    });
    // The terminals are a compressor's, and incomplete readings are named by field.
    const onFan = await technician
      .post(`/api/visits/${splitVisit}/electrical-checks`)
      .send({ target: "fan", singlePhaseWindingOhms: { commonRun: 1, commonStart: 2, runStart: 3 } });
    expect(onFan.status).toBe(400);
    expect(onFan.body.fields.singlePhaseWindingOhms).toMatch(/single-phase compressor/);
    const partial = await technician
      .post(`/api/visits/${splitVisit}/electrical-checks`)
      .send({ target: "compressor", singlePhaseWindingOhms: { commonRun: 1.9, commonStart: -4 } });
    expect(partial.status).toBe(400);
    expect(Object.keys(partial.body.fields)).toEqual(
      expect.arrayContaining(["singlePhaseWindingOhms.commonStart", "singlePhaseWindingOhms.runStart"]),
    );
  });

  it("keeps electrical checks stored before single-phase windings readable", async () => {
    // A record as saved before: no singlePhaseWindingOhms in the input, no singlePhaseWindings in the result.
    const { singlePhaseWindingOhms: _input, ...oldInput } = {
      target: "fan" as const,
      circuit: 1,
      supplyVolts: null,
      nameplateV: null,
      insulation: [],
      windingOhms: null,
      singlePhaseWindingOhms: null,
      runningAmps: [3.1],
      ratedA: 3.4,
      note: null,
    };
    const { singlePhaseWindings: _result, ...oldResult } = electricalCheckResult({
      ...oldInput,
      singlePhaseWindingOhms: null,
    });
    await electricalCheckKind.insert(testApp.database.db, organisationId, {
      visitId,
      input: oldInput,
      result: oldResult,
      recordedBy: (await testApp.database.db.select({ id: users.id }).from(users).limit(1))[0]!.id,
    });
    const list = await technician.get(`/api/visits/${visitId}/electrical-checks`);
    expect(list.status).toBe(200);
    const parsed = ElectricalCheckListSchema.parse(list.body);
    expect(
      parsed.electricalChecks.some(
        (check) => check.input.target === "fan" && check.result.singlePhaseWindings === undefined,
      ),
    ).toBe(true);
  });

  it("records a leak search and judges an unrepaired leak as a fail", async () => {
    const response = await technician.post(`/api/visits/${visitId}/leak-searches`).send({
      method: "electronic-detector",
      placesChecked: ["Service valves", "Evaporator U-bends"],
      leaks: [{ location: "Schrader core, suction service valve", severity: "small", repaired: false }],
    });
    expect(response.status).toBe(201);
    expect(response.body.leakSearch.input.recheck).toBe("not-done");
    expect(response.body.leakSearch.result.verdict).toBe("fail");
    const noPlaces = await technician
      .post(`/api/visits/${visitId}/leak-searches`)
      .send({ method: "uv-dye", placesChecked: [] });
    expect(noPlaces.status).toBe(400);
    expect(noPlaces.body.fields.placesChecked).toBeDefined();
  });

  it("corrects the nitrogen hold for temperature as the worked example does and checks the rated pressure", async () => {
    const response = await technician
      .post(`/api/visits/${visitId}/pressure-tests`)
      .send({ ...VRF_HOLD, section: "whole-system" });
    expect(response.status).toBe(201);
    const { input, result } = response.body.pressureTest;
    expect(input.allowedDropKPa).toBe(10); // the app's default when the organisation sets none
    expect(input.testGaugeKPa).toBe(3800);
    // 3.71 MPa g expected at 20 °C [S65]; the 3.73 MPa g reading is no leak.
    expect(result.hold.expectedEndGaugeKPa / 1000).toBeCloseTo(3.71, 2);
    expect(result.hold.verdict).toBe("pass");
    expect(result.hold).toEqual(
      pressureTestResult({ startGaugeKPa: 3800, startTempC: 27, endGaugeKPa: 3730, endTempC: 20, allowedDropKPa: 10 }),
    );
    expect(result.testPressure.verdict).toBe("pass");
    expect(result.overall.verdict).toBe("pass");

    // Above the rating of the lowest-rated component: never allowed [S57][S63][S64].
    const over = await technician.post(`/api/visits/${visitId}/pressure-tests`).send({ ...VRF_HOLD, ratedKPa: 2900 });
    expect(over.body.pressureTest.result.testPressure.verdict).toBe("fail");
    expect(over.body.pressureTest.result.overall).toMatchObject({ verdict: "fail", check: "Test pressure" });

    const missing = await technician
      .post(`/api/visits/${visitId}/pressure-tests`)
      .send({ ...VRF_HOLD, startTempC: undefined, holdMinutes: 0 });
    expect(missing.status).toBe(400);
    expect(Object.keys(missing.body.fields)).toEqual(expect.arrayContaining(["startTempC", "holdMinutes"]));
  });

  it("adds vacuum readings over time, then judges the decay after the pump is valved off", async () => {
    const started = await technician.post(`/api/visits/${visitId}/evacuations`).send({});
    expect(started.status).toBe(201);
    const evacuationId = started.body.evacuation.id;
    expect(started.body.evacuation.targetMicrons).toBe(500); // the trade norm [S4] when the organisation sets none
    expect(started.body.evacuation.result.stage).toBe("pulling-down");

    let last;
    for (const sample of PULL_DOWN)
      last = await technician.post(`/api/visits/${visitId}/evacuations/${evacuationId}/samples`).send(sample);
    expect(last!.status).toBe(201);
    expect(last!.body.evacuation.result.reached).toEqual({ reached: true, atMinutes: 30 });

    const earlier = await technician
      .post(`/api/visits/${visitId}/evacuations/${evacuationId}/samples`)
      .send({ minutes: 12, microns: 900 });
    expect(earlier.status).toBe(400);
    expect(earlier.body.fields.minutes).toMatch(/later than/);

    // Samples only add to the series: the version a device holds for valving off stays good.
    expect(last!.body.evacuation.version).toBe(1);
    const isolated = await technician
      .patch(`/api/visits/${visitId}/evacuations/${evacuationId}`)
      .set("If-Match", '"1"')
      .send({ isolatedAtMinutes: 30 });
    expect(isolated.body.evacuation.result.stage).toBe("decay-test");
    expect(isolated.body.evacuation.version).toBe(2);
    const stale = await technician
      .patch(`/api/visits/${visitId}/evacuations/${evacuationId}`)
      .set("If-Match", '"1"')
      .send({ targetMicrons: 250 });
    expect(stale.status).toBe(409);
    expect(stale.body.message).toMatch(/A newer version of this evacuation was saved/);
    for (const sample of HELD)
      last = await technician.post(`/api/visits/${visitId}/evacuations/${evacuationId}/samples`).send(sample);
    const { result } = last!.body.evacuation;
    expect(result.stage).toBe("judged");
    expect(result.decay.verdict).toBe("held");
    expect(result.decay).toEqual(analyseDecay([PULL_DOWN.at(-1)!, ...HELD], { targetMicrons: 500 }));
    expect(result.overall.verdict).toBe("pass");
    expect(result.decayMinutes).toBe(20);

    const list = await apprentice.get(`/api/visits/${visitId}/evacuations`);
    expect(list.status).toBe(200);
    expect(list.body.evacuations).toHaveLength(1);
    expect(list.body.defaults.targetMicrons).toBe(500);
  });

  it("calls a decay that keeps rising past 5000 microns a leak", async () => {
    const response = await technician
      .post(`/api/visits/${visitId}/evacuations`)
      .send({ samples: [...PULL_DOWN, ...LEAKING], isolatedAtMinutes: 30 });
    expect(response.status).toBe(201);
    expect(response.body.evacuation.result.decay.verdict).toBe("leak");
    expect(response.body.evacuation.result.decay.riseRateMicronsPerMinute).toBeGreaterThan(100);
    expect(response.body.evacuation.result.overall.verdict).toBe("fail");
  });

  it("uses the organisation's evacuation target and allowed drop when it sets them", async () => {
    await testApp.database.db
      .update(organisations)
      .set({
        settings: { procedureLimits: { evacuation: { targetMicrons: 300 }, pressureHold: { allowedDropKPa: 5 } } },
      })
      .where(eq(organisations.id, organisationId));
    const evacuations = await technician.get(`/api/visits/${visitId}/evacuations`);
    expect(evacuations.body.defaults.targetMicrons).toBe(300);
    const started = await technician.post(`/api/visits/${visitId}/evacuations`).send({});
    expect(started.body.evacuation.targetMicrons).toBe(300);
    const tests = await technician.get(`/api/visits/${visitId}/pressure-tests`);
    expect(tests.body.defaults).toMatchObject({ allowedDropKPa: 5, ratedHighSideKPa: 2900, ratedLowSideKPa: 1700 });
    const test = await technician.post(`/api/visits/${visitId}/pressure-tests`).send(VRF_HOLD);
    expect(test.body.pressureTest.input.allowedDropKPa).toBe(5);
    await testApp.database.db.update(organisations).set({ settings: {} }).where(eq(organisations.id, organisationId));
  });

  it("lets apprentices read but not record", async () => {
    expect((await apprentice.get(`/api/visits/${visitId}/electrical-checks`)).status).toBe(200);
    expect((await apprentice.get(`/api/visits/${visitId}/leak-searches`)).body.leakSearches).toHaveLength(1);
    expect((await apprentice.post(`/api/visits/${visitId}/pressure-tests`).send(VRF_HOLD)).status).toBe(403);
    expect((await apprentice.post(`/api/visits/${visitId}/evacuations`).send({})).status).toBe(403);
  });

  it("hides every procedure record from another organisation behind 404", async () => {
    const evacuationId = (await technician.get(`/api/visits/${visitId}/evacuations`)).body.evacuations[0].id;
    for (const kind of ["electrical-checks", "leak-searches", "pressure-tests", "evacuations"]) {
      expect((await outsider.get(`/api/visits/${visitId}/${kind}`)).status).toBe(404);
    }
    expect((await outsider.post(`/api/visits/${visitId}/pressure-tests`).send(VRF_HOLD)).status).toBe(404);
    expect(
      (await outsider.post(`/api/visits/${visitId}/evacuations/${evacuationId}/samples`).send({ microns: 300 })).status,
    ).toBe(404);
    expect(
      (await technician.post(`/api/visits/${visitId}/evacuations/not-a-uuid/samples`).send({ microns: 300 })).status,
    ).toBe(404);
  });

  it("closes the records once the visit is signed off (409)", async () => {
    const evacuationId = (await technician.get(`/api/visits/${visitId}/evacuations`)).body.evacuations[0].id;
    expect((await senior.post(`/api/visits/${visitId}/review`).send({ action: "sign-off" })).status).toBe(200);
    expect((await technician.post(`/api/visits/${visitId}/pressure-tests`).send(VRF_HOLD)).status).toBe(409);
    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/leak-searches`)
          .send({ method: "uv-dye", placesChecked: ["Coil"] })
      ).status,
    ).toBe(409);
    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/electrical-checks`)
          .send({ target: "supply", supplyVolts: [415, 415, 415] })
      ).status,
    ).toBe(409);
    expect(
      (await technician.post(`/api/visits/${visitId}/evacuations/${evacuationId}/samples`).send({ microns: 300 }))
        .status,
    ).toBe(409);
    expect(
      (
        await technician
          .patch(`/api/visits/${visitId}/evacuations/${evacuationId}`)
          .set("If-Match", '"1"')
          .send({ isolatedAtMinutes: null })
      ).status,
    ).toBe(409);
  });
});
