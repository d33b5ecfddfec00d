import { and, asc, eq } from "drizzle-orm";
import type { Database } from "./client.ts";
import { equipment } from "./schema.ts";

/**
 * The refrigerants of the organisation's units in use, each once, in order: what a device keeps
 * the property tables of for offline use. An organisation of thousands of units uses a handful;
 * the index on (organisation, refrigerant) answers it.
 */
export async function refrigerantsInUse(db: Database, organisationId: string): Promise<string[]> {
  const rows = await db
    .selectDistinct({ refrigerant: equipment.refrigerant })
    .from(equipment)
    .where(and(eq(equipment.organisationId, organisationId), eq(equipment.archived, false)))
    .orderBy(asc(equipment.refrigerant));
  return rows.map((row) => row.refrigerant);
}
