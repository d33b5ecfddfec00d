/**
 * Checks timed vacuum readings before they are analysed: enough of them, finite, microns of
 * zero or more, minutes strictly increasing (rates need time to move forward).
 *
 * @param samples readings in time order: minutes (any origin), microns absolute
 * @param minimumCount fewest readings the caller needs (one or more)
 * @param caller name of the public function, for the message
 * @returns the first and the last reading (the same one when there is only one)
 * @throws RangeError "<caller> requires ..." when a check fails
 * @example requireVacuumSamples([{ minutes: 0, microns: 400 }], 1, "evacuationReached") // { first: { minutes: 0, microns: 400 }, last: { minutes: 0, microns: 400 } }
 */
export function requireVacuumSamples<Sample extends { minutes: number; microns: number }>(
  samples: readonly Sample[],
  minimumCount: number,
  caller: string,
): { first: Sample; last: Sample } {
  const first = samples[0];
  const last = samples.at(-1);
  if (samples.length < minimumCount || first === undefined || last === undefined)
    throw new RangeError(`${caller} requires at least ${minimumCount} reading${minimumCount === 1 ? "" : "s"}`);
  let previousMinutes = -Infinity;
  for (const sample of samples) {
    if (!Number.isFinite(sample.minutes) || !Number.isFinite(sample.microns))
      throw new RangeError(`${caller} requires finite minutes and microns`);
    if (sample.microns < 0) throw new RangeError(`${caller} requires readings of zero microns or more`);
    if (!(sample.minutes > previousMinutes)) throw new RangeError(`${caller} requires strictly increasing minutes`);
    previousMinutes = sample.minutes;
  }
  return { first, last };
}
