import type { Verdict } from "../../schemas/procedures.ts";
import { upperFirst } from "../../format/upper-first.ts";
import { formatHundredths } from "../diagnosis/format-hundredths.ts";
import { limitSource } from "./limit-source.ts";
import { CYLINDER_FILL_LIMITS, type CylinderFillLimits } from "./procedure-limits.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { COMMON_PRACTICE } from "../sources/marks.ts";
import { resolveLimits } from "./resolve-limits.ts";

const SOURCE = cite(PROCEDURE_SOURCES, ["S79", "S78"], `warning margin (${COMMON_PRACTICE})`);

/**
 * Judges a recovery cylinder's contents against its fill limit (from `cylinderFillLimit`):
 * past the limit fails (liquid could fill the cylinder when it warms [S79][S78]); from 90 % of
 * the limit warns, so the technician changes cylinders before reaching it (this engine's
 * choice of margin); below passes.
 *
 * @param input contents (kg ≥ 0) and the fill limit (kg > 0)
 * @param limits organisation override of CYLINDER_FILL_LIMITS (warnFromFractionOfLimit)
 * @returns verdict, reason and source
 * @throws RangeError "judgeCylinderFill requires ..." for negative or non-finite contents or a limit ≤ 0
 * @example judgeCylinderFill({ contentsKg: 7.2, maxContentsKg: 7.7 }).verdict // "warn"
 */
export function judgeCylinderFill(
  input: { contentsKg: number; maxContentsKg: number },
  limits?: Partial<CylinderFillLimits>,
): Verdict {
  const { contentsKg, maxContentsKg } = input;
  if (!Number.isFinite(contentsKg) || contentsKg < 0)
    throw new RangeError("judgeCylinderFill requires finite contents of zero or more");
  if (!Number.isFinite(maxContentsKg) || !(maxContentsKg > 0))
    throw new RangeError("judgeCylinderFill requires a fill limit above zero");
  const { limits: applied, overridden } = resolveLimits(CYLINDER_FILL_LIMITS, limits);
  const source = limitSource(SOURCE, overridden);
  const percent = Math.round((100 * contentsKg) / maxContentsKg);
  const shown = `${formatHundredths(contentsKg)} kg is ${percent} % of the ${formatHundredths(maxContentsKg)} kg fill limit`;
  if (contentsKg > maxContentsKg) {
    return {
      verdict: "fail",
      reason: `Overfilled: ${shown}; transfer refrigerant out before the cylinder warms`,
      source,
    };
  }
  if (contentsKg >= applied.warnFromFractionOfLimit * maxContentsKg) {
    return { verdict: "warn", reason: `Nearly full: ${shown}; use another cylinder for further recovery`, source };
  }
  return { verdict: "pass", reason: upperFirst(shown), source };
}
