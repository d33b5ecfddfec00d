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
/**
 * Largest steady drift of superheat and of subcooling, K/min: a slow drift can stay under the
 * 1 K change limit over 5 minutes and still carry the reading another 1.5 K over the rest of
 * Title 24's 15-minute settling period [S10] — about a whole tolerance. 0.1 K/min keeps that
 * under 1 K (common practice).
 */
export const SETTLED_MAX_RATE_K_PER_MIN = 0.1;

const CRITERION_SOURCE = `${cite(["S10", "S20"])}; window, change and drift limits: ${COMMON_PRACTICE}`;

interface WindowStatus {
  settled: boolean;
  reason: string;
  superheatChangeK: number | null;
  subcoolingChangeK: number | null;
  superheatRate: number | null;
  subcoolingRate: number | null;
  minutesObserved: number;
}

/** Spread and least-squares slope of one series over readings first…last (nulls skipped). */
function spreadAndSlope(minutes: Float64Array, values: readonly (number | null)[], first: number, last: number): { change: number | null; rate: number | null } {
  let minimum = Infinity;
  let maximum = -Infinity;
  const x: number[] = [];
  const y: number[] = [];
  for (let index = first; index <= last; index += 1) {
    const value = values[index];
    if (value === null || value === undefined) continue;
    if (value < minimum) minimum = value;
    if (value > maximum) maximum = value;
    x.push(minutes[index]!);
    y.push(value);
  }
  const change = x.length === 0 ? null : maximum - minimum;
  const rate = x.length >= 2 && x[x.length - 1]! > x[0]! ? leastSquaresSlope(x, y) : null;
  return { change, rate };
}

/**
 * Settled status at reading `last`, looking back over readings since the last adjustment.
 * `minutes` are the reading times in minutes (parsed once); `adjustedAt[i]` is the index of the
 * latest adjustment at or before i (0 when none); `windowStart[i]` the first reading of i's window.
 */
function windowStatus(
  series: readonly TrendReading[],
  minutes: Float64Array,
  adjustedAt: Int32Array,
  windowStart: Int32Array,
  superheats: readonly (number | null)[],
  subcoolings: readonly (number | null)[],
  last: number,
): WindowStatus {
  const start = adjustedAt[last]!;
  const minutesObserved = minutes[last]! - minutes[start]!;
  const first = Math.max(start, windowStart[last]!);
  const superheat = spreadAndSlope(minutes, superheats, first, last);
  const subcooling = spreadAndSlope(minutes, subcoolings, first, last);
  const base = {
    superheatChangeK: superheat.change,
    subcoolingChangeK: subcooling.change,
    superheatRate: superheat.rate,
    subcoolingRate: subcooling.rate,
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
  if (superheat.change === null && subcooling.change === null) {
    return { ...base, settled: false, reason: "Neither superheat nor subcooling could be computed, so settling cannot be judged" };
  }
  const moving: string[] = [];
  if (superheat.change !== null && superheat.change >= SETTLED_MAX_CHANGE_K) moving.push(`superheat moved ${superheat.change.toFixed(1)} K`);
  if (subcooling.change !== null && subcooling.change >= SETTLED_MAX_CHANGE_K) moving.push(`subcooling moved ${subcooling.change.toFixed(1)} K`);
  if (moving.length > 0) {
    return { ...base, settled: false, reason: `Still moving: ${moving.join(", ")} in the last ${SETTLED_WINDOW_MINUTES} min (limit ${SETTLED_MAX_CHANGE_K} K)` };
  }
  const drifting: string[] = [];
  if (superheat.rate !== null && Math.abs(superheat.rate) >= SETTLED_MAX_RATE_K_PER_MIN) drifting.push(`superheat ${superheat.rate.toFixed(2)} K/min`);
  if (subcooling.rate !== null && Math.abs(subcooling.rate) >= SETTLED_MAX_RATE_K_PER_MIN) drifting.push(`subcooling ${subcooling.rate.toFixed(2)} K/min`);
  if (drifting.length > 0) {
    return { ...base, settled: false, reason: `Still drifting: ${drifting.join(", ")} (limit ${SETTLED_MAX_RATE_K_PER_MIN} K/min)` };
  }
  return {
    ...base,
    settled: true,
    reason: `Superheat and subcooling each changed less than ${SETTLED_MAX_CHANGE_K} K, and drift less than ${SETTLED_MAX_RATE_K_PER_MIN} K/min, over the last ${SETTLED_WINDOW_MINUTES} min`,
  };
}

/**
 * Settling assessment of one circuit's run log: the circuit is settled when superheat and
 * subcooling have each changed by less than `SETTLED_MAX_CHANGE_K` (1 K) and drift by less
 * than `SETTLED_MAX_RATE_K_PER_MIN` (0.1 K/min, least-squares slope) over the last
 * `SETTLED_WINDOW_MINUTES` (5 min) of readings since the last adjustment, and the unit has run
 * at least 10 minutes when the run time is recorded (TRADE.md §1.5 [S10][S20]). Also gives the
 * rate of change over that window (K/min) and the most recent settled reading with its
 * diagnosis. Readings must be in time order. A reading that carries its stored `result` (the
 * server's diagnosis when it was saved) is judged from it; others are diagnosed here.
 *
 * Cost: linear in the number of readings times the readings per window (times are parsed
 * once, adjustments found in one pass, windows found with a moving pointer).
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
  const count = series.length;
  const results: DiagnosisResult[] = series.map((reading) => reading.result ?? diagnose(reading.input));

  const origin = Date.parse(series[0]!.takenAt);
  const minutes = new Float64Array(count);
  const adjustedAt = new Int32Array(count);
  const windowStart = new Int32Array(count);
  let adjustment = 0;
  let pointer = 0;
  for (let index = 0; index < count; index += 1) {
    minutes[index] = (Date.parse(series[index]!.takenAt) - origin) / 60_000;
    if (series[index]!.adjustment !== undefined) adjustment = index;
    adjustedAt[index] = adjustment;
    // The window: from the latest reading at or before (this − window) up to this one.
    while (pointer + 1 <= index && minutes[index]! - minutes[pointer + 1]! >= SETTLED_WINDOW_MINUTES) pointer += 1;
    windowStart[index] = minutes[index]! - minutes[pointer]! >= SETTLED_WINDOW_MINUTES ? pointer : 0;
  }
  const superheats = results.map((result) => result.superheatK);
  const subcoolings = results.map((result) => result.subcoolingK);

  const latestStatus = windowStatus(series, minutes, adjustedAt, windowStart, superheats, subcoolings, count - 1);
  let lastSettled: TrendResult["lastSettled"] = null;
  for (let index = count - 1; index >= 0; index -= 1) {
    const status = index === count - 1 ? latestStatus : windowStatus(series, minutes, adjustedAt, windowStart, superheats, subcoolings, index);
    if (status.settled) {
      lastSettled = { index, takenAt: series[index]!.takenAt, result: results[index]! };
      break;
    }
  }
  const status = latestStatus;
  return {
    settled: status.settled,
    reason: status.reason,
    criterion: {
      windowMinutes: SETTLED_WINDOW_MINUTES,
      maxChangeK: SETTLED_MAX_CHANGE_K,
      maxRateKPerMin: SETTLED_MAX_RATE_K_PER_MIN,
      minRunMinutes: MIN_RUN_MINUTES,
      source: CRITERION_SOURCE,
    },
    rate: { superheatKPerMin: status.superheatRate, subcoolingKPerMin: status.subcoolingRate },
    changeOverWindow: { superheatK: status.superheatChangeK, subcoolingK: status.subcoolingChangeK },
    minutesObserved: status.minutesObserved,
    lastSettled,
    latest: results[count - 1]!,
  };
}
