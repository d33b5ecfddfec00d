import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  adjustments,
  electricalChecks,
  evacuations,
  photos,
  readings,
  refrigerantMovements,
  visitEvents,
} from "@server/db/schema.ts";
import { electricalCheckKind } from "@server/db/procedures.ts";
import { demoSite } from "@server/db/seed/demo-scenario.ts";
import { insertEntryOnce } from "@server/db/store-once.ts";
import { atmosphericPressureAtAltitude, saturationPressure } from "@shared/engine/index.ts";
import { DEVICE_CLOCK_SKEW_MS } from "@shared/schemas/device-entries.ts";
import { createTestApp, type TestApp } from "../../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn, signUpOtherCompany } from "../../setup/demo-accounts.ts";
import { startRooftopVisit, startVisitAt } from "../../setup/stored-readings.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

const MINUTE = 60_000;
const ATMOSPHERE = atmosphericPressureAtAltitude(demoSite.altitudeM);
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  Number((saturationPressure("R407C", temperatureC, point) - ATMOSPHERE).toFixed(1));
/** A rooftop-unit reading; `suctionLineTempC` tells readings apart. */
const reading = (suctionLineTempC: number, extra: Record<string, unknown> = {}) => ({
  circuit: 1,
  suctionPressureKPa: gauge(5, "dew"),
  suctionLineTempC,
  liquidPressureKPa: gauge(42, "bubble"),
  liquidLineTempC: 37,
  ...extra,
});
const ago = (minutes: number) => new Date(Date.now() - minutes * MINUTE).toISOString();

// Issue 17: writes sent again from a device (its answer lost) are stored once; device times are kept, within bounds.
describe("entries made on a device", () => {
  let testApp: TestApp;
  let technician: Agent;
  let outsider: Agent;
  let visitId: string;
  let outsiderVisitId: string;

  const rowsOf = <Row extends { visitId: string | null }>(table: { visitId: unknown } & object, id = visitId) =>
    testApp.database.db
      .select()
      .from(table as typeof readings)
      .where(eq((table as typeof readings).visitId, id)) as unknown as Promise<Row[]>;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    visitId = await startRooftopVisit(technician, "Offline on the roof");
    await startVisitAt(testApp, visitId, new Date(Date.now() - 3 * 60 * MINUTE));

    // Another company with a unit and a visit of its own.
    outsider = (await signUpOtherCompany(testApp.app)).agent;
    const customer = (await outsider.post("/api/customers").send({ name: "Depot owner" })).body.customer;
    const site = (await outsider.post("/api/sites").send({ customerId: customer.id, name: "Depot" })).body.site;
    const unit = (
      await outsider.post("/api/equipment").send({
        siteId: site.id,
        name: "Depot RTU",
        kind: "packaged rooftop",
        refrigerant: "R407C",
        circuits: [{ number: 1, factoryChargeKg: 5, meteringDevice: "txv", targetSuperheatK: 6, targetSubcoolingK: 5 }],
      })
    ).body.equipment;
    outsiderVisitId = (await outsider.post("/api/visits").send({ equipmentId: unit.id, reason: "Their own visit" }))
      .body.visit.id;
  });
  afterAll(() => testApp.close());

  it("stores a reading sent twice with one client id once, and answers both sends with it", async () => {
    const clientId = randomUUID();
    const first = await technician
      .post(`/api/visits/${visitId}/readings`)
      .send(reading(11, { clientId, takenAt: ago(30) }));
    expect(first.status).toBe(201);
    expect(first.headers["idempotent-replayed"]).toBeUndefined();
    const again = await technician
      .post(`/api/visits/${visitId}/readings`)
      .send(reading(11, { clientId, takenAt: ago(30) }));
    expect(again.status).toBe(201);
    expect(again.headers["idempotent-replayed"]).toBe("true");
    expect(again.body.reading).toEqual(first.body.reading);
    const stored = (await rowsOf<typeof readings.$inferSelect>(readings)).filter((row) => row.clientId === clientId);
    expect(stored).toHaveLength(1);
  });

  it("stores two concurrent sends of one reading once, in one batch or against a stored row, and both get the stored reading", async () => {
    const clientId = randomUUID();
    const sends = await Promise.all(
      [0, 1, 2].map(() => technician.post(`/api/visits/${visitId}/readings`).send(reading(12, { clientId }))),
    );
    expect(sends.map((send) => send.status)).toEqual([201, 201, 201]);
    expect(new Set(sends.map((send) => send.body.reading.id)).size).toBe(1);
    expect(sends.filter((send) => send.headers["idempotent-replayed"] === "true")).toHaveLength(2);
    expect(
      (await rowsOf<typeof readings.$inferSelect>(readings)).filter((row) => row.clientId === clientId),
    ).toHaveLength(1);

    // A repeat saved with new readings beside it, one of them refused: the others are stored, the repeat answered.
    const fresh = randomUUID();
    const batch = await Promise.all([
      technician.post(`/api/visits/${visitId}/readings`).send(reading(12, { clientId })),
      technician.post(`/api/visits/${visitId}/readings`).send(reading(12.5, { clientId: fresh })),
      technician.post(`/api/visits/${visitId}/readings`).send(reading(12.6, { circuit: 9, clientId: randomUUID() })),
    ]);
    expect(batch.map((send) => send.status)).toEqual([201, 201, 400]);
    expect(batch[0]!.body.reading.id).toBe(sends[0]!.body.reading.id);
    expect((await rowsOf<typeof readings.$inferSelect>(readings)).filter((row) => row.clientId === fresh)).toHaveLength(
      1,
    );
  });

  it("answers a repeat with the stored reading after the visit was submitted, instead of refusing it", async () => {
    const visit = await startRooftopVisit(technician, "Submitted meanwhile");
    const clientId = randomUUID();
    const first = await technician.post(`/api/visits/${visit}/readings`).send(reading(13, { clientId }));
    expect(first.status).toBe(201);
    expect((await technician.post(`/api/visits/${visit}/review`).send({ action: "submit" })).status).toBe(200);
    const again = await technician.post(`/api/visits/${visit}/readings`).send(reading(13, { clientId }));
    expect(again.status).toBe(201);
    expect(again.body.reading.id).toBe(first.body.reading.id);
    expect(
      (await technician.post(`/api/visits/${visit}/readings`).send(reading(13, { clientId: randomUUID() }))).status,
    ).toBe(409);
  });

  it("gives another company, or another visit, using the same client id a record of its own", async () => {
    const clientId = randomUUID();
    const ours = await technician.post(`/api/visits/${visitId}/readings`).send(reading(14, { clientId }));
    const theirs = await outsider.post(`/api/visits/${outsiderVisitId}/readings`).send(reading(14.5, { clientId }));
    expect(theirs.status).toBe(201);
    expect(theirs.headers["idempotent-replayed"]).toBeUndefined();
    expect(theirs.body.reading.id).not.toBe(ours.body.reading.id);
    expect(theirs.body.reading.input.suctionLineTempC).toBe(14.5);
    // Naming our visit finds nothing of ours: the visit is missing for them.
    expect((await outsider.post(`/api/visits/${visitId}/readings`).send(reading(14, { clientId }))).status).toBe(404);
    const otherVisit = await startRooftopVisit(technician, "Same id, another visit");
    const elsewhere = await technician.post(`/api/visits/${otherVisit}/readings`).send(reading(14.7, { clientId }));
    expect(elsewhere.status).toBe(201);
    expect(elsewhere.body.reading.id).not.toBe(ours.body.reading.id);
    // Another kind of record with the same id is its own record too.
    const adjustment = await technician
      .post(`/api/visits/${visitId}/adjustments`)
      .send({ kind: "airflow", description: "Filters cleaned", clientId });
    expect(adjustment.status).toBe(201);
    expect(adjustment.headers["idempotent-replayed"]).toBeUndefined();
  });

  it("stores an adjustment sent twice once", async () => {
    const clientId = randomUUID();
    const body = { circuit: 1, kind: "metering", description: "Opened the TXV a quarter turn", at: ago(20), clientId };
    const first = await technician.post(`/api/visits/${visitId}/adjustments`).send(body);
    const again = await technician.post(`/api/visits/${visitId}/adjustments`).send(body);
    expect([first.status, again.status]).toEqual([201, 201]);
    expect(again.body.adjustment).toEqual(first.body.adjustment);
    expect(
      (await rowsOf<typeof adjustments.$inferSelect>(adjustments)).filter((row) => row.clientId === clientId),
    ).toHaveLength(1);
  });

  it("stores a refrigerant movement sent twice once, with one run-log adjustment", async () => {
    const cylinders = (await technician.get("/api/cylinders?refrigerant=R407C")).body.cylinders as {
      id: string;
      kind: string;
    }[];
    const recovery = cylinders.find((cylinder) => cylinder.kind === "recovery")!.id;
    const clientId = randomUUID();
    const body = { kind: "recovered", kg: 0.4, circuit: 1, cylinderId: recovery, clientId };
    const [first, again] = await Promise.all(
      [0, 1].map(() => technician.post(`/api/visits/${visitId}/refrigerant`).send(body)),
    );
    expect([first!.status, again!.status]).toEqual([201, 201]);
    expect(again!.body.movement.id).toBe(first!.body.movement.id);
    const movements = (await rowsOf<typeof refrigerantMovements.$inferSelect>(refrigerantMovements)).filter(
      (row) => row.clientId === clientId,
    );
    expect(movements).toHaveLength(1);
    expect(
      (await rowsOf<typeof adjustments.$inferSelect>(adjustments)).filter((row) => row.movementId === movements[0]!.id),
    ).toHaveLength(1);
  });

  it("stores a procedure record sent twice once, keeping the device's time", async () => {
    const clientId = randomUUID();
    const takenAt = ago(45);
    const body = { target: "supply", supplyVolts: [229], nameplateV: 230, clientId, takenAt };
    const [first, again] = await Promise.all(
      [0, 1].map(() => technician.post(`/api/visits/${visitId}/electrical-checks`).send(body)),
    );
    expect([first!.status, again!.status]).toEqual([201, 201]);
    expect(again!.body.electricalCheck).toEqual(first!.body.electricalCheck);
    expect(first!.body.electricalCheck.takenAt).toBe(takenAt);
    // Neither the client id nor the time goes into the stored input.
    expect(first!.body.electricalCheck.input).not.toHaveProperty("clientId");
    expect(first!.body.electricalCheck.input).not.toHaveProperty("takenAt");
    expect(
      (await rowsOf<typeof electricalChecks.$inferSelect>(electricalChecks)).filter((row) => row.clientId === clientId),
    ).toHaveLength(1);
  });

  it("lets the unique index decide between two inserts of one client id that both got past the first look", async () => {
    const [row] = await testApp.database.db
      .select()
      .from(electricalChecks)
      .where(eq(electricalChecks.visitId, visitId))
      .limit(1);
    const clientId = randomUUID();
    const values = {
      organisationId: row!.organisationId,
      visitId,
      target: "supply",
      input: row!.input,
      result: row!.result,
      recordedBy: row!.recordedBy,
      clientId,
    };
    // Outside the visit's lock on purpose: nothing but the index stands between them.
    const [first, second] = await Promise.all([
      insertEntryOnce(testApp.database.db, electricalCheckKind.entries, values),
      insertEntryOnce(testApp.database.db, electricalCheckKind.entries, values),
    ]);
    expect([first.replayed, second.replayed].sort()).toEqual([false, true]);
    expect(second.entry.id).toBe(first.entry.id);
  });

  it("adds an evacuation sample sent twice once", async () => {
    const evacuation = await technician
      .post(`/api/visits/${visitId}/evacuations`)
      .send({ targetMicrons: 500, samples: [{ minutes: 0, microns: 5000 }], clientId: randomUUID() });
    expect(evacuation.status).toBe(201);
    const path = `/api/visits/${visitId}/evacuations/${evacuation.body.evacuation.id}/samples`;
    const clientId = randomUUID();
    const [first, again] = await Promise.all(
      [0, 1].map(() => technician.post(path).send({ microns: 900, minutes: 10, clientId })),
    );
    expect([first!.status, again!.status]).toEqual([201, 201]);
    expect([first!.headers["idempotent-replayed"], again!.headers["idempotent-replayed"]].filter(Boolean)).toEqual([
      "true",
    ]);
    const [row] = await testApp.database.db
      .select()
      .from(evacuations)
      .where(eq(evacuations.id, evacuation.body.evacuation.id));
    expect(row!.samples.map((sample) => sample.microns)).toEqual([5000, 900]);
    // Sent once more later, after another sample: still answered, not refused as out of order.
    expect((await technician.post(path).send({ microns: 700, minutes: 15 })).status).toBe(201);
    const late = await technician.post(path).send({ microns: 900, minutes: 10, clientId });
    expect(late.status).toBe(201);
    expect(late.body.evacuation.samples).toHaveLength(3);
  });

  it("takes the readings of an evacuation started offline by the client id the device gave it", async () => {
    const evacuationClientId = randomUUID();
    // Sent from the outbox in order: the evacuation, then its readings, which name it by its client id.
    const started = await technician
      .post(`/api/visits/${visitId}/evacuations`)
      .send({ targetMicrons: 500, clientId: evacuationClientId, startedAt: ago(20) });
    expect(started.status).toBe(201);
    expect(started.body.evacuation.clientId).toBe(evacuationClientId);
    const sample = await technician
      .post(`/api/visits/${visitId}/evacuations/${evacuationClientId}/samples`)
      .send({ microns: 1200, minutes: 15, clientId: randomUUID() });
    expect(sample.status).toBe(201);
    expect(sample.body.evacuation.id).toBe(started.body.evacuation.id);
    expect(sample.body.evacuation.samples).toEqual([expect.objectContaining({ minutes: 15, microns: 1200 })]);
    // Another visit's evacuation is not reached through this one's path.
    expect(
      (
        await outsider
          .post(`/api/visits/${outsiderVisitId}/evacuations/${evacuationClientId}/samples`)
          .send({ microns: 900, minutes: 16 })
      ).status,
    ).toBe(404);
  });

  it("makes a void sent twice once, answering the repeat with its line; another reason is still refused as already void", async () => {
    const stored = await technician
      .post(`/api/visits/${visitId}/readings`)
      .send(reading(17, { clientId: randomUUID() }));
    const voiding = {
      kind: "reading",
      recordId: stored.body.reading.id,
      reason: "Typed the suction line for the liquid line",
    };
    const first = await technician.post(`/api/visits/${visitId}/voids`).send(voiding);
    const again = await technician.post(`/api/visits/${visitId}/voids`).send(voiding);
    expect([first.status, again.status]).toEqual([201, 201]);
    expect(again.body.event).toEqual(first.body.event);
    expect(again.headers["idempotent-replayed"]).toBe("true");
    const lines = (
      await testApp.database.db.select().from(visitEvents).where(eq(visitEvents.recordId, voiding.recordId))
    ).filter((line) => line.action === "voided");
    expect(lines).toHaveLength(1);
    const other = await technician
      .post(`/api/visits/${visitId}/voids`)
      .send({ ...voiding, reason: "Another reason altogether" });
    expect(other.status).toBe(409);
  });

  it("stores a photo sent twice once", async () => {
    const picture = await sharp({ create: { width: 40, height: 30, channels: 3, background: "#336699" } })
      .jpeg()
      .toBuffer();
    const clientId = randomUUID();
    const send = () =>
      technician
        .post(`/api/visits/${visitId}/photos`)
        .field("kind", "gauges")
        .field("clientId", clientId)
        .attach("photo", picture, "gauges.jpg");
    const first = await send();
    const again = await send();
    expect([first.status, again.status]).toEqual([201, 201]);
    expect(again.body.photo).toEqual(first.body.photo);
    expect(again.headers["idempotent-replayed"]).toBe("true");
    expect((await rowsOf<typeof photos.$inferSelect>(photos)).filter((row) => row.clientId === clientId)).toHaveLength(
      1,
    );
  });

  it("keeps the time a photo was added on the device, and refuses one beyond the clock's bounds", async () => {
    const picture = await sharp({ create: { width: 40, height: 30, channels: 3, background: "#993366" } })
      .jpeg()
      .toBuffer();
    const upload = (takenAt: string) =>
      technician
        .post(`/api/visits/${visitId}/photos`)
        .field("kind", "damage")
        .field("takenAt", takenAt)
        .attach("photo", picture, "damage.jpg");
    const takenAt = ago(3);
    const kept = await upload(takenAt);
    expect(kept.status).toBe(201);
    expect(kept.body.photo.takenAt).toBe(takenAt);
    const ahead = await upload(new Date(Date.now() + DEVICE_CLOCK_SKEW_MS + 5 * MINUTE).toISOString());
    expect(ahead.status).toBe(400);
    expect(ahead.body.fields.takenAt).toMatch(/in the future/);
  });

  it("refuses a device time in the future beyond the clock skew, or before the visit started, naming the field", async () => {
    const future = new Date(Date.now() + DEVICE_CLOCK_SKEW_MS + 5 * MINUTE).toISOString();
    const ahead = await technician.post(`/api/visits/${visitId}/readings`).send(reading(15, { takenAt: future }));
    expect(ahead.status).toBe(400);
    expect(ahead.body.fields.takenAt).toMatch(/in the future/);
    const early = await technician.post(`/api/visits/${visitId}/readings`).send(reading(15, { takenAt: ago(4 * 60) }));
    expect(early.status).toBe(400);
    expect(early.body.fields.takenAt).toMatch(/before the visit started/);
    const check = await technician
      .post(`/api/visits/${visitId}/leak-searches`)
      .send({ method: "bubble-solution", placesChecked: ["Flare nuts"], takenAt: future });
    expect(check.status).toBe(400);
    expect(check.body.fields.takenAt).toMatch(/in the future/);
    const adjustment = await technician
      .post(`/api/visits/${visitId}/adjustments`)
      .send({ kind: "airflow", description: "Fan speed up", at: future });
    expect(adjustment.status).toBe(400);
    expect(adjustment.body.fields.at).toMatch(/in the future/);
    // Within the skew either side passes.
    const slightlyAhead = new Date(Date.now() + DEVICE_CLOCK_SKEW_MS / 2).toISOString();
    expect(
      (await technician.post(`/api/visits/${visitId}/readings`).send(reading(15, { takenAt: slightlyAhead }))).status,
    ).toBe(201);
  });

  it("sorts readings sent out of order by the time they were taken: run log, pages, circuit log and trend", async () => {
    const visit = await startRooftopVisit(technician, "Out of order");
    await startVisitAt(testApp, visit, new Date(Date.now() - 60 * MINUTE));
    // The device sends the later reading first, then one taken earlier (its outbox emptied late).
    for (const [minutes, temperature] of [
      [10, 16],
      [40, 17],
      [25, 18],
      [5, 19],
    ] as const) {
      expect(
        (await technician.post(`/api/visits/${visit}/readings`).send(reading(temperature, { takenAt: ago(minutes) })))
          .status,
      ).toBe(201);
    }
    const detail = (await technician.get(`/api/visits/${visit}`)).body.visit;
    const times = detail.readings.map((row: { takenAt: string }) => Date.parse(row.takenAt));
    expect(times).toEqual([...times].sort((a, b) => a - b));
    expect(detail.readings.map((row: { input: { suctionLineTempC: number } }) => row.input.suctionLineTempC)).toEqual([
      17, 18, 16, 19,
    ]);
    // The circuit's log (the trend's series, the chart, the key readings) runs in the time taken too.
    const log = detail.circuitLogs.find((candidate: { circuit: number }) => candidate.circuit === 1);
    expect(log.firstTakenAt).toBe(detail.readings[0].takenAt);
    expect(log.lastTakenAt).toBe(detail.readings.at(-1).takenAt);
    const chartTimes = log.points.map((point: { takenAt: string }) => Date.parse(point.takenAt));
    expect(chartTimes).toEqual(times);
    expect(log.keyReadings.map((row: { input: { suctionLineTempC: number } }) => row.input.suctionLineTempC)).toEqual([
      17, 18, 16, 19,
    ]);
    // The trend observes from the earliest reading taken (40 min ago) to the latest (5 min ago).
    expect(log.trend.minutesObserved).toBeCloseTo(35, 0);
    // The readings page before the latest reading holds the earlier ones, oldest first.
    const latestId = detail.readings.at(-1).id;
    const page = (
      await technician.get(`/api/visits/${visit}/readings`).query({ circuit: 1, before: latestId, limit: 10 })
    ).body;
    expect(page.readings.map((row: { input: { suctionLineTempC: number } }) => row.input.suctionLineTempC)).toEqual([
      17, 18, 16,
    ]);
    const stored = await testApp.database.db
      .select()
      .from(readings)
      .where(eq(readings.visitId, visit))
      .orderBy(readings.takenAt);
    expect(stored.map((row) => row.input.suctionLineTempC)).toEqual([17, 18, 16, 19]);
  });
});
