import type { ChargeAgainstNameplateResult } from "../../schemas/procedures.ts";
import { formatHundredths } from "../diagnosis/format-hundredths.ts";
import { formatTenths } from "../diagnosis/format-tenths.ts";
import { limitSource } from "./limit-source.ts";
import { CHARGE_LIMITS, type ChargeLimits } from "./procedure-limits.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { COMMON_PRACTICE } from "../sources/marks.ts";
import { resolveLimits } from "./resolve-limits.ts";

const SOURCE = cite(PROCEDURE_SOURCES, ["S11", "S10"], `2 % and 10 % bands (${COMMON_PRACTICE})`);

/**
 * Judges a weighed-in charge against the nameplate charge plus the line-length adjustment
 * (the nameplate covers the unit and a stated line length; add or remove per metre of liquid
 * line beyond it [S11]). Passes within the larger of the scale accuracy (about ±28 g, ±1 oz
 * [S11]) and 2 % of the expected charge; warns up to 10 % (verify by subcooling or superheat
 * at stable conditions [S11][S10]); fails beyond. The 2 % and 10 % bands are this engine's
 * choice (common practice). Zeotropic (400-series) blends must be charged as liquid [S4].
 *
 * @param input nameplate charge (kg > 0), weighed-in charge (kg ≥ 0), line adjustment (kg, + added, − removed; default 0)
 * @param limits organisation override of CHARGE_LIMITS
 * @returns verdict, reason, source, expected charge (kg), difference weighed − expected (kg) and as percent of expected
 * @throws RangeError "chargeAgainstNameplate requires ..." for non-finite masses, a negative
 *   weighed-in charge, or an expected charge (nameplate + adjustment) ≤ 0
 * @example chargeAgainstNameplate({ nameplateKg: 2.4, weighedInKg: 2.65, lineAdjustmentKg: 0.3 }).verdict // "pass"
 */
export function chargeAgainstNameplate(
  input: { nameplateKg: number; weighedInKg: number; lineAdjustmentKg?: number },
  limits?: Partial<ChargeLimits>,
): ChargeAgainstNameplateResult {
  const { nameplateKg, weighedInKg } = input;
  const lineAdjustmentKg = input.lineAdjustmentKg ?? 0;
  if (![nameplateKg, weighedInKg, lineAdjustmentKg].every(Number.isFinite))
    throw new RangeError("chargeAgainstNameplate requires finite masses");
  if (weighedInKg < 0) throw new RangeError("chargeAgainstNameplate requires a weighed-in charge of zero or more");
  const expectedKg = nameplateKg + lineAdjustmentKg;
  if (!(nameplateKg > 0) || !(expectedKg > 0))
    throw new RangeError("chargeAgainstNameplate requires a nameplate charge, with its line adjustment, above zero");
  const { limits: applied, overridden } = resolveLimits(CHARGE_LIMITS, limits);
  const source = limitSource(SOURCE, overridden);
  const differenceKg = weighedInKg - expectedKg;
  const percent = (100 * differenceKg) / expectedKg;
  const passWithinKg = Math.max(applied.scaleToleranceKg, (applied.passWithinPercent / 100) * expectedKg);
  const direction = differenceKg > 0 ? "more" : "less";
  const shown = `${formatHundredths(weighedInKg)} kg weighed in against ${formatHundredths(expectedKg)} kg expected`;
  const result = { source, expectedKg, differenceKg, percent };
  if (Math.abs(differenceKg) <= passWithinKg) {
    return { verdict: "pass", reason: `${shown}: within ${formatHundredths(passWithinKg)} kg`, ...result };
  }
  const off = `${formatHundredths(Math.abs(differenceKg))} kg (${formatTenths(Math.abs(percent))} %) ${direction} than expected`;
  if (Math.abs(percent) <= applied.warnWithinPercent) {
    return { verdict: "warn", reason: `${shown}: ${off}; check by subcooling or superheat once stable`, ...result };
  }
  return {
    verdict: "fail",
    reason: `${shown}: ${off}, beyond ${applied.warnWithinPercent} %; recheck the nameplate, line length and scale`,
    ...result,
  };
}
