import type { TrendResult } from "@shared/schemas/diagnosis.ts";
import type { Adjustment, ChartPoint, Reading, Visit } from "@shared/schemas/visits.ts";

export type { ChartPoint } from "@shared/schemas/visits.ts";

export interface CircuitSeries {
  /**
   * The circuit's standing readings the browser holds, in time order: the latest pages and the
   * readings that matter (the first, those either side of each adjustment, the latest), whole.
   * Not the whole series of a long log: counts, the chart and the trend come from the server.
   */
  readings: Reading[];
  /** Standing readings on the circuit, all of them (the server's count). */
  readingCount: number;
  /** The readings a report lists, as the server chose them over the whole series. */
  keyReadings: Reading[];
  adjustments: (Adjustment & { x: number })[];
  /** The whole series for the chart, reduced by the server to a few hundred points. */
  points: ChartPoint[];
  trend: TrendResult | null;
}

const minutesBetween = (from: string, to: string) => (Date.parse(to) - Date.parse(from)) / 60_000;

/**
 * One circuit's run log as a time series: the readings held, the adjustments that apply to it
 * (its own and whole-unit ones), and what the server worked out over every reading (chart
 * points, the settled assessment of the engine, counts). Voided readings and adjustments are
 * corrections, not evidence: they are left out here, as the server leaves them out, so the
 * finding, the trend, the settled test and the report never count them.
 */
export function circuitSeries(
  visit: Pick<Visit, "readings" | "adjustments" | "circuitLogs">,
  circuit: number,
): CircuitSeries {
  const log = visit.circuitLogs.find((candidate) => candidate.circuit === circuit);
  const voided = new Set(visit.readings.filter((reading) => reading.voided !== null).map((reading) => reading.id));
  const held = visit.readings.filter((reading) => reading.circuit === circuit && reading.voided === null);
  const heldIds = new Set(held.map((reading) => reading.id));
  const keyReadings = log?.keyReadings ?? [];
  const own = [...held, ...keyReadings.filter((reading) => !heldIds.has(reading.id) && !voided.has(reading.id))].sort(
    (a, b) => Date.parse(a.takenAt) - Date.parse(b.takenAt),
  );
  const origin = log?.points[0]?.takenAt ?? own[0]?.takenAt ?? visit.adjustments[0]?.at ?? new Date(0).toISOString();
  const relevant = visit.adjustments
    .filter(
      (adjustment) => adjustment.voided === null && (adjustment.circuit === null || adjustment.circuit === circuit),
    )
    .map((adjustment) => ({ ...adjustment, x: minutesBetween(origin, adjustment.at) }));
  return {
    readings: own,
    readingCount: log?.readingCount ?? 0,
    keyReadings,
    adjustments: relevant,
    points: log?.points ?? [],
    trend: log?.trend ?? null,
  };
}
