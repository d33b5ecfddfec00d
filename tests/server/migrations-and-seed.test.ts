import { count } from "drizzle-orm";
import { PGlite } from "@electric-sql/pglite";
import { describe, expect, it } from "vitest";
import { openDatabase } from "@server/db/client.ts";
import { customers, equipment, organisations, sites, users } from "@server/db/schema.ts";
import { seedDemoData } from "@server/db/seed/seed-demo.ts";
import { demoEquipment, demoPeople } from "@server/db/seed/demo-scenario.ts";

describe("database migrations and demo seed", () => {
  it("applies every migration to an empty database and seeds the demo company exactly once", async () => {
    const handle = await openDatabase("memory://");
    try {
      const tables = await handle.client.query<{ table_name: string }>(
        "select table_name from information_schema.tables where table_schema = 'public' order by table_name",
      );
      expect(tables.rows.map((row) => row.table_name)).toEqual(
        expect.arrayContaining(["organisations", "users", "sessions", "customers", "sites", "equipment"]),
      );

      expect(await seedDemoData(handle.db)).toBe(true);
      expect(await seedDemoData(handle.db)).toBe(false); // second start: nothing written

      const [orgs] = await handle.db.select({ n: count() }).from(organisations);
      const [people] = await handle.db.select({ n: count() }).from(users);
      const [customerRows] = await handle.db.select({ n: count() }).from(customers);
      const [siteRows] = await handle.db.select({ n: count() }).from(sites);
      const [units] = await handle.db.select({ n: count() }).from(equipment);
      expect(orgs.n).toBe(1);
      expect(people.n).toBe(demoPeople.length);
      expect(customerRows.n).toBe(1);
      expect(siteRows.n).toBe(1);
      expect(units.n).toBe(demoEquipment.length);
    } finally {
      await handle.close();
    }
  });

  it("re-applying migrations to a migrated database changes nothing", async () => {
    const client = await PGlite.create();
    const { attachDatabase } = await import("@server/db/client.ts");
    const first = await attachDatabase(client);
    const applied = await client.query<{ n: number }>("select count(*)::int as n from drizzle.__drizzle_migrations");
    await attachDatabase(client);
    const again = await client.query<{ n: number }>("select count(*)::int as n from drizzle.__drizzle_migrations");
    expect(again.rows[0].n).toBe(applied.rows[0].n);
    await first.close();
  });
});
