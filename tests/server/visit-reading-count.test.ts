/**
 * The jobs list's reading figures are stored (visits.reading_count, visit_reading_recorders) and
 * kept by triggers (migration visit_reading_count). Each case compares them with what reading
 * every reading gives, the way the list worked them out before: records (not staged by an
 * import) that are not voided are counted; a recorder's latest time counts voided ones too.
 */
import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { discardStagedReadings, stageImportedReadings } from "@server/db/visits.ts";
import { demoSite } from "@server/db/seed/demo-scenario.ts";
import { atmosphericPressureAtAltitude, saturationPressure } from "@shared/engine/index.ts";
import type { DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import type { VisitSummary } from "@shared/schemas/visits.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { readingStore, startRooftopVisit } from "../setup/stored-readings.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

const ATMOSPHERE = atmosphericPressureAtAltitude(demoSite.altitudeM);
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  Number((saturationPressure("R407C", temperatureC, point) - ATMOSPHERE).toFixed(1));
/** A rooftop-unit reading as typed in; `suctionLineTempC` tells them apart. */
const typed = (suctionLineTempC: number, circuit = 1) => ({
  circuit,
  suctionPressureKPa: gauge(5, "dew"),
  suctionLineTempC,
  liquidPressureKPa: gauge(42, "bubble"),
  liquidLineTempC: 37,
});

/** The same reading as stored without a request (readingStore). */
const logged = (suctionLineTempC: number): DiagnosisInput => ({
  refrigerant: "R407C",
  meteringDevice: "txv",
  suctionPressureKPa: gauge(5, "dew"),
  suctionLineTempC,
  liquidPressureKPa: gauge(42, "bubble"),
  liquidLineTempC: 37,
  runMinutes: 20,
  atmosphericPressureKPa: ATMOSPHERE,
});

/** A logger export of `rows` minutes (the CSV import's columns). */
function loggedSeries(rows: number): string {
  const lines = ["Time,Suction pressure kPa,Suction temp C,Liquid pressure kPa,Liquid temp C"];
  for (let minute = 0; minute < rows; minute++)
    lines.push(
      `10:${String(minute).padStart(2, "0")},${gauge(6, "dew")},${12 + minute * 0.05},${gauge(42, "bubble")},37`,
    );
  return lines.join("\n");
}

describe("stored reading figures of a visit", () => {
  let testApp: TestApp;
  let technician: Agent;

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
  });
  afterAll(() => testApp.close());

  /** The stored count beside a direct count over every reading of the visit. */
  async function counts(visitId: string) {
    const { rows } = await testApp.database.db.execute<{ stored: number; direct: number }>(sql`
      select (select reading_count from visits where id = ${visitId}) as stored,
             (select count(*)::int from readings where visit_id = ${visitId} and pending_import_id is null and voided_at is null) as direct`);
    return rows[0]!;
  }

  /** The stored recorders' latest times beside the same worked out from every reading (ISO strings, by user). */
  async function recorders(visitId: string) {
    const stored = await testApp.database.db.execute<{ user_id: string; at: string }>(
      sql`select user_id, last_recorded_at::text as at from visit_reading_recorders where visit_id = ${visitId} order by user_id`,
    );
    const direct = await testApp.database.db.execute<{ user_id: string; at: string }>(sql`
      select recorded_by as user_id, max(created_at)::text as at from readings
      where visit_id = ${visitId} and pending_import_id is null and recorded_by is not null group by recorded_by order by recorded_by`);
    return { stored: stored.rows, direct: direct.rows };
  }

  const listed = async (visitId: string) => {
    const page = (await technician.get("/api/visits?limit=50")).body.visits as VisitSummary[];
    return page.find((visit) => visit.id === visitId)!;
  };

  it("counts readings as they are saved, on one circuit and on two", async () => {
    const visitId = await startRooftopVisit(technician, "Stored count: saves");
    expect(await counts(visitId)).toEqual({ stored: 0, direct: 0 });
    for (const [index, circuit] of [1, 2, 2].entries()) {
      expect((await technician.post(`/api/visits/${visitId}/readings`).send(typed(12 + index, circuit))).status).toBe(
        201,
      );
    }
    expect(await counts(visitId)).toEqual({ stored: 3, direct: 3 });
    const log = await readingStore(testApp, visitId);
    const at = new Date(Date.UTC(2026, 11, 3, 1));
    await log.store([log.row(logged(14), at, 1), log.row(logged(15), at, 2)]);
    expect(await counts(visitId)).toEqual({ stored: 5, direct: 5 });
    const summary = await listed(visitId);
    expect(summary.readingCount).toBe(5);
    const { stored, direct } = await recorders(visitId);
    expect(stored).toEqual(direct);
    expect(stored).toHaveLength(1);
    // The list's "you last worked on it" is the viewer's latest reading (or later activity).
    expect(Date.parse(summary.yourLastActivityAt!)).toBeGreaterThanOrEqual(Date.parse(stored[0]!.at));
  });

  it("leaves a voided reading out of the count but not out of its recorder's latest time", async () => {
    const visitId = await startRooftopVisit(technician, "Stored count: void");
    const kept = (await technician.post(`/api/visits/${visitId}/readings`).send(typed(12))).body.reading;
    const wrong = (await technician.post(`/api/visits/${visitId}/readings`).send(typed(30, 2))).body.reading;
    const before = await recorders(visitId);
    expect(kept.id).toBeTruthy();
    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/voids`)
          .send({ kind: "reading", recordId: wrong.id, reason: "Probe on the wrong line" })
      ).status,
    ).toBe(201);
    expect(await counts(visitId)).toEqual({ stored: 1, direct: 1 });
    expect((await listed(visitId)).readingCount).toBe(1);
    const after = await recorders(visitId);
    expect(after.stored).toEqual(after.direct);
    expect(after.stored).toEqual(before.stored);
  });

  it("counts an import's rows once it is committed, and never a staged import thrown away", async () => {
    const visitId = await startRooftopVisit(technician, "Stored count: import");
    await technician.post(`/api/visits/${visitId}/readings`).send(typed(12));
    const imported = await technician
      .post(`/api/visits/${visitId}/readings/import`)
      .field("circuit", "2")
      .field("dayStart", "2026-12-01T00:00:00+11:00")
      .field("mode", "all")
      .attach("file", Buffer.from(loggedSeries(40)), "log.csv");
    expect(imported.status).toBe(201);
    expect(await counts(visitId)).toEqual({ stored: 41, direct: 41 });
    expect((await listed(visitId)).readingCount).toBe(41);

    // Rows staged under an import id are not records until the import commits them.
    const { rows } = await testApp.database.db.execute<{ organisation_id: string; recorded_by: string }>(
      sql`select organisation_id, recorded_by from readings where visit_id = ${visitId} limit 1`,
    );
    const importId = crypto.randomUUID();
    const staged = JSON.stringify([{ takenAt: "2026-12-02T00:00:00Z", input: typed(12), result: {} }]);
    await stageImportedReadings(testApp.database.db, rows[0]!.organisation_id, {
      importId,
      visitId,
      circuit: 1,
      recordedBy: rows[0]!.recorded_by,
      rowsJson: staged,
    });
    expect(await counts(visitId)).toEqual({ stored: 41, direct: 41 });
    await discardStagedReadings(testApp.database.db, importId);
    expect(await counts(visitId)).toEqual({ stored: 41, direct: 41 });
    const { stored, direct } = await recorders(visitId);
    expect(stored).toEqual(direct);
  });

  it("follows deleted readings and a recorder who is removed from them", async () => {
    const visitId = await startRooftopVisit(technician, "Stored count: deletes");
    for (const value of [12, 13, 14]) await technician.post(`/api/visits/${visitId}/readings`).send(typed(value));
    const db = testApp.database.db;
    await db.execute(
      sql`delete from readings where id = (select id from readings where visit_id = ${visitId} order by created_at desc limit 1)`,
    );
    expect(await counts(visitId)).toEqual({ stored: 2, direct: 2 });
    let { stored, direct } = await recorders(visitId);
    expect(stored).toEqual(direct);
    // The recorder's name taken off the readings (as deleting the person would): no latest time left.
    await db.execute(sql`update readings set recorded_by = null where visit_id = ${visitId}`);
    ({ stored, direct } = await recorders(visitId));
    expect(stored).toEqual([]);
    expect(direct).toEqual([]);
    expect(await counts(visitId)).toEqual({ stored: 2, direct: 2 });
  });
});
