import type { TrendResult } from "../../schemas/diagnosis.ts";
import { MIN_RUN_MINUTES } from "./diagnosis-limits.ts";
import { leastSquaresSlope } from "./least-squares-slope.ts";
import { readTrendSeries, type TrendSeries } from "./read-trend-series.ts";
import { cite } from "../sources/cite.ts";
import { DIAGNOSIS_SOURCES } from "../sources/diagnosis-sources.ts";
import { COMMON_PRACTICE } from "../sources/marks.ts";

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

const CRITERION_SOURCE = `${cite(DIAGNOSIS_SOURCES, ["S10", "S20"])}; window, change and drift limits: ${COMMON_PRACTICE}`;

/**
 * How close an estimated drift may come to `SETTLED_MAX_RATE_K_PER_MIN` before the slope is
 * worked out again in full, K/min. The running sums of the window scan round differently from
 * the two-pass least-squares slope (errors near 1e-11 K/min on a 150-reading window); inside
 * this margin the exact slope decides, so the verdict is the one the full computation gives.
 */
const RATE_MARGIN_K_PER_MIN = 1e-7;

interface WindowStatus {
  settled: boolean;
  reason: string;
  superheatChangeK: number | null;
  subcoolingChangeK: number | null;
  superheatRate: number | null;
  subcoolingRate: number | null;
  minutesObserved: number;
}

/**
 * Where each reading's window begins. `observedFrom[i]` is the latest adjustment at or before
 * reading i (0 when none); `first[i]` the first reading of i's window: the latest reading at or
 * before (i − window), never before that adjustment. Both only move forward with i, which is
 * what lets the scan slide one window along the log.
 */
interface WindowBounds {
  observedFrom: Int32Array;
  first: Int32Array;
}

function windowBounds(series: TrendSeries): WindowBounds {
  const { minutes, adjusted } = series;
  const count = minutes.length;
  const observedFrom = new Int32Array(count);
  const first = new Int32Array(count);
  let adjustment = 0;
  let pointer = 0;
  // Hot path, unchecked reads: pointer ≤ index < count, so both are readings.
  for (let index = 0; index < count; index += 1) {
    if (adjusted[index] === 1) adjustment = index;
    observedFrom[index] = adjustment;
    while (pointer + 1 <= index && minutes[index]! - minutes[pointer + 1]! >= SETTLED_WINDOW_MINUTES) pointer += 1;
    const windowStart = minutes[index]! - minutes[pointer]! >= SETTLED_WINDOW_MINUTES ? pointer : 0;
    first[index] = Math.max(adjustment, windowStart);
  }
  return { observedFrom, first };
}

/** Spread and least-squares slope of one series over readings first…last (nulls skipped). */
function spreadAndSlope(
  minutes: Float64Array,
  values: readonly (number | null)[],
  first: number,
  last: number,
): { change: number | null; rate: number | null } {
  let minimum = Infinity;
  let maximum = -Infinity;
  const x: number[] = [];
  const y: number[] = [];
  for (let index = first; index <= last; index += 1) {
    const value = values[index];
    if (value === null || value === undefined) continue;
    if (value < minimum) minimum = value;
    if (value > maximum) maximum = value;
    x.push(minutes[index]!); // first ≤ index ≤ last: a reading
    y.push(value);
  }
  const change = x.length === 0 ? null : maximum - minimum;
  const rate = x.length >= 2 && x[x.length - 1]! > x[0]! ? leastSquaresSlope(x, y) : null; // two or more: both ends exist
  return { change, rate };
}

/** Settled status at reading `last`, in full: the figures the result reports. */
function windowStatus(
  series: TrendSeries,
  bounds: WindowBounds,
  superheats: readonly (number | null)[],
  subcoolings: readonly (number | null)[],
  last: number,
): WindowStatus {
  const { minutes } = series;
  // `last` is a reading, and windowBounds holds reading indexes for each.
  const start = bounds.observedFrom[last]!;
  const minutesObserved = minutes[last]! - minutes[start]!;
  const first = bounds.first[last]!;
  const superheat = spreadAndSlope(minutes, superheats, first, last);
  const subcooling = spreadAndSlope(minutes, subcoolings, first, last);
  const base = {
    superheatChangeK: superheat.change,
    subcoolingChangeK: subcooling.change,
    superheatRate: superheat.rate,
    subcoolingRate: subcooling.rate,
    minutesObserved,
  };

  const runMinutes = series.runMinutes[last];
  if (runMinutes !== undefined && runMinutes < MIN_RUN_MINUTES) {
    return {
      ...base,
      settled: false,
      reason: `The unit has run ${runMinutes.toFixed(0)} min; wait for at least ${MIN_RUN_MINUTES} min`,
    };
  }
  if (minutesObserved < SETTLED_WINDOW_MINUTES) {
    return {
      ...base,
      settled: false,
      // A lone reading spans no time: "0.0 min of readings" would read as a fault of the log.
      reason:
        last === start
          ? `Only one reading${start > 0 ? " since the last adjustment" : " so far"}; settling needs ${SETTLED_WINDOW_MINUTES} min of readings`
          : `Only ${minutesObserved.toFixed(1)} min of readings${start > 0 ? " since the last adjustment" : ""}; settling needs ${SETTLED_WINDOW_MINUTES} min`,
    };
  }
  if (superheat.change === null && subcooling.change === null) {
    return {
      ...base,
      settled: false,
      reason: "Neither superheat nor subcooling could be computed, so settling cannot be judged",
    };
  }
  const moving: string[] = [];
  if (superheat.change !== null && superheat.change >= SETTLED_MAX_CHANGE_K)
    moving.push(`superheat moved ${superheat.change.toFixed(1)} K`);
  if (subcooling.change !== null && subcooling.change >= SETTLED_MAX_CHANGE_K)
    moving.push(`subcooling moved ${subcooling.change.toFixed(1)} K`);
  if (moving.length > 0) {
    return {
      ...base,
      settled: false,
      reason: `Still moving: ${moving.join(", ")} in the last ${SETTLED_WINDOW_MINUTES} min (limit ${SETTLED_MAX_CHANGE_K} K)`,
    };
  }
  const drifting: string[] = [];
  if (superheat.rate !== null && Math.abs(superheat.rate) >= SETTLED_MAX_RATE_K_PER_MIN)
    drifting.push(`superheat ${superheat.rate.toFixed(2)} K/min`);
  if (subcooling.rate !== null && Math.abs(subcooling.rate) >= SETTLED_MAX_RATE_K_PER_MIN)
    drifting.push(`subcooling ${subcooling.rate.toFixed(2)} K/min`);
  if (drifting.length > 0) {
    return {
      ...base,
      settled: false,
      reason: `Still drifting: ${drifting.join(", ")} (limit ${SETTLED_MAX_RATE_K_PER_MIN} K/min)`,
    };
  }
  return {
    ...base,
    settled: true,
    reason: `Superheat and subcooling each changed less than ${SETTLED_MAX_CHANGE_K} K, and drift less than ${SETTLED_MAX_RATE_K_PER_MIN} K/min, over the last ${SETTLED_WINDOW_MINUTES} min`,
  };
}

/**
 * One column (superheat or subcooling) over a window that slides towards the start of the log:
 * readings join on the left and leave on the right, each once. The spread comes from two
 * monotonic queues (exact: the same minimum and maximum the full scan finds); the slope from
 * running sums of minutes and values, taken from a nearby origin and rebuilt whenever the
 * window has turned over, so rounding stays that of a few windows' sums.
 */
class SlidingColumn {
  // Hot path, unchecked reads: every index passed in, and every queue entry in [low, high), is a
  // reading of the log, which `minutes`, `values` and both queues are as long as.
  private readonly minQueue: Int32Array;
  private readonly maxQueue: Int32Array;
  // Each queue holds window indices in increasing order in [low, high): pushed on the left,
  // taken from either end. Values rise left to right in maxQueue (its maximum at the right,
  // the reading that leaves first) and fall in minQueue.
  private minLow: number;
  private minHigh: number;
  private maxLow: number;
  private maxHigh: number;
  private origin = 0;
  private updates = 0;
  count = 0;
  private sumX = 0;
  private sumY = 0;
  private sumXX = 0;
  private sumXY = 0;

  constructor(
    private readonly minutes: Float64Array,
    private readonly values: readonly (number | null)[],
  ) {
    const size = minutes.length;
    this.minQueue = new Int32Array(size);
    this.maxQueue = new Int32Array(size);
    this.minLow = this.minHigh = this.maxLow = this.maxHigh = size;
  }

  private accumulate(index: number, sign: 1 | -1): void {
    const value = this.values[index];
    if (value === null || value === undefined) return;
    const x = this.minutes[index]! - this.origin;
    this.count += sign;
    this.sumX += sign * x;
    this.sumY += sign * value;
    this.sumXX += sign * x * x;
    this.sumXY += sign * x * value;
  }

  /** Reading `index` joins the window on the left (it is one below the window's first). */
  addLeft(index: number, first: number, last: number): void {
    const value = this.values[index];
    this.updates += 1;
    if (value !== null && value !== undefined) {
      while (this.maxLow < this.maxHigh && this.values[this.maxQueue[this.maxLow]!]! <= value) this.maxLow += 1;
      this.maxQueue[--this.maxLow] = index;
      while (this.minLow < this.minHigh && this.values[this.minQueue[this.minLow]!]! >= value) this.minLow += 1;
      this.minQueue[--this.minLow] = index;
    }
    this.accumulate(index, 1);
    this.rebuildWhenWorn(first, last);
  }

  /** Reading `index`, the window's last, leaves it. */
  removeRight(index: number, first: number, last: number): void {
    this.updates += 1;
    if (this.maxLow < this.maxHigh && this.maxQueue[this.maxHigh - 1] === index) this.maxHigh -= 1;
    if (this.minLow < this.minHigh && this.minQueue[this.minHigh - 1] === index) this.minHigh -= 1;
    this.accumulate(index, -1);
    this.rebuildWhenWorn(first, last);
  }

  /** Sums afresh from the window's last reading once more readings have passed than it holds. */
  private rebuildWhenWorn(first: number, last: number): void {
    if (this.updates <= 2 * (last - first + 1) + 16) return;
    this.updates = 0;
    this.origin = last >= 0 ? this.minutes[last]! : 0; // a reading when not −1
    this.count = this.sumX = this.sumY = this.sumXX = this.sumXY = 0;
    for (let index = first; index <= last; index += 1) this.accumulate(index, 1);
  }

  /** Largest − smallest value in the window, K (only while count > 0, when neither queue is empty). */
  change(): number {
    return this.values[this.maxQueue[this.maxHigh - 1]!]! - this.values[this.minQueue[this.minHigh - 1]!]!;
  }

  /** The drift's least-squares slope from the running sums, K/min, or NaN when they cannot tell it. */
  estimatedRate(): number {
    const meanX = this.sumX / this.count;
    const varianceX = this.sumXX - this.sumX * meanX;
    // Cancellation ate the spread of times: let the full computation decide.
    if (!(varianceX > 1e-9 * this.sumXX)) return Number.NaN;
    return (this.sumXY - meanX * this.sumY) / varianceX;
  }
}

/** Whether one column drifts at or past the limit over first…last (false when it has no slope). */
function driftsTooFast(
  column: SlidingColumn,
  minutes: Float64Array,
  values: readonly (number | null)[],
  first: number,
  last: number,
): boolean {
  if (column.count < 2) return false;
  const estimate = Math.abs(column.estimatedRate());
  if (Math.abs(estimate - SETTLED_MAX_RATE_K_PER_MIN) > RATE_MARGIN_K_PER_MIN)
    return estimate >= SETTLED_MAX_RATE_K_PER_MIN;
  // Too close to call (or NaN) from the sums: the two-pass slope the result would report.
  return Math.abs(spreadAndSlope(minutes, values, first, last).rate!) >= SETTLED_MAX_RATE_K_PER_MIN;
}

/**
 * The most recent reading at which the circuit was settled, or −1: the window slides back from
 * the latest reading, each reading joining and leaving it once, so the whole look-back costs
 * time in proportion to the log, not to the log times the readings per window. Judges exactly
 * as `windowStatus` does, in the same order.
 */
function lastSettledIndex(
  series: TrendSeries,
  bounds: WindowBounds,
  superheats: readonly (number | null)[],
  subcoolings: readonly (number | null)[],
): number {
  const { minutes, runMinutes } = series;
  const count = minutes.length;
  // Hot path, unchecked reads: `last` < count, and windowBounds holds reading indexes.
  const superheat = new SlidingColumn(minutes, superheats);
  const subcooling = new SlidingColumn(minutes, subcoolings);
  let first = count;
  for (let last = count - 1; last >= 0; last -= 1) {
    if (last + 1 < count) {
      superheat.removeRight(last + 1, first, last);
      subcooling.removeRight(last + 1, first, last);
    }
    while (first > bounds.first[last]!) {
      first -= 1;
      superheat.addLeft(first, first, last);
      subcooling.addLeft(first, first, last);
    }
    const run = runMinutes[last];
    if (run !== undefined && run < MIN_RUN_MINUTES) continue;
    if (minutes[last]! - minutes[bounds.observedFrom[last]!]! < SETTLED_WINDOW_MINUTES) continue;
    if (superheat.count === 0 && subcooling.count === 0) continue;
    if (superheat.count > 0 && superheat.change() >= SETTLED_MAX_CHANGE_K) continue;
    if (subcooling.count > 0 && subcooling.change() >= SETTLED_MAX_CHANGE_K) continue;
    if (driftsTooFast(superheat, minutes, superheats, first, last)) continue;
    if (driftsTooFast(subcooling, minutes, subcoolings, first, last)) continue;
    return last;
  }
  return -1;
}

/**
 * Settling assessment of one circuit's run log: the circuit is settled when superheat and
 * subcooling have each changed by less than `SETTLED_MAX_CHANGE_K` (1 K) and drift by less
 * than `SETTLED_MAX_RATE_K_PER_MIN` (0.1 K/min, least-squares slope) over the last
 * `SETTLED_WINDOW_MINUTES` (5 min) of readings since the last adjustment, and the unit has run
 * at least 10 minutes when the run time is recorded (TRADE.md §1.5 [S10][S20]). Also gives the
 * rate of change over that window (K/min) and the most recent settled reading with its
 * diagnosis. Readings must be in time order. A reading that carries its stored `result` (the
 * server's diagnosis when it was saved) is judged from it, and neither it nor its input is
 * parsed again; one without a result, or with one from an older engine, is diagnosed here once.
 *
 * Cost: linear in the number of readings, settled or not (times parsed once, one window sliding
 * back through the log for the last settled reading; 10 000 readings in a few milliseconds,
 * `npm run bench`).
 *
 * Units: ISO 8601 times in; K, K/min, minutes out.
 *
 * @throws {DiagnosisInputError} when the series is invalid or a reading to be diagnosed is
 *   (fields prefixed by the reading's index, e.g. "2.input.suctionPressureKPa")
 * @example assessTrend([{ takenAt: "2026-01-10T09:00:00Z", input, result }, …]).settled
 */
export function assessTrend(readings: readonly unknown[]): TrendResult {
  const series = readTrendSeries(readings);
  const { results } = series;
  const count = results.length;
  const bounds = windowBounds(series);
  const superheats = results.map((result) => result.superheatK);
  const subcoolings = results.map((result) => result.subcoolingK);

  const status = windowStatus(series, bounds, superheats, subcoolings, count - 1);
  const settledIndex = status.settled ? count - 1 : lastSettledIndex(series, bounds, superheats, subcoolings);
  // The series holds one reading or more (its schema), and settledIndex, when not −1, is one of them.
  const lastSettled: TrendResult["lastSettled"] =
    settledIndex < 0
      ? null
      : { index: settledIndex, takenAt: series.takenAt[settledIndex]!, result: results[settledIndex]! };
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
