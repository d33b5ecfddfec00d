import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { DatabaseHandle } from "@server/db/client.ts";
import { analyzeChangedTables, analyzeTables } from "@server/db/planner-statistics.ts";
import { equipment, users, visits } from "@server/db/schema.ts";
import { demoSite } from "@server/db/seed/demo-scenario.ts";
import { seedDemoData } from "@server/db/seed/seed-demo.ts";
import { judgeReadingsCsv } from "@server/import/readings-csv.ts";
import { storeImportedReadings } from "@server/import/store-imported-readings.ts";
import { atmosphericPressureAtAltitude, saturationPressure } from "@shared/engine/index.ts";
import { createTestDatabase } from "../setup/test-database.ts";

/**
 * What the planner knows of a table lives in pg_class.reltuples (−1 until the table is first
 * vacuumed or analysed, PostgreSQL 14 and later: docs, "pg_class") and per column in pg_stats
 * (filled by ANALYZE: docs, "ANALYZE" and "pg_stats"). PGlite runs no autovacuum, so only the
 * server's own ANALYZE fills them.
 */
describe("planner statistics", () => {
  let handle: DatabaseHandle;
  const rowEstimate = async (table: string) =>
    (await handle.query<{ reltuples: number }>("select reltuples from pg_class where oid = $1::regclass", [table]))[0]!
      .reltuples;
  const rowCount = async (table: string) =>
    (await handle.query<{ n: number }>(`select count(*)::int as n from ${table}`))[0]!.n;
  const statisticsColumns = async (table: string) =>
    (
      await handle.query<{ attname: string }>(
        "select attname from pg_stats where schemaname = 'public' and tablename = $1",
        [table],
      )
    ).map((row) => row.attname);

  beforeAll(async () => {
    handle = await createTestDatabase();
  });
  afterAll(() => handle.close());

  it("has none after migrations alone, and the demo seed gathers row counts and column statistics", async () => {
    expect(await rowEstimate("readings")).toBe(-1);
    expect(await seedDemoData(handle.db)).toBe(true);
    for (const table of ["organisations", "users", "equipment", "visits", "readings", "adjustments"]) {
      const count = await rowCount(table);
      expect(count, table).toBeGreaterThan(0);
      // A table this small is read whole by ANALYZE, so its estimate is the count itself.
      expect(await rowEstimate(table), table).toBe(count);
    }
    expect(await statisticsColumns("visits")).toEqual(
      expect.arrayContaining(["organisation_id", "equipment_id", "started_at"]),
    );
    expect(await statisticsColumns("readings")).toEqual(expect.arrayContaining(["visit_id", "circuit", "taken_at"]));
    // The stored inputs and results are never filtered on; sampling them was most of the cost.
    expect(await statisticsColumns("readings")).not.toContain("result");
  });

  it("brings a visit's row estimate in line after a bulk insert (the planner once guessed 65 of 19 938)", async () => {
    const [visit] = await handle.query<{ visit_id: string }>("select visit_id from readings limit 1");
    await handle.query(
      `insert into readings (organisation_id, visit_id, circuit, taken_at, input, result)
       select organisation_id, visit_id, circuit, taken_at + make_interval(secs => step), input, result
       from (select * from readings where visit_id = $1 limit 1) one, generate_series(1, 4000) step`,
      [visit!.visit_id],
    );
    await analyzeTables(handle.db);
    const expected = await handle.query<{ n: number }>("select count(*)::int as n from readings where visit_id = $1", [
      visit!.visit_id,
    ]);
    const plan = await handle.query<{ "QUERY PLAN": [{ Plan: { "Plan Rows": number } }] }>(
      `explain (format json) select * from readings where visit_id = '${visit!.visit_id}'`,
    );
    const estimated = plan[0]!["QUERY PLAN"][0].Plan["Plan Rows"];
    // Within 10 % of the true count: the most common value in the sample is this visit.
    expect(Math.abs(estimated - expected[0]!.n) / expected[0]!.n).toBeLessThan(0.1);
  });

  it("refreshes the readings' row count after a CSV import is stored", async () => {
    const [rooftop] = await handle.db.select().from(equipment).where(eq(equipment.refrigerant, "R407C"));
    const [technician] = await handle.db
      .select({ id: users.id })
      .from(users)
      .where(eq(users.email, "tech@bellbird.example"));
    const [visit] = await handle.db
      .insert(visits)
      .values({ organisationId: rooftop!.organisationId, equipmentId: rooftop!.id, reason: "Logger data" })
      .returning();
    const gauge = (temperatureC: number, point: "bubble" | "dew") =>
      (saturationPressure("R407C", temperatureC, point) - atmosphericPressureAtAltitude(demoSite.altitudeM)).toFixed(1);
    const lines = ["Time,Suction pressure kPa,Suction temp C,Liquid pressure kPa,Liquid temp C"];
    for (let second = 0; second < 600; second++)
      lines.push(
        `${new Date(Date.UTC(2026, 10, 30, 20, 0, second)).toISOString()},${gauge(6, "dew")},12,${gauge(42, "bubble")},37`,
      );
    const judged = judgeReadingsCsv({
      text: lines.join("\n"),
      context: {
        unit: rooftop!,
        nameplate: rooftop!.circuits[0]!,
        site: { altitudeM: demoSite.altitudeM },
        charge: { chargeKg: rooftop!.circuits[0]!.factoryChargeKg ?? null, chargeReference: null },
      },
      dayStart: "2026-12-01T00:00:00+11:00",
      keepRows: true,
    });
    if ("refused" in judged) throw new Error(judged.refused.message);
    const before = await rowEstimate("readings");
    const stored = await storeImportedReadings(handle.db, rooftop!.organisationId, {
      visitId: visit!.id,
      equipmentId: rooftop!.id,
      circuit: 1,
      recordedBy: technician!.id,
      slices: judged.slices,
    });
    expect(stored).toBe(600);
    expect(await rowEstimate("readings")).toBe(before + 600);
    expect(await rowEstimate("readings")).toBe(await rowCount("readings"));
  });

  it("re-analyses only the tables changed past autovacuum's threshold, then none while quiet", async () => {
    await analyzeTables(handle.db);
    const before = await rowCount("readings");
    const [visit] = await handle.query<{ visit_id: string }>("select visit_id from readings limit 1");
    await handle.query(
      `insert into readings (organisation_id, visit_id, circuit, taken_at, input, result)
       select organisation_id, visit_id, circuit, taken_at + make_interval(days => 1, secs => step), input, result
       from (select * from readings where visit_id = $1 limit 1) one, generate_series(1, 1000) step`,
      [visit!.visit_id],
    );
    // The counts reach pg_stat_user_tables when the session next reports them (about a second).
    const live = async () =>
      (
        await handle.query<{ n: number }>(
          "select n_live_tup::int as n from pg_stat_user_tables where relname = 'readings'",
        )
      )[0]!.n;
    for (let attempt = 0; attempt < 40 && (await live()) < before + 1000; attempt++)
      await new Promise((resolve) => setTimeout(resolve, 250));
    expect(await live()).toBeGreaterThanOrEqual(before + 1000);
    expect(await rowEstimate("readings")).toBe(before);
    expect(await analyzeChangedTables(handle.db)).toEqual(["readings"]);
    expect(await rowEstimate("readings")).toBe(before + 1000);
    expect(await analyzeChangedTables(handle.db)).toEqual([]);
  });
});
