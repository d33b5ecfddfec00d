import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { DatabaseHandle } from "@server/db/client.ts";
import { seedDemoData } from "@server/db/seed/seed-demo.ts";
import { discardStagedReadingsBefore } from "@server/db/visits.ts";
import { createTestDatabase } from "../setup/test-database.ts";

/**
 * On a shared PostgreSQL the hourly purge clears an import's staged rows only once they are old:
 * a younger one may belong to an import another app server is storing right now.
 */
describe("discardStagedReadingsBefore", () => {
  let handle: DatabaseHandle;
  beforeAll(async () => {
    handle = await createTestDatabase();
    await seedDemoData(handle.db);
  });
  afterAll(() => handle.close());

  const stage = (age: string) =>
    handle.query(
      `insert into readings (organisation_id, visit_id, circuit, taken_at, input, result, pending_import_id, created_at)
       select organisation_id, visit_id, circuit, taken_at, input, result, gen_random_uuid(), now() - $1::interval
       from readings where pending_import_id is null limit 1`,
      [age],
    );
  const staged = async () =>
    (
      await handle.query<{ n: number }>("select count(*)::int as n from readings where pending_import_id is not null")
    )[0]!.n;

  it("removes staged rows older than the cut-off and keeps younger ones and every reading", async () => {
    const { n: readingsBefore } = (
      await handle.query<{ n: number }>("select count(*)::int as n from readings where pending_import_id is null")
    )[0]!;
    await stage("2 hours");
    await stage("1 minute");
    expect(await discardStagedReadingsBefore(handle.db, new Date(Date.now() - 60 * 60 * 1000))).toBe(1);
    expect(await staged()).toBe(1);
    const { n: readingsAfter } = (
      await handle.query<{ n: number }>("select count(*)::int as n from readings where pending_import_id is null")
    )[0]!;
    expect(readingsAfter).toBe(readingsBefore);
  });
});
