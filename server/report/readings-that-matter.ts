import { REPORT_ALL_READINGS_UP_TO, REPORT_LATEST_READINGS } from "@shared/schemas/visits.ts";

export interface ReportReadings<T> {
  /** The rows to print, in the order taken. */
  readings: T[];
  /** How many readings of the circuit the table leaves out (the trend chart still draws them all). */
  leftOut: number;
}

/**
 * The readings of one circuit a printed report lists. A logged series has thousands, and a
 * table of them all is pages nobody reads; the ones that tell the story are the first (as
 * found), the one just before and just after each adjustment (what the change did), and the
 * latest (the state it was left in). Shorter series are listed whole. The server chooses them
 * over the whole series (server/visits/circuit-logs.ts), so the browser never needs it.
 *
 * @param readings one circuit's standing readings, in the order taken
 * @param adjustmentTimes ISO times of the adjustments that apply to the circuit
 */
export function readingsThatMatter<T extends { takenAt: string | number | Date }>(
  readings: readonly T[],
  adjustmentTimes: readonly string[],
): ReportReadings<T> {
  if (readings.length <= REPORT_ALL_READINGS_UP_TO) return { readings: [...readings], leftOut: 0 };
  const keep = new Set<number>([0]);
  for (let index = Math.max(0, readings.length - REPORT_LATEST_READINGS); index < readings.length; index++)
    keep.add(index);
  const times = readings.map((reading) => new Date(reading.takenAt).getTime());
  for (const at of adjustmentTimes.map((time) => Date.parse(time))) {
    // The first reading at or after the change, and the one before it.
    const after = times.findIndex((time) => time >= at);
    if (after === -1) keep.add(readings.length - 1);
    else {
      keep.add(after);
      if (after > 0) keep.add(after - 1);
    }
  }
  const kept = readings.filter((_reading, index) => keep.has(index));
  return { readings: kept, leftOut: readings.length - kept.length };
}
