import type { CircuitSeries } from "./circuit-series.ts";

export interface RunTimeBase {
  minutes: number;
  at: number;
}

/**
 * Where the run-time clock of a circuit stands: it restarts at an adjustment (readings drift
 * again after every change) and otherwise continues from the last reading's run time.
 */
export function runTimeBase(series: CircuitSeries): RunTimeBase | null {
  const lastReading = series.readings.at(-1);
  const lastAdjustment = series.adjustments.at(-1);
  if (lastAdjustment && (!lastReading || Date.parse(lastAdjustment.at) > Date.parse(lastReading.takenAt))) {
    return { minutes: 0, at: Date.parse(lastAdjustment.at) };
  }
  if (lastReading?.input.runMinutes !== undefined)
    return { minutes: lastReading.input.runMinutes, at: Date.parse(lastReading.takenAt) };
  return null;
}

/**
 * Past this gap since the last reading or adjustment the unit has most likely been stopped
 * (another day, a part on order), so the clock is not carried on: the technician types it.
 */
export const RUN_CLOCK_STALE_MINUTES = 60;

export function runMinutesAt(base: RunTimeBase | null, now: number): number | null {
  if (!base) return null;
  const elapsed = (now - base.at) / 60_000;
  if (elapsed > RUN_CLOCK_STALE_MINUTES) return null;
  return Math.max(0, Math.round(base.minutes + elapsed));
}
