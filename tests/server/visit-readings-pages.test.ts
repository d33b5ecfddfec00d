/**
 * A long visit's detail is bounded: each circuit's latest page of readings, and per circuit what
 * the server works out over ALL of them (counts, the settling assessment, the chart series, the
 * readings that matter). Older readings come a page at a time. The reference figures here are
 * the engine's own, computed over every reading as the run log used to in the browser.
 */
import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { assessTrend, lastAtEachInstant, saturationPressure, STANDARD_ATMOSPHERE_KPA } from "@shared/engine/index.ts";
import type { DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import {
  READINGS_PAGE_SIZE,
  ReadingsPageSchema,
  VisitDetailResponseSchema,
  VisitSchema,
  type CircuitLog,
  type Visit,
} from "@shared/schemas/visits.ts";
import { insertReadings, type NewReading } from "@server/db/visits.ts";
import { readings } from "@server/db/schema.ts";
import { createTestApp, type TestApp } from "../setup/test-app.ts";
import { BELLBIRD, seedBellbird, signedIn } from "../setup/demo-accounts.ts";
import { readingStore, startRooftopVisit } from "../setup/stored-readings.ts";

type Agent = Awaited<ReturnType<typeof signedIn>>;

const COUNT = 600;
const START = Date.UTC(2026, 11, 2, 1, 0, 0);
const gauge = (temperatureC: number, point: "bubble" | "dew") =>
  saturationPressure("R407C", temperatureC, point) - STANDARD_ATMOSPHERE_KPA;

/**
 * Reading `index`, 30 s apart: steady for the first 200 (settled), then a suction line that
 * swings by a few kelvin (not settled), with one sharp spike and one dip for the chart to keep.
 */
function inputAt(index: number): DiagnosisInput {
  const swing = index < 200 ? 0.02 * Math.sin(index) : 3 * Math.sin(index / 7);
  const spike = index === 333 ? 15 : index === 444 ? -4 : 0;
  return {
    refrigerant: "R407C",
    meteringDevice: "txv",
    suctionPressureKPa: gauge(6, "dew"),
    suctionLineTempC: 12 + swing + spike,
    liquidPressureKPa: gauge(42, "bubble"),
    liquidLineTempC: 37 + (index < 200 ? 0 : 0.5 * Math.cos(index / 5)),
    runMinutes: 10 + index / 2,
    atmosphericPressureKPa: STANDARD_ATMOSPHERE_KPA,
  };
}

describe("paged visit detail and circuit logs", () => {
  let testApp: TestApp;
  let technician: Agent;
  let visitId: string;
  let adjustmentAt: string;
  /** Every reading as stored, in the order stored. */
  const stored: NewReading[] = [];

  beforeAll(async () => {
    testApp = await createTestApp();
    await seedBellbird(testApp);
    technician = await signedIn(testApp.app, BELLBIRD.technician);
    visitId = await startRooftopVisit(technician, "Logger left on overnight");
    const log = await readingStore(testApp, visitId);
    const row = (index: number, takenAtMs: number) => log.row(inputAt(index), new Date(takenAtMs));
    const batch = Array.from({ length: COUNT }, (_, index) => row(index, START + index * 30_000));
    // Under the visit's lock, bumping its revision, as every save does.
    const store = log.store;
    await store(batch);
    stored.push(...batch);
    // A second reading at the same instant as reading 100, stored later: the trend keeps the later one.
    const again = row(101, START + 100 * 30_000);
    await store([again]);
    stored.push(again);
    adjustmentAt = new Date(START + 250 * 30_000 - 10_000).toISOString();
    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/adjustments`)
          .send({ circuit: 1, kind: "metering", description: "Opened the TXV a quarter turn", at: adjustmentAt })
      ).status,
    ).toBe(201);
  }, 120_000);
  afterAll(() => testApp.close());

  const detail = async (): Promise<Visit> =>
    VisitSchema.parse((await technician.get(`/api/visits/${visitId}`)).body.visit);
  const logOf = (visit: Pick<Visit, "circuitLogs">) => visit.circuitLogs.find((log) => log.circuit === 1)!;

  /** The engine over every standing reading, as the run log computed it in the browser. */
  function reference(voidedIds: ReadonlySet<string>) {
    const standing = stored
      .filter((row) => !voidedIds.has(row.id))
      .sort((a, b) => a.takenAt.getTime() - b.takenAt.getTime());
    const distinct = lastAtEachInstant(standing, (row) => row.takenAt.getTime());
    const adjustment = Date.parse(adjustmentAt);
    const trend = assessTrend(
      distinct.map((row, index) => {
        const previous = distinct[index - 1];
        const marked = adjustment <= row.takenAt.getTime() && (!previous || adjustment > previous.takenAt.getTime());
        return {
          takenAt: row.takenAt.toISOString(),
          input: row.input,
          result: row.result,
          ...(marked ? { adjustment: "Opened the TXV a quarter turn" } : {}),
        };
      }),
    );
    return { standing, trend };
  }

  it("carries only the latest page of readings, with counts and a cursor for the rest", async () => {
    const visit = await detail();
    expect(visit.readings.length).toBeLessThanOrEqual(READINGS_PAGE_SIZE);
    const log = logOf(visit);
    expect(log).toMatchObject({ recordCount: COUNT + 1, readingCount: COUNT + 1 });
    expect(log.olderCursor).toBe(visit.readings[0]!.id);
    expect(visit.readings.at(-1)!.takenAt).toBe(log.lastTakenAt);
    expect(log.firstTakenAt).toBe(new Date(START).toISOString());
  });

  it("gives the settling assessment the engine gives over every reading", async () => {
    const log = logOf(await detail());
    const { trend } = reference(new Set());
    expect(trend.lastSettled).not.toBeNull();
    expect(trend.settled).toBe(false);
    expect(log.trend).toEqual(trend);
  });

  it("keeps the whole series' least and greatest values, the first point and the latest readings exactly, in a few hundred points", async () => {
    const log = logOf(await detail());
    const { standing } = reference(new Set());
    expect(log.points.length).toBeLessThanOrEqual(400);
    const superheats = standing.map((row) => row.result.superheatK!);
    const drawn = log.points.map((point) => point.superheatK!);
    expect(Math.max(...drawn)).toBe(Math.max(...superheats));
    expect(Math.min(...drawn)).toBe(Math.min(...superheats));
    expect(log.points[0]!.takenAt).toBe(standing[0]!.takenAt.toISOString());
    const last = standing.at(-1)!;
    expect(log.points.at(-1)).toEqual({
      x: (last.takenAt.getTime() - START) / 60_000,
      takenAt: last.takenAt.toISOString(),
      superheatK: last.result.superheatK,
      subcoolingK: last.result.subcoolingK,
      evaporatingTempC: last.result.evaporatingTempC,
      condensingTempC: last.result.condensingTempC,
    });
  });

  it("sends the readings that matter whole: the first, either side of the adjustment and the latest", async () => {
    const log = logOf(await detail());
    const ids = log.keyReadings.map((reading) => reading.id);
    expect(ids[0]).toBe(stored[0]!.id);
    expect(ids).toContain(stored[249]!.id);
    expect(ids).toContain(stored[250]!.id);
    expect(ids.at(-1)).toBe(stored[COUNT - 1]!.id);
    expect(log.keyReadings[0]!.result).toEqual(stored[0]!.result);
  });

  it("walks back through every reading exactly once, a page at a time", async () => {
    const visit = await detail();
    const seen = visit.readings.map((reading) => reading.id);
    let cursor = logOf(visit).olderCursor;
    let pages = 0;
    let oldestSeen = Date.parse(visit.readings[0]!.takenAt);
    while (cursor) {
      const response = await technician.get(`/api/visits/${visitId}/readings?circuit=1&before=${cursor}&limit=200`);
      expect(response.status).toBe(200);
      const page = ReadingsPageSchema.parse(response.body);
      expect(page.readings.length).toBeLessThanOrEqual(200);
      // Each page is in time order and no later than what was already seen.
      const times = page.readings.map((reading) => Date.parse(reading.takenAt));
      expect(times).toEqual([...times].sort((a, b) => a - b));
      expect(times.at(-1)!).toBeLessThanOrEqual(oldestSeen);
      oldestSeen = times[0]!;
      seen.unshift(...page.readings.map((reading) => reading.id));
      cursor = page.olderCursor;
      pages += 1;
    }
    expect(pages).toBe(3);
    expect(new Set(seen).size).toBe(seen.length);
    expect(new Set(seen)).toEqual(new Set(stored.map((row) => row.id)));
  });

  it("refuses a page without a circuit or a reading to go back from, and hides another company's visit", async () => {
    expect((await technician.get(`/api/visits/${visitId}/readings?circuit=1`)).status).toBe(400);
    expect((await technician.get(`/api/visits/${visitId}/readings?before=${stored[5]!.id}`)).status).toBe(400);
    expect(
      (
        await technician.get(
          `/api/visits/00000000-0000-4000-8000-000000000000/readings?circuit=1&before=${stored[5]!.id}`,
        )
      ).status,
    ).toBe(404);
  });

  it("counts a void of an old reading the detail does not carry in the logs, the delta's and the whole detail's", async () => {
    const before = await detail();
    const old = stored[150]!;
    expect(before.readings.some((reading) => reading.id === old.id)).toBe(false);
    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/voids`)
          .send({ kind: "reading", recordId: old.id, reason: "Probe fell off the pipe" })
      ).status,
    ).toBe(201);
    const response = await technician.get(`/api/visits/${visitId}?since=${encodeURIComponent(before.revision)}`);
    const body = VisitDetailResponseSchema.parse(response.body);
    if (!("delta" in body)) throw new Error("expected a delta");
    expect(body.delta.readings.map((reading) => reading.id)).toEqual([old.id]);
    const expected = reference(new Set([old.id]));
    const fromDelta = body.delta.circuitLogs!.find((log: CircuitLog) => log.circuit === 1)!;
    expect(fromDelta).toMatchObject({ readingCount: COUNT, recordCount: COUNT + 1 });
    expect(fromDelta.trend).toEqual(expected.trend);
    expect(logOf(await detail()).trend).toEqual(expected.trend);
  });

  it("brings a reading saved after the logs were worked out into them, and one stored without a revision bump too", async () => {
    const before = logOf(await detail());
    const body = {
      circuit: 1,
      suctionPressureKPa: 390,
      suctionLineTempC: 20,
      liquidPressureKPa: 1500,
      liquidLineTempC: 35,
    };
    const saved = (await technician.post(`/api/visits/${visitId}/readings`).send(body)).body.reading;
    const after = logOf(await detail());
    expect(after.readingCount).toBe(before.readingCount + 1);
    expect(after.points.at(-1)!.takenAt).toBe(saved.takenAt);
    expect(after.trend!.latest).toEqual(saved.result);
    stored.push({ ...saved, takenAt: new Date(saved.takenAt), recordedBy: saved.recordedBy.id });
    // The seed and the large data set's builder insert directly, without the visit's lock.
    const direct = (await readingStore(testApp, visitId)).row(inputAt(5), new Date(Date.now() + 60_000));
    await insertReadings(testApp.database.db, [direct], new Map());
    stored.push(direct);
    expect(logOf(await detail()).readingCount).toBe(after.readingCount + 1);
  });

  it("brings in a delta the logs of the circuits it touched only; an adjustment for the whole unit touches every circuit", async () => {
    const deltaSince = async (revision: string) => {
      const body = VisitDetailResponseSchema.parse(
        (await technician.get(`/api/visits/${visitId}?since=${encodeURIComponent(revision)}`)).body,
      );
      if (!("delta" in body)) throw new Error("expected a delta");
      return body.delta;
    };
    const save = async () => {
      const body = {
        circuit: 2,
        suctionPressureKPa: 400,
        suctionLineTempC: 14,
        liquidPressureKPa: 1600,
        liquidLineTempC: 36,
      };
      const response = await technician.post(`/api/visits/${visitId}/readings`).send(body);
      expect(response.status).toBe(201);
      const saved = response.body.reading;
      stored.push({ ...saved, takenAt: new Date(saved.takenAt), recordedBy: saved.recordedBy.id });
    };
    await save();
    let before = await detail();
    expect(before.circuitLogs.map((log) => log.circuit)).toEqual([1, 2]);
    await save();
    const afterReading = await deltaSince(before.revision);
    expect(afterReading.circuitLogs!.map((log) => log.circuit)).toEqual([2]);
    expect(afterReading.circuitLogs![0]!.readingCount).toBe(2);

    before = await detail();
    expect(
      (
        await technician
          .post(`/api/visits/${visitId}/adjustments`)
          .send({ circuit: null, kind: "airflow", description: "Changed both filters" })
      ).status,
    ).toBe(201);
    expect((await deltaSince(before.revision)).circuitLogs!.map((log) => log.circuit)).toEqual([1, 2]);
  });

  it("sends the whole visit instead of a delta when more readings changed than a page holds", async () => {
    const before = await detail();
    const db = testApp.database.db;
    // As a CSV import's commit does: many rows stamped with a new revision at once.
    await db.execute(sql`update visits set revision = revision + 1 where id = ${visitId}`);
    await db.execute(sql`update readings set note = 'checked' where visit_id = ${visitId}`);
    const body = VisitDetailResponseSchema.parse(
      (await technician.get(`/api/visits/${visitId}?since=${encodeURIComponent(before.revision)}`)).body,
    );
    expect("visit" in body).toBe(true);
  });

  it("keeps the figure columns equal to the stored result's fields, on insert and when a result is rewritten", async () => {
    const db = testApp.database.db;
    const rows = await db
      .select({
        id: readings.id,
        superheatK: readings.superheatK,
        subcoolingK: readings.subcoolingK,
        evaporatingTempC: readings.evaporatingTempC,
        condensingTempC: readings.condensingTempC,
        runMinutes: readings.runMinutes,
        chargeState: readings.chargeState,
        current: readings.resultIsCurrent,
      })
      .from(readings)
      .where(eq(readings.visitId, visitId));
    const byId = new Map(stored.map((row) => [row.id, row]));
    for (const row of rows) {
      const { result, input } = byId.get(row.id)!;
      expect(row).toEqual({
        id: row.id,
        superheatK: result.superheatK,
        subcoolingK: result.subcoolingK,
        evaporatingTempC: result.evaporatingTempC,
        condensingTempC: result.condensingTempC,
        runMinutes: input.runMinutes ?? null,
        chargeState: result.chargeState,
        current: true,
      });
    }
    const target = stored[3]!;
    await db
      .update(readings)
      .set({ result: { ...target.result, superheatK: 99 } })
      .where(eq(readings.id, target.id));
    const [rewritten] = await db
      .select({ superheatK: readings.superheatK })
      .from(readings)
      .where(eq(readings.id, target.id));
    expect(rewritten!.superheatK).toBe(99);
  });
});
