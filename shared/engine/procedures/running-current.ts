import type { RunningCurrentKind, RunningCurrentResult } from "../../schemas/procedures.ts";
import { formatTenths } from "../diagnosis/format-tenths.ts";
import { limitSource } from "./limit-source.ts";
import { RUNNING_CURRENT_LIMITS, type RunningCurrentLimits } from "./procedure-limits.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { COMMON_PRACTICE, MEMORY } from "../sources/marks.ts";
import { resolveLimits } from "./resolve-limits.ts";

const SOURCES: Record<RunningCurrentKind, string> = {
  "compressor-rla": cite(PROCEDURE_SOURCES, ["S39"], COMMON_PRACTICE),
  "fan-fla": `${COMMON_PRACTICE}; service factor 1.15 (${MEMORY})`,
};

/**
 * Judges one phase's running current against the nameplate.
 *
 * - compressor-rla: RLA is a rating (maximum continuous current ÷ 1.56 by the UL method, ÷ 1.4
 *   for some makers), not the expected running current; amps above RLA need investigation
 *   [S39] (weak): above 100 % warns, above 140 % (past the lower maximum continuous current)
 *   fails. Compare normal running current with the maker's performance data.
 * - fan-fla: should not exceed FLA (× service factor where stated) (common practice): above
 *   100 % warns, above 115 % (a usual service factor of 1.15, memory) fails.
 * Zero amps warns: the motor is not running or the clamp is on the wrong conductor.
 *
 * @param input running current (A ≥ 0), nameplate RLA or FLA (A > 0) and which one it is
 * @param limits organisation override of RUNNING_CURRENT_LIMITS
 * @returns verdict, reason, source and the current as percent of the nameplate figure
 * @throws RangeError "runningCurrent requires ..." for a negative or non-finite current or a rating ≤ 0
 * @example runningCurrent({ amps: 9.2, ratedA: 10, kind: "compressor-rla" }).percentOfRated // ≈ 92
 */
export function runningCurrent(
  input: { amps: number; ratedA: number; kind: RunningCurrentKind },
  limits?: Partial<RunningCurrentLimits>,
): RunningCurrentResult {
  const { amps, ratedA, kind } = input;
  if (!Number.isFinite(amps) || amps < 0)
    throw new RangeError("runningCurrent requires a finite current of zero or more");
  if (!Number.isFinite(ratedA) || !(ratedA > 0))
    throw new RangeError("runningCurrent requires a nameplate current above zero");
  const { limits: applied, overridden } = resolveLimits(RUNNING_CURRENT_LIMITS, limits);
  const source = limitSource(SOURCES[kind], overridden);
  const percentOfRated = (100 * amps) / ratedA;
  const rating = kind === "compressor-rla" ? "RLA" : "FLA";
  const warnAbove = kind === "compressor-rla" ? applied.compressorWarnAbovePercent : applied.fanWarnAbovePercent;
  const failAbove = kind === "compressor-rla" ? applied.compressorFailAbovePercent : applied.fanFailAbovePercent;
  const shown = `${formatTenths(amps)} A is ${formatTenths(percentOfRated)} % of the ${formatTenths(ratedA)} A ${rating}`;
  if (amps === 0) {
    return {
      verdict: "warn",
      reason: `No current measured: check that the motor is running and the clamp is round one conductor`,
      source,
      percentOfRated,
    };
  }
  if (percentOfRated > failAbove) {
    return {
      verdict: "fail",
      reason: `${shown}, above ${failAbove} %: stop and find the cause (voltage, load, mechanical fault)`,
      source,
      percentOfRated,
    };
  }
  if (percentOfRated > warnAbove) {
    const advice =
      kind === "compressor-rla"
        ? "investigate against the maker's performance data"
        : "check the service factor on the nameplate and the fan's load";
    return { verdict: "warn", reason: `${shown}, above the nameplate: ${advice}`, source, percentOfRated };
  }
  return { verdict: "pass", reason: `${shown}, within the nameplate`, source, percentOfRated };
}
