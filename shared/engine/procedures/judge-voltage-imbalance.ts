import type { Verdict } from "../../schemas/procedures.ts";
import { formatTenths } from "../diagnosis/format-tenths.ts";
import { limitSource } from "./limit-source.ts";
import { VOLTAGE_IMBALANCE_LIMITS, type VoltageImbalanceLimits } from "./procedure-limits.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { resolveLimits } from "./resolve-limits.ts";

const SOURCE = cite(PROCEDURE_SOURCES, ["S41", "S42", "S43", "S44"]);

/**
 * Judges a three-phase voltage imbalance. Up to 2 % passes (HVAC equipment makers' maximum
 * [S41][S42]); above 2 % warns (motor heating, derate; call the supply authority); above 5 %
 * fails (NEMA MG-1: do not operate [S43][S44]). Between 1 % and 2 % the reason notes NEMA MG-1's
 * recommendation of ≤ 1 % at the motor terminals.
 *
 * @param percent imbalance from `voltageImbalance`, percent (finite, ≥ 0)
 * @param limits organisation override of VOLTAGE_IMBALANCE_LIMITS (any subset)
 * @returns verdict, reason and source
 * @throws RangeError "judgeVoltageImbalance requires a finite percentage of zero or more"
 * @example judgeVoltageImbalance(1.97).verdict // "pass"
 */
export function judgeVoltageImbalance(percent: number, limits?: Partial<VoltageImbalanceLimits>): Verdict {
  if (!Number.isFinite(percent) || percent < 0)
    throw new RangeError("judgeVoltageImbalance requires a finite percentage of zero or more");
  const { limits: applied, overridden } = resolveLimits(VOLTAGE_IMBALANCE_LIMITS, limits);
  const source = limitSource(SOURCE, overridden);
  const shown = `${formatTenths(percent)} %`;
  if (percent > applied.failAbovePercent) {
    return {
      verdict: "fail",
      reason: `Voltage imbalance ${shown} is above ${applied.failAbovePercent} %: do not run the motor until the supply is corrected`,
      source,
    };
  }
  if (percent > applied.passUpToPercent) {
    return {
      verdict: "warn",
      reason: `Voltage imbalance ${shown} is above the ${applied.passUpToPercent} % equipment limit: the motor runs hot; have the supply checked`,
      source,
    };
  }
  if (percent > applied.recommendedPercent) {
    return {
      verdict: "pass",
      reason: `Voltage imbalance ${shown} is within the ${applied.passUpToPercent} % equipment limit (NEMA MG-1 recommends ${applied.recommendedPercent} % or less at the motor terminals)`,
      source,
    };
  }
  return { verdict: "pass", reason: `Voltage imbalance ${shown} is within ${applied.recommendedPercent} %`, source };
}
