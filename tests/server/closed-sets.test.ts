import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { DatabaseHandle } from "@server/db/client.ts";
import { seedDemoData } from "@server/db/seed/seed-demo.ts";
import { createTestDatabase } from "../setup/test-database.ts";

/**
 * Columns holding one of a closed set (migration 0020): the database refuses a value outside
 * the zod schema's list, whoever writes it. Each case changes one seeded row with SQL, as a
 * script or a hand edit would; the demo data itself passes every check (it was seeded).
 */
const CASES: { table: string; column: string; good: string }[] = [
  { table: "users", column: "role", good: "technician" },
  { table: "equipment", column: "application", good: "comfort-cooling" },
  { table: "visits", column: "status", good: "open" },
  { table: "refrigerant_movements", column: "kind", good: "recovered" },
  { table: "cylinders", column: "kind", good: "recovery" },
  { table: "visit_events", column: "action", good: "started" },
];

describe("closed sets checked by the database", () => {
  let handle: DatabaseHandle;
  beforeAll(async () => {
    handle = await createTestDatabase();
    await seedDemoData(handle.db);
  });
  afterAll(() => handle.close());

  it.each(CASES)(
    "refuses an unknown value of $table $column and keeps a known one",
    async ({ table, column, good }) => {
      const [row] = await handle.query<{ id: string }>(`select id from ${table} limit 1`);
      expect(row, `the demo seeds at least one row of ${table}`).toBeDefined();
      await expect(
        handle.query(`update ${table} set ${column} = 'not-a-known-value' where id = $1`, [row!.id]),
      ).rejects.toMatchObject({ code: "23514" });
      await expect(
        handle.query(`update ${table} set ${column} = $2 where id = $1`, [row!.id, good]),
      ).resolves.toBeDefined();
    },
  );

  // The demo seeds no casebook case or attempt (a senior writes them): their checks are looked up instead.
  it("has the casebook's and the charge references' checks too", async () => {
    const rows = await handle.query<{ conname: string }>("select conname from pg_constraint where contype = 'c'");
    expect(rows.map((row) => row.conname)).toEqual(
      expect.arrayContaining([
        "casebook_cases_difficulty_known",
        "casebook_cases_status_known",
        "casebook_attempts_expected_state_known",
        "charge_references_source_known",
        "invitations_role_known",
      ]),
    );
  });

  it("lets an audit line name no record kind, but not an unknown one", async () => {
    const [row] = await handle.query<{ id: string }>("select id from visit_events limit 1");
    await expect(
      handle.query("update visit_events set record_kind = null where id = $1", [row!.id]),
    ).resolves.toBeDefined();
    await expect(
      handle.query("update visit_events set record_kind = 'photo' where id = $1", [row!.id]),
    ).rejects.toMatchObject({ code: "23514" });
  });
});
