import { assessTrend, lastAtEachInstant } from "@shared/engine/index.ts";
import type { TrendResult } from "@shared/schemas/diagnosis.ts";
import type { Adjustment, Reading } from "@shared/schemas/visits.ts";

export interface ChartPoint {
  /** Minutes since the circuit's first reading. */
  x: number;
  takenAt: string;
  superheatK: number | null;
  subcoolingK: number | null;
  evaporatingTempC: number | null;
  condensingTempC: number | null;
}

export interface CircuitSeries {
  readings: Reading[];
  adjustments: (Adjustment & { x: number })[];
  points: ChartPoint[];
  trend: TrendResult | null;
}

const minutesBetween = (from: string, to: string) => (Date.parse(to) - Date.parse(from)) / 60_000;

/**
 * One circuit's run log as a time series: its readings in order, the adjustments that apply
 * to it (its own and whole-unit ones), chart points, and the settled assessment of the engine.
 * Voided readings and adjustments are corrections, not evidence: they are left out here, so
 * the finding, the trend, the settled test and the report never count them.
 */
export function circuitSeries(readings: readonly Reading[], adjustments: readonly Adjustment[], circuit: number): CircuitSeries {
  const own = readings
    .filter((reading) => reading.circuit === circuit && reading.voided === null)
    .sort((a, b) => Date.parse(a.takenAt) - Date.parse(b.takenAt));
  const origin = own[0]?.takenAt ?? adjustments[0]?.at ?? new Date(0).toISOString();
  const relevant = adjustments
    .filter((adjustment) => adjustment.voided === null && (adjustment.circuit === null || adjustment.circuit === circuit))
    .map((adjustment) => ({ ...adjustment, x: minutesBetween(origin, adjustment.at) }));

  const distinct = lastAtEachInstant(own, (reading) => Date.parse(reading.takenAt));
  const trend =
    distinct.length === 0
      ? null
      : assessTrend(
          distinct.map((reading, index) => {
            const previous = distinct[index - 1];
            const change = relevant.find(
              (adjustment) => Date.parse(adjustment.at) <= Date.parse(reading.takenAt) && (!previous || Date.parse(adjustment.at) > Date.parse(previous.takenAt)),
            );
            return { takenAt: reading.takenAt, input: reading.input, result: reading.result, ...(change ? { adjustment: change.description } : {}) };
          }),
        );

  return {
    readings: own,
    adjustments: relevant,
    points: own.map((reading) => ({
      x: minutesBetween(origin, reading.takenAt),
      takenAt: reading.takenAt,
      superheatK: reading.result.superheatK,
      subcoolingK: reading.result.subcoolingK,
      evaporatingTempC: reading.result.evaporatingTempC,
      condensingTempC: reading.result.condensingTempC,
    })),
    trend,
  };
}
