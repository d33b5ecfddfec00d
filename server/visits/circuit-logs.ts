/**
 * What the visit detail says about each circuit's whole run log, worked out on the server so the
 * browser never needs the whole series: counts, the settling assessment (assessTrend, the run
 * log's own rule), the chart series reduced to a few hundred points, and the readings that
 * matter. The series is read from the readings' figure columns (migration 0015), so a circuit of
 * 10,000 readings costs one index scan of small rows, not 10,000 stored results decompressed;
 * only the handful of readings sent whole are read whole. The logs change only when the visit's
 * readings or adjustments do, so they are kept per visit under that stamp: every viewer's
 * refresh and first load between two writes costs two index lookups, not the series again, and
 * a write costs the rows it wrote (see circuitLogs).
 */
import { assessTrend, DiagnosisInputError, lastAtEachInstant } from "@shared/engine/index.ts";
import type { TrendResult } from "@shared/schemas/diagnosis.ts";
import type { Adjustment, ChartPoint, CircuitLog } from "@shared/schemas/visits.ts";
import type { Database } from "../db/client.ts";
import {
  compareFigures,
  readingRowsById,
  runLogStamp,
  visitFigures,
  type ReadingFigures,
  type ReadingRow,
} from "../db/circuit-readings.ts";
import { readingsThatMatter } from "../report/readings-that-matter.ts";
import { chartSeries } from "./chart-series.ts";

const MINUTE_MS = 60_000;

/** A circuit's log with its key readings as rows still to be named (people are read once for the whole detail). */
export type CircuitLogRows = Omit<CircuitLog, "keyReadings" | "olderCursor"> & { keyRows: ReadingRow[] };

/**
 * The settling assessment over the figures of one circuit's standing readings, the same as
 * assessTrend over the whole readings: one reading per instant (the last stored), each marked
 * with the first adjustment made since the reading before it. Every reading is judged from its
 * stored result's figures (all the rule reads of it), never diagnosed again: a stored result is
 * the finding the technician saw (README decision 004), and the server brings results of an
 * older engine up to date at start-up (server/db/upgrade-stored-diagnoses.ts). The results the
 * answer carries (the last settled reading's and the latest) are the whole stored ones.
 */
async function trendOf(
  db: Database,
  figures: readonly ReadingFigures[],
  adjustments: readonly Adjustment[],
): Promise<TrendResult | null> {
  const distinct = lastAtEachInstant(figures, (row) => row.takenAt);
  const latest = distinct.at(-1);
  if (!latest) return null;
  const changes = adjustments.map((adjustment) => ({
    at: Date.parse(adjustment.at),
    description: adjustment.description,
  }));
  let next = 0;
  let previous = -Infinity;
  const series = distinct.map((row) => {
    const time = row.takenAt;
    // Adjustments come in time order: skip those before the previous reading, take the first since.
    let pending = changes[next];
    while (pending && pending.at <= previous) pending = changes[++next];
    const change = pending && pending.at <= time ? pending : undefined;
    previous = time;
    return {
      takenAt: new Date(row.takenAt).toISOString(),
      // What the rule reads of a stored result: the two figures, and the fields that mark it as one to read, not work out again.
      input: row.runMinutes === null ? {} : { runMinutes: row.runMinutes },
      result: { chargeState: null, chargeDeviation: null, superheatK: row.superheatK, subcoolingK: row.subcoolingK },
      ...(change ? { adjustment: change.description } : {}),
    };
  });
  let trend: TrendResult;
  try {
    trend = assessTrend(series);
  } catch (error) {
    // Stored readings were valid when saved; a run log the rule cannot read has no assessment.
    if (error instanceof DiagnosisInputError) return null;
    throw error;
  }
  // lastSettled.index is a reading of the series, which has one per distinct reading.
  const settledId = trend.lastSettled ? (distinct[trend.lastSettled.index]?.id ?? null) : null;
  const latestId = latest.id;
  const wholeRows = await readingRowsById(db, settledId && settledId !== latestId ? [latestId, settledId] : [latestId]);
  const results = new Map(wholeRows.map((row) => [row.id, row.result]));
  return {
    ...trend,
    lastSettled: trend.lastSettled && settledId ? { ...trend.lastSettled, result: results.get(settledId)! } : null,
    latest: results.get(latestId)!,
  };
}

/** One circuit's log from its records' figures (in time order) and the visit's adjustments. */
async function circuitLog(
  db: Database,
  circuit: number,
  records: readonly ReadingFigures[],
  adjustments: readonly Adjustment[],
): Promise<CircuitLogRows> {
  const figures = records.filter((row) => row.standing);
  const relevant = adjustments.filter(
    (adjustment) => adjustment.voided === null && (adjustment.circuit === null || adjustment.circuit === circuit),
  );
  const origin = figures[0]?.takenAt ?? 0;
  const points: ChartPoint[] = figures.map((row) => ({
    x: (row.takenAt - origin) / MINUTE_MS,
    takenAt: new Date(row.takenAt).toISOString(),
    superheatK: row.superheatK,
    subcoolingK: row.subcoolingK,
    evaporatingTempC: row.evaporatingTempC,
    condensingTempC: row.condensingTempC,
  }));
  const trend = await trendOf(db, figures, relevant);
  const keyRows = await readingRowsById(
    db,
    readingsThatMatter(
      figures,
      relevant.map((adjustment) => adjustment.at),
    ).readings.map((row) => row.id),
  );
  return {
    circuit,
    recordCount: records.length,
    readingCount: figures.length,
    firstTakenAt: points[0]?.takenAt ?? null,
    lastTakenAt: points.at(-1)?.takenAt ?? null,
    points: chartSeries(points),
    trend,
    keyRows,
  };
}

/** Visits whose logs are kept, most recently used last; a few open visits are watched at once. */
const CACHED_VISITS = 16;
type Stamp = Awaited<ReturnType<typeof runLogStamp>>;
interface Worked {
  records: ReadingFigures[];
  logs: CircuitLogRows[];
}
type LogCache = Map<string, { stamp: Stamp; work: Promise<Worked> }>;
/** Per database (tests run several in one process), per visit. */
const caches = new WeakMap<Database, LogCache>();

/**
 * Every record's figures: from the held ones and only the rows written since their stamp (each
 * write stamps its rows with the visit's new revision, under the visit's lock, so nothing older
 * can appear later), or all of them read again.
 */
async function recordsOf(
  db: Database,
  visitId: string,
  stamp: Stamp,
  held?: { stamp: Stamp; work: Promise<Worked> },
): Promise<ReadingFigures[]> {
  const base = held ? await held.work.catch(() => undefined) : undefined;
  if (!held || !base) return visitFigures(db, visitId);
  if (stamp.readings === held.stamp.readings && stamp.records === held.stamp.records) return base.records;
  if (stamp.readings > held.stamp.readings) {
    const changed = await visitFigures(db, visitId, held.stamp.readings);
    const replaced = new Map(changed.map((row) => [row.id, row]));
    const records = base.records.map((row) => replaced.get(row.id) ?? row);
    const known = new Set(base.records.map((row) => row.id));
    records.push(...changed.filter((row) => !known.has(row.id)));
    // Rows stored without a revision of their own would be missing: then all are read again.
    if (records.length === stamp.records) return records.sort(compareFigures);
  }
  return visitFigures(db, visitId);
}

async function workOut(db: Database, records: ReadingFigures[], adjustments: readonly Adjustment[]): Promise<Worked> {
  const logs: CircuitLogRows[] = [];
  // Records come by circuit: one circuit's slice at a time.
  let start = 0;
  let first = records[0];
  while (first) {
    const { circuit } = first;
    let end = start + 1;
    while (records[end]?.circuit === circuit) end += 1;
    logs.push(await circuitLog(db, circuit, records.slice(start, end), adjustments));
    start = end;
    first = records[start];
  }
  return { records, logs };
}

/**
 * The log of every circuit with readings on the visit, in circuit order. Kept per visit: when
 * neither its readings nor its adjustments changed, the kept logs; when readings changed, only
 * the records written since are read and merged into the kept figures before the logs are
 * worked out again (in memory: the trend and the series are linear and take milliseconds), so a
 * live logger's every new reading costs its own rows, not the visit's 10,000 again.
 *
 * @param adjustments the visit's adjustments in time order (voided ones are left out here)
 */
export async function circuitLogs(
  db: Database,
  visitId: string,
  adjustments: readonly Adjustment[],
): Promise<CircuitLogRows[]> {
  let cache = caches.get(db);
  if (!cache) caches.set(db, (cache = new Map()));
  const stamp = await runLogStamp(db, visitId);
  const held = cache.get(visitId);
  cache.delete(visitId);
  if (
    held &&
    held.stamp.readings === stamp.readings &&
    held.stamp.records === stamp.records &&
    held.stamp.adjustments === stamp.adjustments
  ) {
    cache.set(visitId, held);
    return (await held.work).logs;
  }
  const work = recordsOf(db, visitId, stamp, held).then((records) => workOut(db, records, adjustments));
  // Concurrent first loads share one computation; a failed one is not kept.
  cache.set(visitId, { stamp, work });
  work.catch(() => cache.get(visitId)?.work === work && cache.delete(visitId));
  while (cache.size > CACHED_VISITS) cache.delete(cache.keys().next().value!);
  return (await work).logs;
}
