import type { EvacuationReached } from "../../schemas/procedures.ts";
import { EVACUATION_LIMITS } from "./procedure-limits.ts";
import { requireVacuumSamples } from "./require-vacuum-samples.ts";

/**
 * Whether a pull-down reached the evacuation target, and when: the time of the first reading
 * at or below the target (no interpolation between readings; the technician saw that reading).
 * The default target is 500 microns, the industry norm on an electronic micron gauge [S4];
 * an organisation may set another.
 *
 * @param samples timed readings in time order: minutes (strictly increasing), microns absolute (≥ 0)
 * @param targetMicrons target, microns (> 0), default 500
 * @returns reached, and the minutes of the first reading at or under the target (null if none)
 * @throws RangeError "evacuationReached requires ..." for no readings, unsorted or non-finite readings, or a target ≤ 0
 * @example evacuationReached([{ minutes: 0, microns: 20000 }, { minutes: 30, microns: 450 }]) // { reached: true, atMinutes: 30 }
 */
export function evacuationReached(
  samples: readonly { minutes: number; microns: number }[],
  targetMicrons: number = EVACUATION_LIMITS.targetMicrons,
): EvacuationReached {
  if (!Number.isFinite(targetMicrons) || !(targetMicrons > 0))
    throw new RangeError("evacuationReached requires a target above zero microns");
  requireVacuumSamples(samples, 1, "evacuationReached");
  const first = samples.find((sample) => sample.microns <= targetMicrons);
  return first === undefined ? { reached: false, atMinutes: null } : { reached: true, atMinutes: first.minutes };
}
