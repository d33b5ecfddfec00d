/**
 * The latest readings of a unit's latest visit, read from the end: what the equipment page's
 * "last settled state" needs, without loading a logger's whole series (10,000 readings of
 * about 11 kB of stored result each) to look at its last few minutes.
 */
import { and, desc, eq, lt, sql } from "drizzle-orm";
import type { ChargeDeviation, DiagnosisResult } from "@shared/schemas/diagnosis.ts";
import type { Database } from "./client.ts";
import { readings, visits } from "./schema.ts";

/** What the settling rule reads of a stored result (assessTrend), and the fields that mark it current. */
type TrendFigures = Pick<DiagnosisResult, "chargeState" | "chargeDeviation" | "superheatK" | "subcoolingK">;
import { countsInResults } from "./visits.ts";

/** The visit of the unit's most recent reading that counts, or undefined when it has none. */
export async function latestReadingVisit(
  db: Database,
  organisationId: string,
  equipmentId: string,
): Promise<string | undefined> {
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
 * subcooling, and the fields that mark a current result), from the readings' figure columns
 * (migration 0015): the stored result is never decompressed; readingResult fetches the whole
 * result of the one reading shown.
 */
export async function latestCircuitReadings(db: Database, visitId: string, circuit: number, limit: number) {
  const rows = await db
    .select({
      id: readings.id,
      takenAt: readings.takenAt,
      createdAt: readings.createdAt,
      runMinutes: readings.runMinutes,
      superheatK: readings.superheatK,
      subcoolingK: readings.subcoolingK,
      chargeState: readings.chargeState,
    })
    .from(readings)
    .where(and(eq(readings.visitId, visitId), eq(readings.circuit, circuit), countsInResults))
    .orderBy(desc(readings.takenAt), desc(readings.createdAt))
    .limit(limit);
  return rows.reverse().map((row) => {
    // What the rule reads of a stored result; chargeDeviation only marks it as the current engine's.
    const result: TrendFigures = {
      chargeState: row.chargeState!,
      chargeDeviation: null,
      superheatK: row.superheatK,
      subcoolingK: row.subcoolingK,
    };
    return {
      id: row.id,
      takenAt: row.takenAt,
      input: row.runMinutes === null ? {} : { runMinutes: row.runMinutes },
      result,
    };
  });
}

/** The stored result of one reading. */
export async function readingResult(db: Database, readingId: string): Promise<DiagnosisResult | undefined> {
  const [row] = await db.select({ result: readings.result }).from(readings).where(eq(readings.id, readingId));
  return row?.result;
}

/**
 * The charge estimate of a circuit's last reading taken before `before` that counts and carries
 * one (equal times: the later stored), or null. Walks readings_visit_idx back from `before` and
 * stops at the first reading with an estimate (usually the first it meets), so its cost does not
 * grow with the readings after it; the report sets it beside what the scale found on the
 * circuit's first recovery.
 */
export async function chargeEstimateBefore(
  db: Database,
  visitId: string,
  circuit: number,
  before: Date,
): Promise<ChargeDeviation | null> {
  const deviation = sql<ChargeDeviation | null>`${readings.result} -> 'chargeDeviation'`;
  const [row] = await db
    .select({ deviation })
    .from(readings)
    .where(
      and(
        eq(readings.visitId, visitId),
        eq(readings.circuit, circuit),
        countsInResults,
        lt(readings.takenAt, before),
        sql`jsonb_typeof(${deviation}) = 'object'`,
      ),
    )
    .orderBy(desc(readings.takenAt), desc(readings.createdAt))
    .limit(1);
  return row?.deviation ?? null;
}
