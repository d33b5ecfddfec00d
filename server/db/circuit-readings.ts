/**
 * One visit's readings read per circuit, in bounded pieces: counts, the latest page, the page
 * before a reading, the figures of every standing reading (columns only, never the stored
 * result), and whole rows by id. What a long visit's detail is built from (server/db/visits.ts).
 */
import { and, asc, desc, eq, inArray, isNull, sql, type SQL } from "drizzle-orm";
import type { Database } from "./client.ts";
import { adjustments, readings } from "./schema.ts";

/** Readings that are records: not rows of a CSV import still being stored (see readings.pendingImportId). */
const isRecord = isNull(readings.pendingImportId);

export type ReadingRow = typeof readings.$inferSelect;

/**
 * Up to `limit` of a circuit's records (voided ones included) taken before the reading `before`
 * (all, without it), newest of them last: keyset on (taken_at, id), read backwards along
 * readings_visit_idx, so a page costs its length whatever the visit's. `olderCursor` names the
 * oldest row returned when older ones remain.
 */
export async function circuitReadingsPage(
  db: Database,
  visitId: string,
  circuit: number,
  limit: number,
  before?: string,
): Promise<{ rows: ReadingRow[]; olderCursor: string | null }> {
  const conditions: (SQL | undefined)[] = [eq(readings.visitId, visitId), eq(readings.circuit, circuit), isRecord];
  if (before) {
    // A reading of another visit or circuit names no place in this one: nothing before it.
    conditions.push(
      sql`(${readings.takenAt}, ${readings.id}) < (select r.taken_at, r.id from ${readings} r where r.id = ${before} and r.visit_id = ${visitId} and r.circuit = ${circuit})`,
    );
  }
  const rows = await db
    .select()
    .from(readings)
    .where(and(...conditions))
    .orderBy(desc(readings.takenAt), desc(readings.id))
    .limit(limit + 1);
  const more = rows.length > limit;
  const page = rows.slice(0, limit).reverse();
  const oldest = page[0];
  return { rows: page, olderCursor: more && oldest ? oldest.id : null };
}

/** A reading's figures: what counts, the trend, the chart and the report's choice read. */
export interface ReadingFigures {
  id: string;
  circuit: number;
  /** ms since the epoch, to the millisecond (as a Date holds it). */
  takenAt: number;
  /** When stored, µs since the epoch: the order of readings taken at the same instant. */
  createdAtMicros: number;
  standing: boolean;
  runMinutes: number | null;
  superheatK: number | null;
  subcoolingK: number | null;
  evaporatingTempC: number | null;
  condensingTempC: number | null;
}

const figure = (text: string | undefined) => (text === undefined || text === "" ? null : Number(text));

/**
 * Every record of the visit (voided ones flagged), by circuit then time (equal times in the
 * order stored, as the run log has always kept them), with the generated figure columns only
 * (migration 0015), never the stored result. The rows come as ONE text value that PostgreSQL
 * builds and this splits: 10,000 rows passed one by one through PGlite's protocol took 0.4–1 s
 * on a busy machine, the single value 70–150 ms. Numbers are written by float8out, which gives
 * the shortest text that reads back as the same double, so nothing is rounded on the way. With
 * `sinceRevision`, only the records written after it (readings_visit_revision_idx).
 */
export async function visitFigures(db: Database, visitId: string, sinceRevision?: number): Promise<ReadingFigures[]> {
  const text = (value: SQL) => sql`coalesce((${value})::text, '')`;
  const { rows } = await db.execute<{ figures: string | null }>(sql`
    select string_agg(concat_ws(',',
      ${readings.circuit},
      round(date_part('epoch', date_trunc('milliseconds', ${readings.takenAt})) * 1000)::bigint,
      round(date_part('epoch', ${readings.createdAt}) * 1000000)::bigint,
      (${readings.voidedAt} is null)::int,
      ${readings.id},
      ${text(sql`${readings.runMinutes}`)}, ${text(sql`${readings.superheatK}`)}, ${text(sql`${readings.subcoolingK}`)},
      ${text(sql`${readings.evaporatingTempC}`)}, ${text(sql`${readings.condensingTempC}`)}
    ), ';' order by ${readings.circuit}, ${readings.takenAt}, ${readings.createdAt}, ${readings.id}) as figures
    from ${readings}
    where ${readings.visitId} = ${visitId} and ${readings.pendingImportId} is null
      ${sinceRevision === undefined ? sql`` : sql`and ${readings.revision} > ${sinceRevision}`}`);
  const all = rows[0]?.figures;
  if (!all) return [];
  return all.split(";").map((line) => {
    const [
      circuit,
      takenAt,
      createdAtMicros,
      standing,
      id,
      runMinutes,
      superheatK,
      subcoolingK,
      evaporatingTempC,
      condensingTempC,
    ] = line.split(",");
    return {
      id: id!,
      circuit: Number(circuit),
      takenAt: Number(takenAt),
      createdAtMicros: Number(createdAtMicros),
      standing: standing === "1",
      runMinutes: figure(runMinutes),
      superheatK: figure(superheatK),
      subcoolingK: figure(subcoolingK),
      evaporatingTempC: figure(evaporatingTempC),
      condensingTempC: figure(condensingTempC),
    };
  });
}

/**
 * A stamp that changes whenever the visit's readings or adjustments do: what the circuit logs
 * are kept under. Each written row carries the visit's revision (migration 0014), and every
 * write to a visit bumps it first under the visit's lock (server/visits/write-to-visit.ts), so
 * a void or an import's commit moves the maximum; the count of records also catches rows
 * stored without that bump (the seed and the large data set's builder insert directly).
 */
export async function runLogStamp(
  db: Database,
  visitId: string,
): Promise<{ readings: number; records: number; adjustments: number }> {
  const { rows } = await db.execute<{ readings: number | null; records: number; adjustments: number | null }>(sql`
    select r.readings, r.records, (select max(revision) from ${adjustments} where visit_id = ${visitId}) as adjustments
    from (select max(revision) as readings, count(*)::int as records from ${readings} where visit_id = ${visitId} and pending_import_id is null) r`);
  return {
    readings: Number(rows[0]?.readings ?? 0),
    records: Number(rows[0]?.records ?? 0),
    adjustments: Number(rows[0]?.adjustments ?? 0),
  };
}

/** The order visitFigures gives: by circuit, time, when stored, id. */
export function compareFigures(a: ReadingFigures, b: ReadingFigures): number {
  return (
    a.circuit - b.circuit ||
    a.takenAt - b.takenAt ||
    a.createdAtMicros - b.createdAtMicros ||
    (a.id < b.id ? -1 : a.id > b.id ? 1 : 0)
  );
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
