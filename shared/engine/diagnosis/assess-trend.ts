import {
  TrendInputSchema,
  type DiagnosisResult,
  type TrendReading,
  type TrendResult,
} from "../../schemas/diagnosis.ts";
import { diagnose } from "./diagnose.ts";
import { DiagnosisInputError } from "./diagnosis-input-error.ts";
import { MIN_RUN_MINUTES } from "./diagnosis-limits.ts";
import { leastSquaresSlope } from "./least-squares-slope.ts";
import { COMMON_PRACTICE, cite } from "./sources.ts";

/**
 * Settling window, minutes. Title 24 takes final readings after 15 minutes of cooling and
 * again 15 minutes after each charge adjustment [S10]; makers allow 15–20 minutes [S20]. A
 * circuit that has stopped drifting over its last 5 minutes has, in practice, passed the bulk
 * of that settling; watching a full 15-minute window would double the wait on every
 * adjustment (common practice).
 */
export const SETTLED_WINDOW_MINUTES = 5;
/**
 * Largest change of superheat and of subcooling over the window, K: about one sensor's
 * accuracy (ice-bath check ±0.6 K [S10]) and well inside the pass tolerances (±2.8 K
 * superheat [S10], ±1.7 K subcooling), so a settled reading would not change the verdict.
 */
export const SETTLED_MAX_CHANGE_K = 1;

const CRITERION_SOURCE = `${cite(["S10", "S20"])}; window and change limit: ${COMMON_PRACTICE}`;

const minutesBetween = (from: string, to: string) => (Date.parse(to) - Date.parse(from)) / 60_000;

interface WindowStatus {
  settled: boolean;
  reason: string;
  superheatChangeK: number | null;
  subcoolingChangeK: number | null;
  superheatRate: number | null;
  subcoolingRate: number | null;
  minutesObserved: number;
}

function spread(values: readonly number[]): number | null {
  return values.length === 0 ? null : Math.max(...values) - Math.min(...values);
}

function slope(minutes: readonly number[], values: readonly (number | null)[]): number | null {
  const x: number[] = [];
  const y: number[] = [];
  values.forEach((value, index) => {
    if (value !== null) {
      x.push(minutes[index]!);
      y.push(value);
    }
  });
  return x.length >= 2 && x[x.length - 1]! > x[0]! ? leastSquaresSlope(x, y) : null;
}

/** Settled status at reading `last`, looking back over readings since the last adjustment. */
function windowStatus(series: readonly TrendReading[], results: readonly DiagnosisResult[], last: number): WindowStatus {
  let start = 0;
  for (let index = last; index >= 0; index -= 1) {
    if (series[index]!.adjustment !== undefined) {
      start = index;
      break;
    }
  }
  const lastAt = series[last]!.takenAt;
  const minutesObserved = minutesBetween(series[start]!.takenAt, lastAt);
  // The window: readings from the latest one at or before (last − window) up to `last`.
  let windowStart = start;
  for (let index = start; index <= last; index += 1) {
    if (minutesBetween(series[index]!.takenAt, lastAt) >= SETTLED_WINDOW_MINUTES) windowStart = index;
  }
  const indices: number[] = [];
  for (let index = windowStart; index <= last; index += 1) indices.push(index);
  const minutes = indices.map((index) => minutesBetween(series[start]!.takenAt, series[index]!.takenAt));
  const superheats = indices.map((index) => results[index]!.superheatK);
  const subcoolings = indices.map((index) => results[index]!.subcoolingK);
  const superheatChangeK = spread(superheats.filter((value): value is number => value !== null));
  const subcoolingChangeK = spread(subcoolings.filter((value): value is number => value !== null));
  const base = {
    superheatChangeK,
    subcoolingChangeK,
    superheatRate: slope(minutes, superheats),
    subcoolingRate: slope(minutes, subcoolings),
    minutesObserved,
  };

  const runMinutes = series[last]!.input.runMinutes;
  if (runMinutes !== undefined && runMinutes < MIN_RUN_MINUTES) {
    return { ...base, settled: false, reason: `The unit has run ${runMinutes.toFixed(0)} min; wait for at least ${MIN_RUN_MINUTES} min` };
  }
  if (minutesObserved < SETTLED_WINDOW_MINUTES) {
    return {
      ...base,
      settled: false,
      reason: `Only ${minutesObserved.toFixed(1)} min of readings${start > 0 ? " since the last adjustment" : ""}; settling needs ${SETTLED_WINDOW_MINUTES} min`,
    };
  }
  if (superheatChangeK === null && subcoolingChangeK === null) {
    return { ...base, settled: false, reason: "Neither superheat nor subcooling could be computed, so settling cannot be judged" };
  }
  const moving: string[] = [];
  if (superheatChangeK !== null && superheatChangeK >= SETTLED_MAX_CHANGE_K) moving.push(`superheat moved ${superheatChangeK.toFixed(1)} K`);
  if (subcoolingChangeK !== null && subcoolingChangeK >= SETTLED_MAX_CHANGE_K) moving.push(`subcooling moved ${subcoolingChangeK.toFixed(1)} K`);
  if (moving.length > 0) {
    return { ...base, settled: false, reason: `Still moving: ${moving.join(", ")} in the last ${SETTLED_WINDOW_MINUTES} min (limit ${SETTLED_MAX_CHANGE_K} K)` };
  }
  return {
    ...base,
    settled: true,
    reason: `Superheat and subcooling each changed less than ${SETTLED_MAX_CHANGE_K} K over the last ${SETTLED_WINDOW_MINUTES} min`,
  };
}

/**
 * Settling assessment of one circuit's run log: the circuit is settled when superheat and
 * subcooling have each changed by less than `SETTLED_MAX_CHANGE_K` (1 K) over the last
 * `SETTLED_WINDOW_MINUTES` (5 min) of readings since the last adjustment, and the unit has run
 * at least 10 minutes when the run time is recorded (TRADE.md §1.5 [S10][S20]). Also gives the
 * least-squares rate of change over that window (K/min) and the most recent settled reading
 * with its diagnosis. Readings must be in time order; each is diagnosed with `diagnose()`.
 *
 * Units: ISO 8601 times in; K, K/min, minutes out.
 *
 * @throws {DiagnosisInputError} when the series or any reading is invalid (fields prefixed by
 *   the reading's index, e.g. "2.input.suctionPressureKPa")
 * @example assessTrend([{ takenAt: "2026-01-10T09:00:00Z", input }, …]).settled
 */
export function assessTrend(readings: readonly unknown[]): TrendResult {
  const parsed = TrendInputSchema.safeParse(readings);
  if (!parsed.success) throw DiagnosisInputError.fromZodError(parsed.error);
  const series = parsed.data;
  const results = series.map((reading) => diagnose(reading.input));

  let lastSettled: TrendResult["lastSettled"] = null;
  let latestStatus: WindowStatus | null = null;
  for (let index = series.length - 1; index >= 0; index -= 1) {
    const status = windowStatus(series, results, index);
    if (index === series.length - 1) latestStatus = status;
    if (status.settled) {
      lastSettled = { index, takenAt: series[index]!.takenAt, result: results[index]! };
      break;
    }
  }
  const status = latestStatus!;
  return {
    settled: status.settled,
    reason: status.reason,
    criterion: {
      windowMinutes: SETTLED_WINDOW_MINUTES,
      maxChangeK: SETTLED_MAX_CHANGE_K,
      minRunMinutes: MIN_RUN_MINUTES,
      source: CRITERION_SOURCE,
    },
    rate: { superheatKPerMin: status.superheatRate, subcoolingKPerMin: status.subcoolingRate },
    changeOverWindow: { superheatK: status.superheatChangeK, subcoolingK: status.subcoolingChangeK },
    minutesObserved: status.minutesObserved,
    lastSettled,
    latest: results[results.length - 1]!,
  };
}
