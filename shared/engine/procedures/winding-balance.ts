import type { WindingBalanceResult } from "../../schemas/procedures.ts";
import { formatTenths } from "../diagnosis/format-tenths.ts";
import { largestDeviationPercent } from "./largest-deviation-percent.ts";
import { limitSource } from "./limit-source.ts";
import { WINDING_BALANCE_LIMITS, type WindingBalanceLimits } from "./procedure-limits.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { MEMORY } from "../sources/marks.ts";
import { resolveLimits } from "./resolve-limits.ts";

const SOURCE = cite(PROCEDURE_SOURCES, ["S44"], `small hermetic compressors within a few percent (${MEMORY})`);

/**
 * Judges the balance of three lead-to-lead winding resistances: the largest deviation from
 * their average, percent of the average (same formula as the voltage imbalance). Within 2 %
 * passes (motor practice with a low-resistance ohmmeter [S44]); up to 5 % warns (small
 * hermetic compressors show "a few percent", memory: compare with the maker's data); beyond
 * fails (a shorted turn or a bad connection).
 *
 * @param ohms resistances T1–T2, T2–T3, T3–T1, Ω (each > 0; an open winding is a fault, not a number)
 * @param limits organisation override of WINDING_BALANCE_LIMITS
 * @returns verdict, reason, source and the largest deviation, percent of the average
 * @throws RangeError "windingBalance requires ..." for a zero, negative or non-finite resistance
 * @example windingBalance([1.52, 1.50, 1.55]).maxDeviationPercent // ≈ 1.75
 */
export function windingBalance(
  ohms: readonly [number, number, number],
  limits?: Partial<WindingBalanceLimits>,
): WindingBalanceResult {
  if (ohms.some((value) => !Number.isFinite(value) || !(value > 0)))
    throw new RangeError("windingBalance requires three finite resistances above zero");
  const maxDeviationPercent = largestDeviationPercent(ohms, "windingBalance");
  const { limits: applied, overridden } = resolveLimits(WINDING_BALANCE_LIMITS, limits);
  const source = limitSource(SOURCE, overridden);
  const shown = `${formatTenths(maxDeviationPercent)} %`;
  if (maxDeviationPercent > applied.warnWithinPercent) {
    return {
      verdict: "fail",
      reason: `Winding resistances differ by up to ${shown} from their average, more than ${applied.warnWithinPercent} %: suspect a shorted turn or a poor connection`,
      source,
      maxDeviationPercent,
    };
  }
  if (maxDeviationPercent > applied.passWithinPercent) {
    return {
      verdict: "warn",
      reason: `Winding resistances differ by up to ${shown} from their average, more than ${applied.passWithinPercent} %: compare with the maker's figures`,
      source,
      maxDeviationPercent,
    };
  }
  return {
    verdict: "pass",
    reason: `Winding resistances are within ${applied.passWithinPercent} % of their average (${shown})`,
    source,
    maxDeviationPercent,
  };
}
