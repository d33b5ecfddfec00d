/**
 * What the visit detail says about each circuit's whole run log, worked out on the server so the
 * browser never needs the whole series: counts, the settling assessment (assessTrend, the run
 * log's own rule), the chart series reduced to a few hundred points, and the readings that
 * matter. The series is read from the readings' figure columns (migration 0015), so a circuit of
 * 10,000 readings costs one index scan of small rows, not 10,000 stored results decompressed;
 * only the handful of readings sent whole are read whole.
 */
import { assessTrend, DiagnosisInputError, lastAtEachInstant } from "@shared/engine/index.ts";
import type { TrendResult } from "@shared/schemas/diagnosis.ts";
import type { Adjustment, ChartPoint, CircuitLog } from "@shared/schemas/visits.ts";
import type { Database } from "../db/client.ts";
import { circuitCounts, circuitFigures, readingRowsById, type CircuitCount, type ReadingFigures, type ReadingRow } from "../db/circuit-readings.ts";
import { readingsThatMatter } from "../report/readings-that-matter.ts";
import { chartSeries } from "./chart-series.ts";

const MINUTE_MS = 60_000;

/** A circuit's log with its key readings as rows still to be named (people are read once for the whole detail). */
export type CircuitLogRows = Omit<CircuitLog, "keyReadings" | "olderCursor"> & { keyRows: ReadingRow[] };

/**
 * The settling assessment over the figures of one circuit's standing readings, the same as
 * assessTrend over the whole readings: one reading per instant (the last stored), each marked
 * with the first adjustment made since the reading before it. A reading whose stored result is
 * the current engine's is judged from its figures (all the rule reads of it); an older one is
 * read whole and diagnosed again, as assessTrend does. The results the answer carries (the last
 * settled reading's and the latest) are the whole stored ones.
 */
async function trendOf(db: Database, figures: readonly ReadingFigures[], adjustments: readonly Adjustment[]): Promise<TrendResult | null> {
  const distinct = lastAtEachInstant(figures, (row) => row.takenAt.getTime());
  if (distinct.length === 0) return null;
  const older = distinct.filter((row) => row.resultIsCurrent !== true).map((row) => row.id);
  const whole = new Map((await readingRowsById(db, older)).map((row) => [row.id, row]));
  const changes = adjustments.map((adjustment) => ({ at: Date.parse(adjustment.at), description: adjustment.description }));
  let next = 0;
  let previous = -Infinity;
  const series = distinct.map((row) => {
    const time = row.takenAt.getTime();
    // Adjustments come in time order: skip those before the previous reading, take the first since.
    while (next < changes.length && changes[next]!.at <= previous) next += 1;
    const change = next < changes.length && changes[next]!.at <= time ? changes[next]! : undefined;
    previous = time;
    const stored = whole.get(row.id);
    return {
      takenAt: row.takenAt.toISOString(),
      // What the rule reads of a current result: the two figures, and the fields that mark it current.
      input: stored?.input ?? (row.runMinutes === null ? {} : { runMinutes: row.runMinutes }),
      result: stored?.result ?? { chargeState: null, chargeDeviation: null, superheatK: row.superheatK, subcoolingK: row.subcoolingK },
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
  const settledId = trend.lastSettled ? distinct[trend.lastSettled.index]!.id : null;
  const latestId = distinct.at(-1)!.id;
  const wholeRows = await readingRowsById(db, settledId && settledId !== latestId ? [latestId, settledId] : [latestId]);
  const results = new Map(wholeRows.map((row) => [row.id, row.result]));
  return {
    ...trend,
    lastSettled: trend.lastSettled && settledId ? { ...trend.lastSettled, result: results.get(settledId)! } : null,
    latest: results.get(latestId)!,
  };
}

/** One circuit's log from its counts, figures and the adjustments that apply to it. */
async function circuitLog(db: Database, visitId: string, count: CircuitCount, adjustments: readonly Adjustment[]): Promise<CircuitLogRows> {
  const figures = count.standing === 0 ? [] : await circuitFigures(db, visitId, count.circuit);
  const relevant = adjustments.filter((adjustment) => adjustment.voided === null && (adjustment.circuit === null || adjustment.circuit === count.circuit));
  const origin = figures[0]?.takenAt.getTime() ?? 0;
  const points: ChartPoint[] = figures.map((row) => ({
    x: (row.takenAt.getTime() - origin) / MINUTE_MS,
    takenAt: row.takenAt.toISOString(),
    superheatK: row.superheatK,
    subcoolingK: row.subcoolingK,
    evaporatingTempC: row.evaporatingTempC,
    condensingTempC: row.condensingTempC,
  }));
  const [trend, keyRows] = await Promise.all([
    trendOf(db, figures, relevant),
    readingRowsById(db, readingsThatMatter(figures, relevant.map((adjustment) => adjustment.at)).readings.map((row) => row.id)),
  ]);
  return {
    circuit: count.circuit,
    recordCount: count.records,
    readingCount: count.standing,
    firstTakenAt: count.firstTakenAt?.toISOString() ?? null,
    lastTakenAt: count.lastTakenAt?.toISOString() ?? null,
    points: chartSeries(points),
    trend,
    keyRows,
  };
}

/**
 * The log of every circuit with readings on the visit, in circuit order.
 *
 * @param adjustments the visit's adjustments in time order (voided ones are left out here)
 */
export async function circuitLogs(db: Database, visitId: string, adjustments: readonly Adjustment[]): Promise<CircuitLogRows[]> {
  const counts = await circuitCounts(db, visitId);
  const logs: CircuitLogRows[] = [];
  // One circuit after another: PGlite runs one query at a time anyway, and this keeps one
  // circuit's figures in memory at once.
  for (const count of counts) logs.push(await circuitLog(db, visitId, count, adjustments));
  return logs;
}
