import { and, eq, isNotNull } from "drizzle-orm";
import type { Database } from "./client.ts";
import { users } from "./schema.ts";

/** Each member's refrigerant handling licence number, for the register export. */
export async function licenceNumbers(db: Database, organisationId: string): Promise<Map<string, string>> {
  const rows = await db
    .select({ id: users.id, licenceNumber: users.licenceNumber })
    .from(users)
    .where(and(eq(users.organisationId, organisationId), isNotNull(users.licenceNumber)));
  return new Map(rows.map((row) => [row.id, row.licenceNumber!]));
}
