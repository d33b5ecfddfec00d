import type { RunningCurrentKind } from "../../schemas/procedures.ts";
import { formatTenths } from "../diagnosis/format-tenths.ts";
import { MAX_PLAUSIBLE_TIMES_RATED, type RunningCurrentLimits } from "./procedure-limits.ts";
import { MEMORY } from "../sources/marks.ts";
import { runningCurrent } from "./running-current.ts";

/** A message shown beside a field while typing: caution (check it) or danger (stop). */
export interface LiveNotice {
  level: "caution" | "danger";
  message: string;
  source: string;
}

/**
 * What to say next to a running-current box while the technician types, before anything is
 * saved: the same verdict the server will store (runningCurrent: above the nameplate warns,
 * past the lower maximum continuous current fails [S39]), and a plausibility check the server
 * does not refuse — above MAX_PLAUSIBLE_TIMES_RATED × the rating is more than a locked rotor
 * draws (typically about 5–7 × RLA, memory), so it is a misplaced decimal point or a clamp on
 * the wrong range, not a running current.
 *
 * @param input current as typed (A), nameplate RLA or FLA (A) and which one it is
 * @param limits organisation override of RUNNING_CURRENT_LIMITS
 * @returns null when there is nothing to say (within the nameplate, no current yet, or a value
 *   the schema already refuses), otherwise a caution or danger notice with its source
 * @throws never
 * @example runningCurrentNotice({ amps: 15, ratedA: 10, kind: "compressor-rla" })?.level // "danger"
 */
export function runningCurrentNotice(
  input: { amps: number; ratedA: number; kind: RunningCurrentKind },
  limits?: Partial<RunningCurrentLimits>,
): LiveNotice | null {
  const { amps, ratedA, kind } = input;
  // Zero is left to the saved verdict: it is also what a box holds on the way to "0.5".
  if (!Number.isFinite(amps) || !(amps > 0) || !Number.isFinite(ratedA) || !(ratedA > 0)) return null;
  const rating = kind === "compressor-rla" ? "RLA" : "FLA";
  if (amps > MAX_PLAUSIBLE_TIMES_RATED * ratedA) {
    return {
      level: "caution",
      message: `${formatTenths(amps)} A is ${formatTenths(amps / ratedA)} × the ${formatTenths(ratedA)} A ${rating}: more than a locked rotor draws, so not a running current. Check the decimal point and the clamp's range.`,
      source: `locked-rotor current typically about 5–7 × RLA (${MEMORY})`,
    };
  }
  const verdict = runningCurrent(input, limits);
  if (verdict.verdict === "pass") return null;
  return { level: verdict.verdict === "fail" ? "danger" : "caution", message: verdict.reason, source: verdict.source };
}
