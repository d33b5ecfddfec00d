import { count } from "drizzle-orm";
import { hashPassword } from "../../auth/password.ts";
import type { Database } from "../client.ts";
import { oneRow } from "../one-row.ts";
import { analyzeTables } from "../planner-statistics.ts";
import { customers, cylinders, equipment, organisations, sites, users } from "../schema.ts";
import {
  DEMO_PASSWORD,
  demoCustomer,
  demoCylinders,
  demoEquipment,
  demoOrganisation,
  demoPeople,
  demoSite,
} from "./demo-scenario.ts";
import { seedDemoVisits, type DemoVisitOptions } from "./demo-visits.ts";

/**
 * Loads the demo company when the database holds no organisation yet, so a fresh
 * install opens on something to look at and a second start never duplicates it.
 * @returns true when the demo data was written, false when the database was not empty.
 */
export async function seedDemoData(
  db: Database,
  options: Pick<DemoVisitOptions, "withChargeHistory"> = {},
): Promise<boolean> {
  const { organisationCount } = oneRow(
    await db.select({ organisationCount: count() }).from(organisations),
    "count organisations",
  );
  if (organisationCount > 0) return false;

  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await db.transaction(async (tx) => {
    const organisation = oneRow(
      await tx.insert(organisations).values(demoOrganisation).returning(),
      "insert the demo organisation",
    );
    const people = await tx
      .insert(users)
      .values(demoPeople.map((person) => ({ ...person, organisationId: organisation.id, passwordHash })))
      .returning({ id: users.id, email: users.email });
    const customer = oneRow(
      await tx
        .insert(customers)
        .values({ ...demoCustomer, organisationId: organisation.id })
        .returning(),
      "insert the demo customer",
    );
    const site = oneRow(
      await tx
        .insert(sites)
        .values({ ...demoSite, organisationId: organisation.id, customerId: customer.id })
        .returning(),
      "insert the demo site",
    );
    const units = await tx
      .insert(equipment)
      .values(demoEquipment.map((item) => ({ ...item, organisationId: organisation.id, siteId: site.id })))
      .returning();
    const stock = await tx
      .insert(cylinders)
      .values(demoCylinders.map((cylinder) => ({ ...cylinder, organisationId: organisation.id })))
      .returning({ id: cylinders.id, kind: cylinders.kind, refrigerant: cylinders.refrigerant });
    const cylinderOf = (kind: string) =>
      stock.find((cylinder) => cylinder.kind === kind && cylinder.refrigerant === "R407C")!.id;
    const person = (email: string) => people.find((row) => row.email === email)!.id;
    await seedDemoVisits(
      tx,
      organisation.id,
      {
        rooftop: units.find((unit) => unit.refrigerant === "R407C")!,
        split: units.find((unit) => unit.refrigerant === "R32")!,
      },
      {
        owner: person("owner@bellbird.example"),
        senior: person("senior@bellbird.example"),
        technician: person("tech@bellbird.example"),
        technician2: person("tech2@bellbird.example"),
      },
      { recovery: cylinderOf("recovery") },
      options,
    );
  });
  // A bulk write into empty tables: without fresh statistics the planner still sees them empty.
  await analyzeTables(db);
  return true;
}
