import { readFileSync } from "node:fs";
import { join } from "node:path";
import { count } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { migrationsFolder } from "@server/db/client.ts";
import { customers, equipment, organisations, sites, users } from "@server/db/schema.ts";
import { seedDemoData } from "@server/db/seed/seed-demo.ts";
import { demoEquipment, demoPeople } from "@server/db/seed/demo-scenario.ts";
import { createEmptyDatabase, testDatabaseKind } from "../setup/test-database.ts";

const appliedMigrations = "select count(*)::int as n from drizzle.__drizzle_migrations";

describe("database migrations and demo seed", () => {
  it("applies every migration to an empty database and seeds the demo company exactly once", async () => {
    const empty = await createEmptyDatabase();
    try {
      const handle = await empty.open();
      const tables = await handle.query<{ table_name: string }>(
        "select table_name from information_schema.tables where table_schema = 'public' order by table_name",
      );
      expect(tables.map((row) => row.table_name)).toEqual(
        expect.arrayContaining(["organisations", "users", "sessions", "customers", "sites", "equipment"]),
      );

      // pg_trgm is there on both (PGlite's contrib build, Debian's postgresql-contrib), so the
      // list search's "contains" is answered from its trigram indexes.
      const trigramIndexes = await handle.query<{ indexname: string }>(
        "select indexname from pg_indexes where indexname like '%\\_trgm\\_idx' order by indexname",
      );
      expect(trigramIndexes.map((row) => row.indexname)).toEqual([
        "equipment_search_text_trgm_idx",
        "visit_search_text_trgm_idx",
      ]);

      expect(await seedDemoData(handle.db)).toBe(true);
      expect(await seedDemoData(handle.db)).toBe(false); // second start: nothing written

      const [orgs] = await handle.db.select({ n: count() }).from(organisations);
      const [people] = await handle.db.select({ n: count() }).from(users);
      const [customerRows] = await handle.db.select({ n: count() }).from(customers);
      const [siteRows] = await handle.db.select({ n: count() }).from(sites);
      const [units] = await handle.db.select({ n: count() }).from(equipment);
      expect(orgs!.n).toBe(1);
      expect(people!.n).toBe(demoPeople.length);
      expect(customerRows!.n).toBe(1);
      expect(siteRows!.n).toBe(1);
      expect(units!.n).toBe(demoEquipment.length);
    } finally {
      await empty.close();
    }
  });

  it("re-applying migrations to a migrated database changes nothing", async () => {
    const empty = await createEmptyDatabase();
    try {
      const first = await empty.open();
      const [applied] = await first.query<{ n: number }>(appliedMigrations);
      const again = await empty.open();
      expect((await again.query<{ n: number }>(appliedMigrations))[0]).toEqual(applied);
    } finally {
      await empty.close();
    }
  });

  // Several app servers on one PostgreSQL start together; PGlite has one process per folder.
  it.runIf(testDatabaseKind === "postgres")(
    "migrates once when several servers start at the same time (advisory lock)",
    async () => {
      const empty = await createEmptyDatabase();
      try {
        const servers = await Promise.all([empty.open(), empty.open(), empty.open()]);
        const journal = JSON.parse(readFileSync(join(migrationsFolder, "meta", "_journal.json"), "utf8")) as {
          entries: unknown[];
        };
        // Without the lock the later servers fail on tables that already exist, or record migrations twice.
        expect((await servers[0]!.query<{ n: number }>(appliedMigrations))[0]!.n).toBe(journal.entries.length);
      } finally {
        await empty.close();
      }
    },
  );
});
