/**
 * The latest readings of a unit's latest visit, read from the end: what the equipment page's
 * "last settled state" needs, without loading a logger's whole series (10,000 readings of
 * about 11 kB of stored result each) to look at its last few minutes.
 */
import { and, desc, eq } from "drizzle-orm";
import type { Database } from "./client.ts";
import { readings, visits } from "./schema.ts";
import { countsInResults } from "./visits.ts";

/** The visit of the unit's most recent reading that counts, or undefined when it has none. */
export async function latestReadingVisit(db: Database, organisationId: string, equipmentId: string): Promise<string | undefined> {
  const [latest] = await db
    .select({ visitId: readings.visitId })
    .from(readings)
    .innerJoin(visits, eq(visits.id, readings.visitId))
    .where(and(eq(visits.organisationId, organisationId), eq(visits.equipmentId, equipmentId), countsInResults))
    .orderBy(desc(readings.takenAt))
    .limit(1);
  return latest?.visitId;
}

/**
 * The last `limit` readings of one circuit on a visit that count, oldest first; equal times in
 * the order they were stored, so the trend keeps the later entry. Reads readings_visit_idx
 * (visit, circuit, taken_at) backwards, so its cost is the limit, not the visit's length.
 */
export async function latestCircuitReadings(db: Database, visitId: string, circuit: number, limit: number) {
  const rows = await db
    .select({ takenAt: readings.takenAt, input: readings.input, result: readings.result })
    .from(readings)
    .where(and(eq(readings.visitId, visitId), eq(readings.circuit, circuit), countsInResults))
    .orderBy(desc(readings.takenAt), desc(readings.createdAt))
    .limit(limit);
  return rows.reverse();
}
