import { count } from "drizzle-orm";
import { hashPassword } from "../../auth/password.ts";
import type { Database } from "../client.ts";
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

/**
 * Loads the demo company when the database holds no organisation yet, so a fresh
 * install opens on something to look at and a second start never duplicates it.
 * @returns true when the demo data was written, false when the database was not empty.
 */
export async function seedDemoData(db: Database): Promise<boolean> {
  const [{ organisationCount }] = await db.select({ organisationCount: count() }).from(organisations);
  if (organisationCount > 0) return false;

  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await db.transaction(async (tx) => {
    const [organisation] = await tx.insert(organisations).values(demoOrganisation).returning();
    await tx
      .insert(users)
      .values(demoPeople.map((person) => ({ ...person, organisationId: organisation.id, passwordHash })));
    const [customer] = await tx
      .insert(customers)
      .values({ ...demoCustomer, organisationId: organisation.id })
      .returning();
    const [site] = await tx
      .insert(sites)
      .values({ ...demoSite, organisationId: organisation.id, customerId: customer.id })
      .returning();
    await tx
      .insert(equipment)
      .values(demoEquipment.map((item) => ({ ...item, organisationId: organisation.id, siteId: site.id })));
    await tx.insert(cylinders).values(demoCylinders.map((cylinder) => ({ ...cylinder, organisationId: organisation.id })));
  });
  return true;
}
