import type { EvacuationResult } from "../../schemas/procedure-records.ts";
import type { ProcedureLimits, VacuumSample, Verdict } from "../../schemas/procedures.ts";
import { analyseDecay } from "./analyse-decay.ts";
import { evacuationReached } from "./evacuation-reached.ts";

const DECAY_VERDICT: Record<"held" | "moisture" | "leak", Verdict["verdict"]> = {
  held: "pass",
  moisture: "warn",
  leak: "fail",
};

/**
 * The evacuation so far: whether the pull-down reached the target and, once the pump is valved
 * off and at least two readings follow (the one at isolation counts), the decay analysis.
 */
export function evacuationResult(
  samples: VacuumSample[],
  targetMicrons: number,
  isolatedAtMinutes: number | null,
  limits: ProcedureLimits = {},
): EvacuationResult {
  const pullDown =
    isolatedAtMinutes === null ? samples : samples.filter((sample) => sample.minutes <= isolatedAtMinutes);
  const reached =
    pullDown.length > 0 ? evacuationReached(pullDown, targetMicrons) : { reached: false, atMinutes: null };
  if (isolatedAtMinutes === null)
    return { stage: "pulling-down", reached, decay: null, decayMinutes: null, overall: null };

  const decaySamples = samples.filter((sample) => sample.minutes >= isolatedAtMinutes);
  const [firstDecay] = decaySamples;
  const lastDecay = decaySamples.at(-1);
  if (decaySamples.length < 2 || !firstDecay || !lastDecay)
    return { stage: "decay-test", reached, decay: null, decayMinutes: null, overall: null };
  const decay = analyseDecay(decaySamples, { ...limits.evacuation, targetMicrons });
  return {
    stage: "judged",
    reached,
    decay,
    decayMinutes: lastDecay.minutes - firstDecay.minutes,
    overall: { check: "Decay test", verdict: DECAY_VERDICT[decay.verdict], reason: decay.reason, source: decay.source },
  };
}
