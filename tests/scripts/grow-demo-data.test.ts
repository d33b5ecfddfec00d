import { count, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { DatabaseHandle } from "@server/db/client.ts";
import { equipment, readings, visitEvents, visits } from "@server/db/schema.ts";
import { diagnoseReading } from "@server/diagnosis/diagnose-on-server.ts";
import { growDemoData, LONG_VISIT_REASON } from "../../scripts/grow-demo-data.ts";
import { createTestDatabase } from "../setup/test-database.ts";

describe("growDemoData", () => {
  let handle: DatabaseHandle;
  const sizes = { units: 12, visits: 40, longVisitReadings: 90, seed: 16 };

  beforeAll(async () => {
    handle = await createTestDatabase();
  });
  afterAll(() => handle.close());

  const countOf = async (table: typeof equipment | typeof visits | typeof readings | typeof visitEvents) =>
    (await handle.db.select({ n: count() }).from(table))[0]!.n;

  it("seeds the demo and grows it to the sizes asked, with one long open visit", async () => {
    const report = await growDemoData(handle.db, sizes);
    expect(await countOf(equipment)).toBe(sizes.units);
    expect(await countOf(visits)).toBe(sizes.visits);
    const [long] = await handle.db.select().from(visits).where(eq(visits.id, report.longVisitId));
    expect(long).toMatchObject({ reason: LONG_VISIT_REASON, status: "open" });
    expect(
      (await handle.db.select({ n: count() }).from(readings).where(eq(readings.visitId, report.longVisitId)))[0]!.n,
    ).toBe(sizes.longVisitReadings);
    // Every visit has its audit trail from the start, as POST /api/visits writes it.
    expect(await countOf(visitEvents)).toBeGreaterThanOrEqual(sizes.visits - 4);
  });

  it("stores each reading's result as the server's engine gives it for the stored input", async () => {
    const sample = await handle.db.select().from(readings).limit(25);
    for (const reading of sample)
      expect(reading.result).toEqual(JSON.parse(JSON.stringify(await diagnoseReading(reading.input))));
  });

  it("adds nothing when run again at the same size", async () => {
    const before = await countOf(readings);
    const again = await growDemoData(handle.db, sizes);
    expect(again).toMatchObject({ addedUnits: 0, addedVisits: 0, addedReadings: 0 });
    expect(await countOf(readings)).toBe(before);
  });
});
