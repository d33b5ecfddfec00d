import type { Reading } from "@shared/schemas/visits.ts";

/** Up to this many readings, a circuit's table lists every one. */
export const REPORT_ALL_READINGS_UP_TO = 40;
/** Of a longer series, the table keeps the latest this many (the settled state the finding is drawn from). */
export const REPORT_LATEST_READINGS = 12;

export interface ReportReadings {
  /** The rows to print, in the order taken. */
  readings: Reading[];
  /** How many readings of the circuit the table leaves out (the trend chart still draws them all). */
  leftOut: number;
}

/**
 * The readings of one circuit a printed report lists. A logged series has thousands, and a
 * table of them all is pages nobody reads; the ones that tell the story are the first (as
 * found), the one just before and just after each adjustment (what the change did), and the
 * latest (the state it was left in). Shorter series are listed whole.
 *
 * @param readings one circuit's standing readings, in the order taken
 * @param adjustmentTimes ISO times of the adjustments that apply to the circuit
 */
export function readingsThatMatter(readings: readonly Reading[], adjustmentTimes: readonly string[]): ReportReadings {
  if (readings.length <= REPORT_ALL_READINGS_UP_TO) return { readings: [...readings], leftOut: 0 };
  const keep = new Set<number>([0]);
  for (let index = Math.max(0, readings.length - REPORT_LATEST_READINGS); index < readings.length; index++) keep.add(index);
  const times = readings.map((reading) => Date.parse(reading.takenAt));
  for (const at of adjustmentTimes.map((time) => Date.parse(time))) {
    // The first reading at or after the change, and the one before it.
    const after = times.findIndex((time) => time >= at);
    if (after === -1) keep.add(readings.length - 1);
    else {
      keep.add(after);
      if (after > 0) keep.add(after - 1);
    }
  }
  const kept = [...keep].sort((a, b) => a - b).map((index) => readings[index]!);
  return { readings: kept, leftOut: readings.length - kept.length };
}
