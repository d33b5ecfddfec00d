/**
 * The latest readings of a unit's latest visit, read from the end: what the equipment page's
 * "last settled state" needs, without loading a logger's whole series (10,000 readings of
 * about 11 kB of stored result each) to look at its last few minutes.
 */
import { and, desc, eq, sql } from "drizzle-orm";
import type { DiagnosisResult } from "@shared/schemas/diagnosis.ts";
import type { Database } from "./client.ts";
import { readings, visits } from "./schema.ts";

/** What the settling rule reads of a stored result (assessTrend), and the fields that mark it current. */
type TrendFigures = Pick<DiagnosisResult, "chargeState" | "chargeDeviation" | "superheatK" | "subcoolingK">;
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
 * (visit, circuit, taken_at) backwards, so its cost is the limit, not the visit's length. Each
 * reading comes with only what the settling rule reads (assessTrend: the run time, superheat,
 * subcooling, and the two fields that mark a current result), about 100 bytes instead of the
 * 11 kB stored result; readingResult fetches the whole result of the one reading shown.
 */
export async function latestCircuitReadings(db: Database, visitId: string, circuit: number, limit: number) {
  // jsonb_to_record reads each stored result once: four `result->'…'` would decompress its
  // TOASTed 4.5 kB four times, which was most of this query's time.
  const { rows } = await db.execute<{ id: string; taken_at: string; run_minutes: number | null; figures: TrendFigures }>(sql`
    select r.id, r.taken_at, (r.input->>'runMinutes')::float8 as run_minutes,
           jsonb_build_object('chargeState', f."chargeState", 'chargeDeviation', f."chargeDeviation", 'superheatK', f."superheatK", 'subcoolingK', f."subcoolingK") as figures
    from (
      select id, taken_at, created_at, input, result from ${readings}
      where visit_id = ${visitId} and circuit = ${circuit} and pending_import_id is null and voided_at is null
      order by taken_at desc, created_at desc
      limit ${limit}
    ) r, jsonb_to_record(r.result) as f("chargeState" jsonb, "chargeDeviation" jsonb, "superheatK" float8, "subcoolingK" float8)
    order by r.taken_at, r.created_at`);
  return rows.map((row) => ({
    id: row.id,
    takenAt: new Date(row.taken_at),
    input: row.run_minutes === null ? {} : { runMinutes: row.run_minutes },
    result: row.figures,
  }));
}

/** The stored result of one reading. */
export async function readingResult(db: Database, readingId: string): Promise<DiagnosisResult | undefined> {
  const [row] = await db.select({ result: readings.result }).from(readings).where(eq(readings.id, readingId));
  return row?.result;
}
