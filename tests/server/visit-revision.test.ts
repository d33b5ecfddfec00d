/**
 * The open visit is polled every few seconds. Its detail carries a revision (ETag) bumped by
 * every write; a poll naming the revision it holds gets 304 from the visit's row alone, and a
 * poll with `?since=` gets only what was written after it, voids included.
 */
import { sql } from "drizzle-orm";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoSite } from "@server/db/seed/demo-scenario.ts";
import { atmosphericPressureAtAltitude, saturationPressure } from "@shared/engine/index.ts";
import { VISIT_EQUIPMENT_HEADER, VISIT_REFRIGERANT_HEADER } from "@shared/http/visit-headers.ts";
import { VisitDetailResponseSchema } from "@shared/schemas/visits.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { startRooftopVisit, startVisitAt } from "../setup/stored-readings.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

/** Gauges at the demo clinic (85 m) read against the ISO 2533 atmosphere there. */
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  Number(
    (saturationPressure("R407C", temperatureC, point) - atmosphericPressureAtAltitude(demoSite.altitudeM)).toFixed(1),
  );
const reading = (suctionLineTempC: number, takenAt?: string) => ({
  circuit: 1,
  ...(takenAt ? { takenAt } : {}),
  suctionPressureKPa: gauge(6, "dew"),
  suctionLineTempC,
  liquidPressureKPa: gauge(42, "bubble"),
  liquidLineTempC: 37,
  outdoorAirDryBulbC: 31,
});

describe("visit revision, conditional GET and deltas", () => {
  let testApp: TestApp;
  let technician: Agent;
  let senior: Agent;
  let visitId: string;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    senior = await signedIn(testApp.app, BELLBIRD.senior);
    visitId = await startRooftopVisit(technician, "Not cooling the waiting room");
  });
  afterAll(() => testApp.close());

  const detail = (query = "", headers: Record<string, string> = {}) =>
    technician.get(`/api/visits/${visitId}${query}`).set(headers);
  const currentRevision = async () => (await detail()).body.visit.revision as string;
  const deltaSince = async (since: string) => {
    const response = await detail(`?since=${encodeURIComponent(since)}`);
    expect(response.status).toBe(200);
    const body = VisitDetailResponseSchema.parse(response.body);
    if (!("delta" in body)) throw new Error("expected a delta");
    return body.delta;
  };

  it("sends the revision as a weak ETag and answers a matching If-None-Match with 304 and no body, compressed or not", async () => {
    const first = await detail("", { "Accept-Encoding": "gzip" });
    expect(first.status).toBe(200);
    expect(first.headers.etag).toBe(`W/"${first.body.visit.revision}"`);
    expect(first.headers["cache-control"]).toContain("no-cache");
    for (const encoding of ["gzip", "identity"]) {
      const again = await detail("", { "If-None-Match": first.headers.etag!, "Accept-Encoding": encoding });
      expect(again.status).toBe(304);
      expect(again.text ?? "").toBe("");
    }
    // A delta request naming the same revision is answered the same way.
    const since = await detail(`?since=${first.body.visit.revision}`, { "If-None-Match": first.headers.etag! });
    expect(since.status).toBe(304);
  });

  it("names the visit's unit and refrigerant in its headers, as its body does, on 200 and on 304", async () => {
    const first = await detail();
    expect(first.headers[VISIT_EQUIPMENT_HEADER.toLowerCase()]).toBe(first.body.visit.equipmentId);
    expect(first.headers[VISIT_REFRIGERANT_HEADER.toLowerCase()]).toBe(first.body.visit.refrigerant);
    const again = await detail("", { "If-None-Match": first.headers.etag! });
    expect(again.status).toBe(304);
    expect(again.headers[VISIT_EQUIPMENT_HEADER.toLowerCase()]).toBe(first.body.visit.equipmentId);
  });

  it("answers 304 from the visit's row alone: the run log's tables are not read", async () => {
    const etag = (await detail()).headers.etag!;
    const db = testApp.database.db;
    // Hide the run log's tables: a 304 that needed them would fail.
    await db.execute(sql`alter table readings rename to readings_hidden`);
    await db.execute(sql`alter table visit_events rename to visit_events_hidden`);
    try {
      expect((await detail("", { "If-None-Match": etag })).status).toBe(304);
    } finally {
      await db.execute(sql`alter table readings_hidden rename to readings`);
      await db.execute(sql`alter table visit_events_hidden rename to visit_events`);
    }
  });

  it("sends only the new reading after a save, then the voided reading and the void's trail line after a void", async () => {
    const before = await currentRevision();
    const saved = await technician.post(`/api/visits/${visitId}/readings`).send(reading(12));
    expect(saved.status).toBe(201);
    const afterSave = await deltaSince(before);
    expect(afterSave.since).toBe(before);
    expect(afterSave.readings.map((row) => row.id)).toEqual([saved.body.reading.id]);
    expect(afterSave.readingCount).toBe(1);
    expect(afterSave.adjustments).toEqual([]);
    expect(afterSave.revision).not.toBe(before);
    // Nothing changed since the delta's revision: an empty delta, and 304 with its ETag.
    const settled = await deltaSince(afterSave.revision);
    expect(settled.readings).toEqual([]);
    expect(
      (await detail(`?since=${afterSave.revision}`, { "If-None-Match": `W/"${afterSave.revision}"` })).status,
    ).toBe(304);

    const voided = await technician
      .post(`/api/visits/${visitId}/voids`)
      .send({ kind: "reading", recordId: saved.body.reading.id, reason: "typed 3500 for 350 kPa" });
    expect(voided.status).toBe(201);
    const afterVoid = await deltaSince(afterSave.revision);
    expect(afterVoid.readings).toHaveLength(1);
    expect(afterVoid.readings[0]).toMatchObject({
      id: saved.body.reading.id,
      voided: { reason: "typed 3500 for 350 kPa" },
    });
    expect(afterVoid.events.map((event) => [event.action, event.recordId])).toEqual([
      ["voided", saved.body.reading.id],
    ]);
    expect(afterVoid.readingCount).toBe(0);
  });

  it("sends a reading saved with an earlier time in the delta too (the order is by revision, not by time)", async () => {
    const before = await currentRevision();
    const past = new Date(Date.now() - 3 * 3600_000).toISOString();
    await startVisitAt(testApp, visitId, new Date(Date.now() - 4 * 3600_000));
    const saved = await technician.post(`/api/visits/${visitId}/readings`).send(reading(13, past));
    expect((await deltaSince(before)).readings.map((row) => row.id)).toEqual([saved.body.reading.id]);
  });

  it("sends a new comment, adjustment and photo in the delta", async () => {
    const before = await currentRevision();
    const comment = await technician.post(`/api/visits/${visitId}/comments`).send({ body: "Filter was blocked" });
    const adjustment = await technician
      .post(`/api/visits/${visitId}/adjustments`)
      .send({ circuit: 1, kind: "airflow", description: "Filter replaced" });
    const png = await sharp({ create: { width: 8, height: 8, channels: 3, background: "#336699" } })
      .png()
      .toBuffer();
    const photo = await technician
      .post(`/api/visits/${visitId}/photos`)
      .field("kind", "gauges")
      .attach("photo", png, "gauges.png");
    expect([comment.status, adjustment.status, photo.status]).toEqual([201, 201, 201]);
    const delta = await deltaSince(before);
    expect(delta.comments.map((row) => row.id)).toEqual([comment.body.comment.id]);
    expect(delta.adjustments.map((row) => row.id)).toEqual([adjustment.body.adjustment.id]);
    expect(delta.photos.map((row) => row.id)).toEqual([photo.body.photo.id]);
    expect(delta.readings).toEqual([]);
  });

  it("sends the review state, the trail line and the send-back comment after review steps", async () => {
    const before = await currentRevision();
    expect((await technician.post(`/api/visits/${visitId}/review`).send({ action: "submit" })).status).toBe(200);
    const submitted = await deltaSince(before);
    expect(submitted.status).toBe("awaiting-review");
    expect(submitted.events.map((event) => event.action)).toEqual(["submitted"]);
    expect(
      (
        await senior
          .post(`/api/visits/${visitId}/review`)
          .send({ action: "send-back", reason: "Add a reading after the filter change" })
      ).status,
    ).toBe(200);
    const sentBack = await deltaSince(submitted.revision);
    expect(sentBack).toMatchObject({ status: "sent-back", reviewNote: "Add a reading after the filter change" });
    expect(sentBack.comments.map((row) => row.body)).toEqual(["Sent back: Add a reading after the filter change"]);
    expect(sentBack.events.map((event) => event.action)).toEqual(["sent-back"]);
  });

  it("moves the revision on every kind of write to the visit, and not on a refused one", async () => {
    const writes: [string, () => Promise<{ status: number }>][] = [
      ["reading", () => technician.post(`/api/visits/${visitId}/readings`).send(reading(14))],
      ["comment", () => technician.post(`/api/visits/${visitId}/comments`).send({ body: "Checked again" })],
      [
        "adjustment",
        () =>
          technician
            .post(`/api/visits/${visitId}/adjustments`)
            .send({ kind: "other", description: "Cleaned the coil" }),
      ],
      [
        "electrical check",
        () =>
          technician
            .post(`/api/visits/${visitId}/electrical-checks`)
            .send({ target: "supply", supplyVolts: [415, 414, 416] }),
      ],
      [
        "CSV import",
        () =>
          technician
            .post(`/api/visits/${visitId}/readings/import`)
            .field("circuit", "1")
            .field("dayStart", "2026-12-01T00:00:00+11:00")
            .field("mode", "all")
            .attach(
              "file",
              Buffer.from(
                [
                  "Time,Suction pressure kPa,Suction temp C,Liquid pressure kPa,Liquid temp C",
                  `10:00,${gauge(6, "dew")},12,${gauge(42, "bubble")},37`,
                ].join("\n"),
              ),
              "log.csv",
            ),
      ],
    ];
    for (const [what, write] of writes) {
      const before = await currentRevision();
      const response = await write();
      expect(response.status, what).toBeLessThan(300);
      expect(await currentRevision(), what).not.toBe(before);
    }

    const before = await currentRevision();
    const refused = await technician.post(`/api/visits/${visitId}/readings`).send({ ...reading(14), circuit: 9 });
    expect(refused.status).toBe(400);
    expect(await currentRevision()).toBe(before);
  });

  it("sends the imported readings in the delta", async () => {
    const before = await currentRevision();
    const csv = [
      "Time,Suction pressure kPa,Suction temp C,Liquid pressure kPa,Liquid temp C",
      ...[0, 1, 2].map((minute) => `09:0${minute},${gauge(6, "dew")},12,${gauge(42, "bubble")},37`),
    ].join("\n");
    const response = await technician
      .post(`/api/visits/${visitId}/readings/import`)
      .field("circuit", "1")
      .field("dayStart", "2026-12-01T00:00:00+11:00")
      .field("mode", "all")
      .attach("file", Buffer.from(csv), "log.csv");
    expect(response.status).toBe(201);
    const delta = await deltaSince(before);
    expect(delta.readings).toHaveLength(3);
    expect(delta.events.map((event) => event.action)).toEqual(["imported"]);
  });

  it("sends the whole visit for a since it cannot build on: unknown, malformed or ahead of the visit", async () => {
    const current = await currentRevision();
    const [epoch, revision, fingerprint] = current.split(".");
    for (const since of [
      "nonsense",
      `other.${revision}.${fingerprint}`,
      `${epoch}.${Number(revision) + 5}.${fingerprint}`,
    ]) {
      const response = await detail(`?since=${encodeURIComponent(since)}`);
      expect(response.status, since).toBe(200);
      expect(response.body.visit.readings.length, since).toBeGreaterThan(0);
    }
  });

  it("changes the ETag when the unit is renamed, though the visit itself was not written", async () => {
    const before = await detail();
    await testApp.database.db.execute(
      sql`update equipment set name = 'Rooftop unit RTU-1 (renamed)' where id = ${before.body.visit.equipmentId}`,
    );
    const after = await detail("", { "If-None-Match": before.headers.etag! });
    expect(after.status).toBe(200);
    expect(after.body.visit.equipmentName).toBe("Rooftop unit RTU-1 (renamed)");
  });
});
