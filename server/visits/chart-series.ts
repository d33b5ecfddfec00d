import { MAX_SERIES_POINTS, type ChartPoint } from "@shared/schemas/visits.ts";

/** The lines of the trend chart: each keeps its least and greatest value in every bucket. */
const LINES = ["superheatK", "subcoolingK", "evaporatingTempC", "condensingTempC"] as const;
/** The latest points are sent as they are: the live end of the chart is where the technician looks. */
export const EXACT_TAIL_POINTS = 40;

/**
 * A circuit's chart series reduced to at most `maxPoints` points: the first point, then for each
 * of equal time buckets the readings holding the least and the greatest value of each line (so
 * a peak or a dip of a single reading stays on the chart, which an average or a stride would
 * lose), then the last EXACT_TAIL_POINTS points as they are. Every point kept is a real reading,
 * so a tooltip shows figures that were measured together. Linear in the number of points; a
 * series no longer than `maxPoints` is returned whole.
 *
 * @param points one circuit's standing readings as chart points, in time order
 */
export function chartSeries(points: readonly ChartPoint[], maxPoints = MAX_SERIES_POINTS): ChartPoint[] {
  if (points.length <= maxPoints) return [...points];
  const tailStart = points.length - EXACT_TAIL_POINTS;
  const buckets = Math.max(1, Math.floor((maxPoints - EXACT_TAIL_POINTS - 1) / (2 * LINES.length)));
  // Hot path (every poll of a long run log), unchecked reads: the series is longer than maxPoints
  // here, indexes run below its length, slots below buckets × lines, and LINES[line] is a line.
  const from = points[0]!.x;
  const span = points[tailStart - 1]!.x - from;
  const width = span > 0 ? span / buckets : 1;
  // Per bucket and line, the index of the least and of the greatest value seen (−1: none yet).
  const least = new Int32Array(buckets * LINES.length).fill(-1);
  const greatest = new Int32Array(buckets * LINES.length).fill(-1);
  for (let index = 1; index < tailStart; index++) {
    const point = points[index]!;
    const bucket = Math.min(buckets - 1, Math.floor((point.x - from) / width));
    for (let line = 0; line < LINES.length; line++) {
      const value = point[LINES[line]!];
      if (value === null) continue;
      const slot = bucket * LINES.length + line;
      const low = least[slot]!;
      if (low < 0 || value < points[low]![LINES[line]!]!) least[slot] = index;
      const high = greatest[slot]!;
      if (high < 0 || value > points[high]![LINES[line]!]!) greatest[slot] = index;
    }
  }
  const kept = new Set<number>([0]);
  for (const index of least) if (index >= 0) kept.add(index);
  for (const index of greatest) if (index >= 0) kept.add(index);
  for (let index = tailStart; index < points.length; index++) kept.add(index);
  return [...kept].sort((a, b) => a - b).map((index) => points[index]!); // kept holds indexes of points
}
