/**
 * Checks timed vacuum readings before they are analysed: enough of them, finite, microns of
 * zero or more, minutes strictly increasing (rates need time to move forward).
 *
 * @param samples readings in time order: minutes (any origin), microns absolute
 * @param minimumCount fewest readings the caller needs
 * @param caller name of the public function, for the message
 * @throws RangeError "<caller> requires ..." when a check fails
 * @example requireVacuumSamples([{ minutes: 0, microns: 400 }], 1, "evacuationReached") // returns nothing
 */
export function requireVacuumSamples(
  samples: readonly { minutes: number; microns: number }[],
  minimumCount: number,
  caller: string,
): void {
  if (samples.length < minimumCount)
    throw new RangeError(`${caller} requires at least ${minimumCount} reading${minimumCount === 1 ? "" : "s"}`);
  let previousMinutes = -Infinity;
  for (const sample of samples) {
    if (!Number.isFinite(sample.minutes) || !Number.isFinite(sample.microns))
      throw new RangeError(`${caller} requires finite minutes and microns`);
    if (sample.microns < 0) throw new RangeError(`${caller} requires readings of zero microns or more`);
    if (!(sample.minutes > previousMinutes)) throw new RangeError(`${caller} requires strictly increasing minutes`);
    previousMinutes = sample.minutes;
  }
}
