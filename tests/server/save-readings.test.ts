import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ZodError } from "zod";
import { chargeReferences, circuitCharges, readings, visits, visitTechnicians } from "@server/db/schema.ts";
import { demoSite } from "@server/db/seed/demo-scenario.ts";
import { HttpError } from "@server/http/http-error.ts";
import { createReadingSaver, type ReadingSave } from "@server/visits/save-readings.ts";
import { atmosphericPressureAtAltitude, saturationPressure } from "@shared/engine/index.ts";
import { ReadingBodySchema } from "@shared/schemas/visits.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn, type DemoIds } from "../setup/demo-accounts.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

const ATMOSPHERE = atmosphericPressureAtAltitude(demoSite.altitudeM);
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  Number((saturationPressure("R407C", temperatureC, point) - ATMOSPHERE).toFixed(1));
/** A rooftop-unit reading; `suctionLineTempC` tells the saves apart. */
const body = (suctionLineTempC: number, circuit = 1) => ({
  circuit,
  suctionPressureKPa: gauge(5, "dew"),
  suctionLineTempC,
  liquidPressureKPa: gauge(42, "bubble"),
  liquidLineTempC: 37,
});

/**
 * Readings saved together (server/visits/save-readings.ts): saves that arrive while a batch is
 * written share the next transaction, and each keeps its own answer.
 */
describe("readings saved together", () => {
  let testApp: TestApp;
  let ids: DemoIds;
  let technician: Agent;
  let senior: Agent;
  let organisationId: string;
  let rooftopId: string;

  const openVisit = async (agent: Agent = technician) =>
    (await agent.post("/api/visits").send({ equipmentId: rooftopId, reason: "Batch test" })).body.visit.id as string;
  const storedOn = (visitId: string) =>
    testApp.database.db
      .select()
      .from(readings)
      .where(eq(readings.visitId, visitId))
      .orderBy(readings.takenAt, readings.createdAt);
  const save = (
    visitId: string,
    values: unknown,
    user = { id: ids[BELLBIRD.technician]!, name: "Sam Toko" },
  ): ReadingSave => ({
    organisationId,
    visitId,
    user,
    body: ReadingBodySchema.safeParse(values),
  });

  beforeAll(async () => {
    testApp = await createTestApp();
    ids = await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    senior = await signedIn(testApp.app, BELLBIRD.senior);
    const units = (await technician.get("/api/equipment")).body.equipment as {
      id: string;
      refrigerant: string;
      organisationId?: string;
    }[];
    rooftopId = units.find((unit) => unit.refrigerant === "R407C")!.id;
    const [visit] = await testApp.database.db.select({ organisationId: visits.organisationId }).from(visits).limit(1);
    organisationId = visit!.organisationId;
  });
  afterAll(() => testApp.close());

  it("stores concurrent saves to one visit once each, in the order they arrived, each answered with its own reading", async () => {
    const visitId = await openVisit();
    const temperatures = Array.from({ length: 20 }, (_, index) => 10 + index / 10);
    const answers = await Promise.all(
      temperatures.map((temperature) => technician.post(`/api/visits/${visitId}/readings`).send(body(temperature))),
    );
    expect(answers.map((answer) => answer.status)).toEqual(temperatures.map(() => 201));
    // Each answer is its own reading: its own id and its own values, diagnosed.
    expect(new Set(answers.map((answer) => answer.body.reading.id)).size).toBe(20);
    answers.forEach((answer, index) => {
      expect(answer.body.reading.input.suctionLineTempC).toBe(temperatures[index]);
      expect(answer.body.reading.result.superheatK).toBeCloseTo(temperatures[index]! - 5, 0);
      expect(answer.body.reading.recordedBy).toEqual({ id: ids[BELLBIRD.technician], name: "Sam Toko" });
    });
    const stored = await storedOn(visitId);
    expect(stored.map((row) => row.id).sort()).toEqual(answers.map((answer) => answer.body.reading.id).sort());
    // Without a time of their own, readings take the time they arrived, a millisecond apart at least.
    const byArrival = [...answers].sort((a, b) => a.body.reading.takenAt.localeCompare(b.body.reading.takenAt));
    expect(new Set(answers.map((answer) => answer.body.reading.takenAt)).size).toBe(20);
    expect(stored.map((row) => row.id)).toEqual(byArrival.map((answer) => answer.body.reading.id));
  });

  it("refuses a bad save in a batch alone: a wrong circuit, bad values, a closed visit, another company's visit", async () => {
    const open = await openVisit();
    const closed = await openVisit();
    expect((await senior.post(`/api/visits/${closed}/review`).send({ action: "sign-off" })).status).toBe(200);
    const saveReading = createReadingSaver(testApp.database.db);
    const outcomes = await Promise.allSettled([
      saveReading(save(open, body(11))),
      saveReading(save(open, body(11.1, 3))), // the rooftop unit has two circuits
      saveReading(save(open, { ...body(11.2), suctionPressureKPa: -500 })),
      saveReading(save(closed, body(11.3))),
      saveReading({ ...save(open, body(11.4)), organisationId: randomUUID() }),
      saveReading(save(open, body(11.5))),
    ]);
    const refusal = (index: number) => (outcomes[index] as PromiseRejectedResult).reason as unknown;
    expect(outcomes.map((outcome) => outcome.status)).toEqual([
      "fulfilled",
      "rejected",
      "rejected",
      "rejected",
      "rejected",
      "fulfilled",
    ]);
    expect(refusal(1)).toBeInstanceOf(HttpError);
    expect((refusal(1) as HttpError).status).toBe(400);
    expect(refusal(2)).toBeInstanceOf(ZodError);
    expect((refusal(3) as HttpError).status).toBe(409);
    expect((refusal(4) as HttpError).status).toBe(404);
    expect((await storedOn(open)).map((row) => row.input.suctionLineTempC)).toEqual([11, 11.5]);
    expect(await storedOn(closed)).toEqual([]);
  });

  it("gathers saves arriving a turn of the event loop apart into one batch, each with its own answer, in arrival order", async () => {
    const visitId = await openVisit();
    const db = testApp.database.db;
    let transactions = 0;
    const counted = new Proxy(db, {
      get: (target, property) =>
        property === "transaction"
          ? (write: Parameters<typeof db.transaction>[0]) => {
              transactions++;
              return target.transaction(write);
            }
          : Reflect.get(target, property, target),
    });
    // A long window: what ends the gathering here is the first turn that brings no save.
    const saveReading = createReadingSaver(counted, { maxGatherMs: 60_000 });
    const temperatures = [13, 13.1, 13.2, 13.3, 13.4];
    const pending: Promise<unknown>[] = [];
    const send = (index: number) => {
      const values = body(temperatures[index]!);
      const saved = saveReading(save(visitId, index === 2 ? { ...values, suctionPressureKPa: -500 } : values));
      saved.catch(() => undefined); // its refusal is read below
      pending.push(saved);
    };
    // Each save after the first arrives a turn later, ahead of that turn's check, as a request
    // read from its socket comes before the batch's turn: saves still coming in one by one.
    await new Promise<void>((resolve) => {
      const arrive = (index: number) =>
        setImmediate(() => {
          send(index);
          if (index + 1 < temperatures.length) arrive(index + 1);
          else resolve();
        });
      arrive(1);
      send(0);
    });
    const outcomes = await Promise.allSettled(pending);
    expect(transactions).toBe(1);
    expect(outcomes.map((outcome) => outcome.status)).toEqual([
      "fulfilled",
      "fulfilled",
      "rejected",
      "fulfilled",
      "fulfilled",
    ]);
    expect((outcomes[2] as PromiseRejectedResult).reason).toBeInstanceOf(ZodError);
    expect((await storedOn(visitId)).map((row) => row.input.suctionLineTempC)).toEqual([13, 13.1, 13.3, 13.4]);

    // A save arriving alone is written after one quiet turn, never held for the window.
    const alone = await saveReading(save(visitId, body(13.5)));
    expect(alone.input.suctionLineTempC).toBe(13.5);
    expect(transactions).toBe(2);
  });

  it("writes the saves again one by one when the batch's transaction fails, so only the failing one is lost", async () => {
    const visitId = await openVisit();
    const saveReading = createReadingSaver(testApp.database.db);
    // A recorder who is not a user breaks the insert's foreign key: the whole batch rolls back.
    const outcomes = await Promise.allSettled([
      saveReading(save(visitId, body(12))),
      saveReading(save(visitId, body(12.1), { id: randomUUID(), name: "Nobody" })),
      saveReading(save(visitId, body(12.2))),
    ]);
    expect(outcomes.map((outcome) => outcome.status)).toEqual(["fulfilled", "rejected", "fulfilled"]);
    expect((await storedOn(visitId)).map((row) => row.input.suctionLineTempC)).toEqual([12, 12.2]);
  });

  it("diagnoses against the circuit's latest standing weigh-in and its standing reference point, read for the whole batch at once", async () => {
    const earlier = await openVisit();
    const later = await openVisit();
    const db = testApp.database.db;
    const technicianId = ids[BELLBIRD.technician]!;
    // Circuit 2: two weigh-ins (the later one stands with 0.3 kg of line set; a voided one is ignored).
    await db.insert(circuitCharges).values([
      {
        organisationId,
        visitId: earlier,
        circuit: 2,
        lineAdjustmentKg: 0.1,
        recordedBy: technicianId,
        createdAt: new Date(Date.now() - 60_000),
      },
      { organisationId, visitId: later, circuit: 2, lineAdjustmentKg: 0.3, recordedBy: technicianId },
    ]);
    await db.insert(circuitCharges).values({
      organisationId,
      visitId: earlier,
      circuit: 1,
      lineAdjustmentKg: 9,
      recordedBy: technicianId,
      voidedAt: new Date(),
      voidReason: "Typed wrong",
    });
    const reference = {
      subcoolingK: 5.5,
      superheatK: 6.5,
      evaporatingTempC: 5.2,
      condensingTempC: 42.3,
      outdoorAirDryBulbC: 31,
      returnAirDryBulbC: null,
    };
    await db.insert(chargeReferences).values({
      organisationId,
      equipmentId: rooftopId,
      circuit: 2,
      ...reference,
      source: "set-by-senior",
      setBy: ids[BELLBIRD.senior]!,
    });
    const visitId = await openVisit();
    const [one, two] = await Promise.all([
      technician.post(`/api/visits/${visitId}/readings`).send(body(11, 1)),
      technician.post(`/api/visits/${visitId}/readings`).send(body(11, 2)),
    ]);
    expect(one.body.reading.input.chargeKg).toBe(4.2);
    expect(one.body.reading.input.chargeReference).toBeUndefined();
    expect(two.body.reading.input.chargeKg).toBeCloseTo(4.5, 10);
    expect(two.body.reading.input.chargeReference).toEqual(reference);
  });

  it("puts whoever saves on the visit's crew, once", async () => {
    const visitId = await openVisit(senior);
    const answers = await Promise.all(
      [11, 11.1, 11.2].map((temperature) => technician.post(`/api/visits/${visitId}/readings`).send(body(temperature))),
    );
    expect(answers.map((answer) => answer.status)).toEqual([201, 201, 201]);
    const crew = await testApp.database.db
      .select()
      .from(visitTechnicians)
      .where(and(eq(visitTechnicians.visitId, visitId), eq(visitTechnicians.userId, ids[BELLBIRD.technician]!)));
    expect(crew).toHaveLength(1);
  });

  it("names a reading's recorder by their new name at once after a profile change (the cached session is forgotten)", async () => {
    const visitId = await openVisit();
    const before = await technician.post(`/api/visits/${visitId}/readings`).send(body(11));
    expect(before.body.reading.recordedBy.name).toBe("Sam Toko");
    const profile = await technician.get("/api/profile");
    const renamed = await technician
      .put("/api/profile")
      .set("If-Match", `"${profile.body.version}"`)
      .send({ name: "Samuel Toko", preferences: profile.body.preferences });
    expect(renamed.status).toBe(200);
    const after = await technician.post(`/api/visits/${visitId}/readings`).send(body(11.1));
    expect(after.body.reading.recordedBy.name).toBe("Samuel Toko");
  });

  it("applies a role change to the very next request (the cached session is forgotten)", async () => {
    const owner = await signedIn(testApp.app, BELLBIRD.owner);
    const visitId = await openVisit();
    expect((await technician.post(`/api/visits/${visitId}/readings`).send(body(11))).status).toBe(201);
    expect((await owner.patch(`/api/members/${ids[BELLBIRD.technician]}`).send({ role: "apprentice" })).status).toBe(
      200,
    );
    expect((await technician.post(`/api/visits/${visitId}/readings`).send(body(11.1))).status).toBe(403);
    expect((await owner.patch(`/api/members/${ids[BELLBIRD.technician]}`).send({ role: "technician" })).status).toBe(
      200,
    );
  });
});
