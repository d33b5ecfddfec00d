import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoSite } from "@server/db/seed/demo-scenario.ts";
import { atmosphericPressureAtAltitude, saturationPressure } from "@shared/engine/index.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { demoUnitIds, openVisit } from "../setup/demo-units.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

const ATMOSPHERE = atmosphericPressureAtAltitude(demoSite.altitudeM);
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  Number((saturationPressure("R407C", temperatureC, point) - ATMOSPHERE).toFixed(1));
const reading = (suctionLineTempC: number) => ({
  circuit: 1,
  suctionPressureKPa: gauge(6, "dew"),
  suctionLineTempC,
  liquidPressureKPa: gauge(42, "bubble"),
  liquidLineTempC: 37,
  runMinutes: 20,
});
/** The mistyped nitrogen test of the issue: 3 500 kPa entered for a 350 kPa hold that dropped. */
const MISTYPED_TEST = {
  startGaugeKPa: 3500,
  startTempC: 20,
  endGaugeKPa: 330,
  endTempC: 20,
  holdMinutes: 30,
  ratedKPa: 1700,
  section: "low-side",
};

describe("records are corrected by voiding, never lost; closed visits take nothing until reopened", () => {
  let testApp: TestApp;
  let technician: Agent;
  let senior: Agent;
  let owner: Agent;
  let rooftopId: string;
  let visitId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    senior = await signedIn(testApp.app, BELLBIRD.senior);
    owner = await signedIn(testApp.app, BELLBIRD.owner);
    rooftopId = (await demoUnitIds(technician)).rooftop;
    visitId = await openVisit(technician, rooftopId, "Leak repair and recharge");
  });
  afterAll(() => testApp.close());

  const visit = async () => (await technician.get(`/api/visits/${visitId}`)).body.visit;
  const voidIt = (agent: Agent, body: object) => agent.post(`/api/visits/${visitId}/voids`).send(body);

  it("voids a reading with a reason: kept and listed, left out of the count, the trend and the equipment's last settled state", async () => {
    const kept = (await technician.post(`/api/visits/${visitId}/readings`).send(reading(12))).body.reading;
    const wrong = (
      await technician.post(`/api/visits/${visitId}/readings`).send({ ...reading(12), liquidLineTempC: 10 })
    ).body.reading;
    expect((await visit()).readingCount).toBe(2);

    expect((await voidIt(technician, { kind: "reading", recordId: wrong.id, reason: "" })).status).toBe(400);
    const voided = await voidIt(technician, {
      kind: "reading",
      recordId: wrong.id,
      reason: "Probe on the discharge line, not the liquid line",
    });
    expect(voided.status).toBe(201);
    expect(voided.body.event).toMatchObject({
      action: "voided",
      recordKind: "reading",
      recordId: wrong.id,
      reason: "Probe on the discharge line, not the liquid line",
      actor: { name: "Sam Toko" },
    });

    const after = await visit();
    expect(after.readings.map((entry: { id: string }) => entry.id)).toEqual([kept.id, wrong.id]);
    expect(after.readings[1].voided).toMatchObject({
      by: { name: "Sam Toko" },
      reason: "Probe on the discharge line, not the liquid line",
    });
    expect(after.readings[0].voided).toBeNull();
    expect(after.readingCount).toBe(1);
    const detail = (await technician.get(`/api/equipment/${rooftopId}`)).body;
    expect(detail.visits.find((entry: { id: string }) => entry.id === visitId).readingCount).toBe(1);

    const again = await voidIt(technician, { kind: "reading", recordId: wrong.id, reason: "Twice" });
    expect(again.status).toBe(409);
    expect(again.body.message).toMatch(/already void/);
    expect((await voidIt(technician, { kind: "adjustment", recordId: wrong.id, reason: "Wrong kind" })).status).toBe(
      404,
    );
    // A voided reading is no evidence: it cannot become a casebook case.
    expect((await senior.post("/api/cases/from-reading").send({ readingId: wrong.id })).status).toBe(404);
  });

  it("voids a pressure test: it stays listed, struck, with who and why, and the trail names it", async () => {
    const test = (await technician.post(`/api/visits/${visitId}/pressure-tests`).send(MISTYPED_TEST)).body.pressureTest;
    expect(test.result.overall.verdict).toBe("fail");
    expect(
      (await voidIt(technician, { kind: "pressure-test", recordId: test.id, reason: "Typed 3500 for 350 kPa" })).status,
    ).toBe(201);
    const retyped = await technician
      .post(`/api/visits/${visitId}/pressure-tests`)
      .send({ ...MISTYPED_TEST, startGaugeKPa: 350, endGaugeKPa: 349 });
    expect(retyped.status).toBe(201);
    const list = (await technician.get(`/api/visits/${visitId}/pressure-tests`)).body.pressureTests;
    expect(list).toHaveLength(2);
    expect(list[0].voided).toMatchObject({ reason: "Typed 3500 for 350 kPa", by: { name: "Sam Toko" } });
    expect(list[1].voided).toBeNull();
    const trail = (await visit()).events;
    expect(trail.at(-1)).toMatchObject({
      action: "voided",
      recordKind: "pressure-test",
      summary: "Pressure test: 3500 to 330 kPa gauge over 30 min",
      reason: "Typed 3500 for 350 kPa",
    });
  });

  it("voids an adjustment: its charge entry no longer counts, in the run log or the register", async () => {
    const supply = (await technician.get("/api/cylinders?refrigerant=R407C")).body.cylinders.find(
      (cylinder: { kind: string }) => cylinder.kind === "new",
    );
    const adjustment = (
      await technician
        .post(`/api/visits/${visitId}/adjustments`)
        .send({ circuit: 1, kind: "charge-added", description: "Added 0.4 kg", amountKg: 0.4, cylinderId: supply.id })
    ).body.adjustment;
    expect((await technician.get(`/api/visits/${visitId}/refrigerant`)).body.runLogCheck).toMatchObject({
      runLogInKg: 0.4,
      registerInKg: 0.4,
    });
    expect(
      (await voidIt(technician, { kind: "adjustment", recordId: adjustment.id, reason: "Logged on the wrong unit" }))
        .status,
    ).toBe(201);
    expect((await technician.get(`/api/visits/${visitId}/refrigerant`)).body.runLogCheck).toMatchObject({
      runLogInKg: 0,
      registerInKg: 0,
      agrees: true,
    });
    expect((await visit()).adjustments[0].voided.reason).toBe("Logged on the wrong unit");
  });

  it("voids a register movement: out of the balance, the cylinder's contents, the register, its totals and its export", async () => {
    const cylinders = (await technician.get("/api/cylinders?refrigerant=R407C")).body.cylinders;
    const supply = cylinders.find((cylinder: { kind: string }) => cylinder.kind === "new");
    const before = supply.contentsKg;
    const added = (
      await technician
        .post(`/api/visits/${visitId}/refrigerant`)
        .send({ kind: "added-new", kg: 1.25, circuit: 1, cylinderId: supply.id })
    ).body.movement;
    expect((await technician.get(`/api/cylinders/${supply.id}`)).body.cylinder.contentsKg).toBeCloseTo(
      before - 1.25,
      6,
    );
    const inRegister = async () =>
      (await owner.get("/api/register")).body.movements.some((movement: { id: string }) => movement.id === added.id);
    expect(await inRegister()).toBe(true);

    expect(
      (await voidIt(technician, { kind: "movement", recordId: added.id, reason: "Weighed on the wrong scale" })).status,
    ).toBe(201);
    expect((await technician.get(`/api/cylinders/${supply.id}`)).body.cylinder.contentsKg).toBeCloseTo(before, 6);
    const register = (await technician.get(`/api/visits/${visitId}/refrigerant`)).body;
    expect(register.circuits[0].addedKg).toBe(0);
    expect(register.movements.find((movement: { id: string }) => movement.id === added.id).voided.reason).toBe(
      "Weighed on the wrong scale",
    );
    expect(await inRegister()).toBe(false);
    expect((await owner.get("/api/register/export.csv")).text).not.toContain("1.25");
    // The cylinder's own history keeps it, struck.
    expect(
      (await technician.get(`/api/cylinders/${supply.id}`)).body.movements.find(
        (movement: { id: string }) => movement.id === added.id,
      ).voided,
    ).not.toBeNull();
  });

  it("refuses a void that would leave more reused than recovered", async () => {
    const recovery = (await technician.get("/api/cylinders?refrigerant=R407C")).body.cylinders.find(
      (cylinder: { kind: string }) => cylinder.kind === "recovery",
    );
    const recovered = (
      await technician
        .post(`/api/visits/${visitId}/refrigerant`)
        .send({ kind: "recovered", kg: 1, circuit: 2, cylinderId: recovery.id })
    ).body.movement;
    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/refrigerant`)
          .send({ kind: "reused", kg: 1, circuit: 2, cylinderId: recovery.id })
      ).status,
    ).toBe(201);
    const refused = await voidIt(technician, { kind: "movement", recordId: recovered.id, reason: "Entered twice" });
    expect(refused.status).toBe(409);
    expect(refused.body.message).toMatch(/more reused on circuit 2/);
    expect((await technician.get(`/api/visits/${visitId}/refrigerant`)).body.circuits[1].recoveredKg).toBe(1);
  });

  it("keeps an awaiting-review visit closed to entries and voids, with a clear message", async () => {
    const reading1 = (await visit()).readings[0];
    expect((await technician.post(`/api/visits/${visitId}/review`).send({ action: "submit" })).status).toBe(200);
    const refused = await technician.post(`/api/visits/${visitId}/readings`).send(reading(12.5));
    expect(refused.status).toBe(409);
    expect(refused.body.message).toMatch(/awaiting review: nothing more can be recorded or voided/);
    expect((await voidIt(technician, { kind: "reading", recordId: reading1.id, reason: "Too late" })).status).toBe(409);
    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/leak-searches`)
          .send({ method: "uv-dye", placesChecked: ["Coil"] })
      ).status,
    ).toBe(409);
    // The reviewer can still comment while reviewing.
    expect(
      (await senior.post(`/api/visits/${visitId}/comments`).send({ body: "Check circuit 2 superheat" })).status,
    ).toBe(201);
  });

  it("lets only a senior or an owner reopen, with a reason that goes in the audit trail", async () => {
    expect(
      (await senior.post(`/api/visits/${visitId}/review`).send({ action: "sign-off", note: "Good work" })).status,
    ).toBe(200);
    expect(
      (await technician.post(`/api/visits/${visitId}/adjustments`).send({ kind: "other", description: "Late note" }))
        .status,
    ).toBe(409);
    expect((await technician.post(`/api/visits/${visitId}/comments`).send({ body: "After sign-off" })).status).toBe(
      409,
    );

    const byTechnician = await technician
      .post(`/api/visits/${visitId}/review`)
      .send({ action: "reopen", reason: "I want to add a reading" });
    expect(byTechnician.status).toBe(403);
    expect((await senior.post(`/api/visits/${visitId}/review`).send({ action: "reopen", reason: "" })).status).toBe(
      400,
    );
    const reopened = await senior
      .post(`/api/visits/${visitId}/review`)
      .send({ action: "reopen", reason: "Evacuation readings were left out" });
    expect(reopened.status).toBe(200);
    expect(reopened.body.visit).toMatchObject({ status: "open", signedOffBy: null, signedOffAt: null });
    expect(
      (await senior.post(`/api/visits/${visitId}/review`).send({ action: "reopen", reason: "Again" })).status,
    ).toBe(409);

    const trail = reopened.body.visit.events.map(
      (event: { action: string; reason: string | null; actor: { name: string } }) => [
        event.action,
        event.reason,
        event.actor.name,
      ],
    );
    expect(trail).toEqual(
      expect.arrayContaining([
        ["started", null, "Sam Toko"],
        ["submitted", null, "Sam Toko"],
        ["signed-off", "Good work", "Priya Raman"],
        ["reopened", "Evacuation readings were left out", "Priya Raman"],
      ]),
    );
    expect(trail.findIndex((entry: string[]) => entry[0] === "signed-off")).toBeLessThan(
      trail.findIndex((entry: string[]) => entry[0] === "reopened"),
    );
    // Open again: entries are taken.
    expect((await technician.post(`/api/visits/${visitId}/readings`).send(reading(12.5))).status).toBe(201);
  });

  it("voids an evacuation, after which it takes no more readings or changes", async () => {
    const evacuation = (
      await technician.post(`/api/visits/${visitId}/evacuations`).send({ samples: [{ minutes: 0, microns: 20_000 }] })
    ).body.evacuation;
    expect(
      (await voidIt(technician, { kind: "evacuation", recordId: evacuation.id, reason: "Gauge was not connected" }))
        .status,
    ).toBe(201);
    const sample = await technician
      .post(`/api/visits/${visitId}/evacuations/${evacuation.id}/samples`)
      .send({ microns: 500, minutes: 5 });
    expect(sample.status).toBe(409);
    expect(sample.body.message).toMatch(/void/);
    expect(
      (
        await technician
          .patch(`/api/visits/${visitId}/evacuations/${evacuation.id}`)
          .set("If-Match", '"1"')
          .send({ isolatedAtMinutes: 5 })
      ).status,
    ).toBe(409);
  });

  it("has no delete route for any visit record", async () => {
    const current = await visit();
    for (const path of [
      `readings/${current.readings[0].id}`,
      `adjustments/${current.adjustments[0].id}`,
      "refrigerant/charging/1",
    ]) {
      expect((await technician.delete(`/api/visits/${visitId}/${path}`)).status).toBe(404);
    }
  });
});
