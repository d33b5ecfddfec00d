import type { SinglePhaseWindingInput, SinglePhaseWindingResult } from "../../schemas/procedures.ts";
import { formatTenths } from "../diagnosis/format-tenths.ts";
import { limitSource } from "./limit-source.ts";
import { SINGLE_PHASE_WINDING_LIMITS, type SinglePhaseWindingLimits } from "./procedure-limits.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { COMMON_PRACTICE, MEMORY } from "../sources/marks.ts";
import { resolveLimits } from "./resolve-limits.ts";

const SOURCE = cite(PROCEDURE_SOURCES, ["S46"], `R–S = C–R + C–S (${MEMORY}); tolerance bands (${COMMON_PRACTICE})`);

/** Ohms to two decimals: winding readings are often a few ohms, so tenths hide the difference. */
const ohmsText = (value: number) => `${(Math.round(value * 100) / 100).toFixed(2)} Ω`;

/**
 * Judges a single-phase compressor's windings from its three terminal readings. The run winding
 * sits between C and R, the start winding between C and S, so R–S reads both in series:
 * R–S = C–R + C–S, and the start winding reads higher than the run winding ([S46]; memory).
 *
 * - The sum: R–S within the larger of 5 % of R–S or 0.2 Ω of C–R + C–S passes (lead and contact
 *   resistance); up to 10 % warns (clean the terminals and measure again); beyond fails (an open
 *   or shorted winding, or the terminals are not what they seem).
 * - The order: with the sum right but C–S no higher than C–R, the terminals are probably
 *   mislabelled (warn): the lowest reading is C–R, the highest R–S.
 *
 * @param ohms C–R, C–S and R–S, Ω (each > 0; an open winding is a fault, not a number)
 * @param limits organisation override of SINGLE_PHASE_WINDING_LIMITS
 * @returns verdict, reason, source, C–R + C–S, the mismatch as percent of R–S, and whether start reads above run
 * @throws RangeError "singlePhaseWindings requires ..." for a zero, negative or non-finite resistance
 * @example singlePhaseWindings({ commonRun: 1.2, commonStart: 3.1, runStart: 4.3 }).verdict // "pass"
 */
export function singlePhaseWindings(
  ohms: SinglePhaseWindingInput,
  limits?: Partial<SinglePhaseWindingLimits>,
): SinglePhaseWindingResult {
  const { commonRun, commonStart, runStart } = ohms;
  if ([commonRun, commonStart, runStart].some((value) => !Number.isFinite(value) || !(value > 0))) {
    throw new RangeError("singlePhaseWindings requires three finite resistances above zero");
  }
  const { limits: applied, overridden } = resolveLimits(SINGLE_PHASE_WINDING_LIMITS, limits);
  const source = limitSource(SOURCE, overridden);
  const expectedRunStartOhms = commonRun + commonStart;
  const mismatch = Math.abs(runStart - expectedRunStartOhms);
  const sumMismatchPercent = (100 * mismatch) / runStart;
  const startAboveRun = commonStart > commonRun;
  const common = { source, expectedRunStartOhms, sumMismatchPercent, startAboveRun };
  const sum = `R–S reads ${ohmsText(runStart)}, C–R + C–S is ${ohmsText(expectedRunStartOhms)} (${formatTenths(sumMismatchPercent)} % apart)`;

  const allowance = Math.max((applied.passWithinPercent / 100) * runStart, applied.meterAllowanceOhms);
  if (mismatch > allowance) {
    if (sumMismatchPercent > applied.warnWithinPercent) {
      return {
        verdict: "fail",
        reason: `${sum}, more than ${applied.warnWithinPercent} %: suspect an open or shorted winding or misread terminals; measure again at clean terminals before running`,
        ...common,
      };
    }
    return {
      verdict: "warn",
      reason: `${sum}, more than ${applied.passWithinPercent} %: clean the terminals, zero the meter leads and measure again`,
      ...common,
    };
  }
  if (!startAboveRun) {
    return {
      verdict: "warn",
      reason: `C–S (${ohmsText(commonStart)}) is not above C–R (${ohmsText(commonRun)}): the start winding normally reads higher, so check which terminal is which (lowest reading C–R, highest R–S)`,
      ...common,
    };
  }
  return {
    verdict: "pass",
    reason: `${sum}: the windings add up and the start winding reads above the run winding`,
    ...common,
  };
}
