/**
 * One visit's readings read per circuit, in bounded pieces: counts, the latest page, the page
 * before a reading, the figures of every standing reading (columns only, never the stored
 * result), and whole rows by id. What a long visit's detail is built from (server/db/visits.ts).
 */
import { and, asc, desc, eq, inArray, isNull, sql, type SQL } from "drizzle-orm";
import type { Database } from "./client.ts";
import { readings } from "./schema.ts";

/** Readings that are records: not rows of a CSV import still being stored (see readings.pendingImportId). */
const isRecord = isNull(readings.pendingImportId);
/** Records that count in results: not voided (the same rule as server/db/visits.ts countsInResults). */
const countsInResults = and(isRecord, isNull(readings.voidedAt));

export type ReadingRow = typeof readings.$inferSelect;

export interface CircuitCount {
  circuit: number;
  /** Records, voided ones included. */
  records: number;
  /** Standing records. */
  standing: number;
  firstTakenAt: Date | null;
  lastTakenAt: Date | null;
}

/** Per circuit with any reading on the visit: counts and the standing series' first and last times. */
export async function circuitCounts(db: Database, visitId: string): Promise<CircuitCount[]> {
  const standing = sql`${readings.voidedAt} is null`;
  const rows = await db
    .select({
      circuit: readings.circuit,
      records: sql<number>`count(*)::int`,
      standing: sql<number>`(count(*) filter (where ${standing}))::int`,
      firstTakenAt: sql<string | null>`min(${readings.takenAt}) filter (where ${standing})`,
      lastTakenAt: sql<string | null>`max(${readings.takenAt}) filter (where ${standing})`,
    })
    .from(readings)
    .where(and(eq(readings.visitId, visitId), isRecord))
    .groupBy(readings.circuit)
    .orderBy(asc(readings.circuit));
  const asDate = (value: string | Date | null) => (value === null ? null : new Date(value));
  return rows.map((row) => ({ ...row, firstTakenAt: asDate(row.firstTakenAt), lastTakenAt: asDate(row.lastTakenAt) }));
}

/**
 * Up to `limit` of a circuit's records (voided ones included) taken before the reading `before`
 * (all, without it), newest of them last: keyset on (taken_at, id), read backwards along
 * readings_visit_idx, so a page costs its length whatever the visit's. `olderCursor` names the
 * oldest row returned when older ones remain.
 */
export async function circuitReadingsPage(db: Database, visitId: string, circuit: number, limit: number, before?: string): Promise<{ rows: ReadingRow[]; olderCursor: string | null }> {
  const conditions: (SQL | undefined)[] = [eq(readings.visitId, visitId), eq(readings.circuit, circuit), isRecord];
  if (before) {
    // A reading of another visit or circuit names no place in this one: nothing before it.
    conditions.push(sql`(${readings.takenAt}, ${readings.id}) < (select r.taken_at, r.id from ${readings} r where r.id = ${before} and r.visit_id = ${visitId} and r.circuit = ${circuit})`);
  }
  const rows = await db
    .select()
    .from(readings)
    .where(and(...conditions))
    .orderBy(desc(readings.takenAt), desc(readings.id))
    .limit(limit + 1);
  const more = rows.length > limit;
  const page = rows.slice(0, limit).reverse();
  return { rows: page, olderCursor: more ? page[0]!.id : null };
}

/** A standing reading's figures: what the trend, the chart and the report's choice read. */
export interface ReadingFigures {
  id: string;
  takenAt: Date;
  runMinutes: number | null;
  superheatK: number | null;
  subcoolingK: number | null;
  evaporatingTempC: number | null;
  condensingTempC: number | null;
  resultIsCurrent: boolean | null;
}

/**
 * Every standing reading of a circuit, oldest first (equal times in the order stored, as the
 * run log has always kept them), with the generated figure columns only (migration 0015): about
 * 80 bytes a row instead of an 11 kB stored result to decompress.
 */
export async function circuitFigures(db: Database, visitId: string, circuit: number): Promise<ReadingFigures[]> {
  return db
    .select({
      id: readings.id,
      takenAt: readings.takenAt,
      runMinutes: readings.runMinutes,
      superheatK: readings.superheatK,
      subcoolingK: readings.subcoolingK,
      evaporatingTempC: readings.evaporatingTempC,
      condensingTempC: readings.condensingTempC,
      resultIsCurrent: readings.resultIsCurrent,
    })
    .from(readings)
    .where(and(eq(readings.visitId, visitId), eq(readings.circuit, circuit), countsInResults))
    .orderBy(asc(readings.takenAt), asc(readings.createdAt), asc(readings.id));
}

/** Whole rows of these readings, in time order. */
export async function readingRowsById(db: Database, ids: readonly string[]): Promise<ReadingRow[]> {
  if (ids.length === 0) return [];
  return db
    .select()
    .from(readings)
    .where(inArray(readings.id, [...ids]))
    .orderBy(asc(readings.takenAt), asc(readings.createdAt), asc(readings.id));
}
