/**
 * Keeps one reading per instant, for `assessTrend`, which needs strictly increasing times.
 * Two readings can share a timestamp (a CSV import at minute resolution, two technicians saving
 * in the same millisecond); of each such run the last one in storage order is kept, as the
 * later entry is the one the technician meant to stand. Every caller of the trend goes through
 * here so the run log, the settled reference point and the unit's page judge the same series.
 *
 * @param readings in time order (equal times adjacent)
 * @param time the reading's instant in milliseconds
 * @returns the readings with strictly increasing times
 * @example lastAtEachInstant([a0, b0, c1], (r) => r.t) // [b0, c1]
 */
export function lastAtEachInstant<T>(readings: readonly T[], time: (reading: T) => number): T[] {
  const kept: T[] = [];
  readings.forEach((reading, index) => {
    const next = readings[index + 1];
    if (next === undefined || time(next) > time(reading)) kept.push(reading);
  });
  return kept;
}
