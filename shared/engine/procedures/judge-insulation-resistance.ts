import type { InsulationKind, InsulationResistanceResult } from "../../schemas/procedures.ts";
import { formatHundredths } from "../diagnosis/format-hundredths.ts";
import { limitSource } from "./limit-source.ts";
import { INSULATION_LIMITS, type InsulationLimits } from "./procedure-limits.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { COMMON_PRACTICE, MEMORY } from "../sources/marks.ts";
import { resolveLimits } from "./resolve-limits.ts";

const SOURCES: Record<InsulationKind, string> = {
  wiring: cite(PROCEDURE_SOURCES, ["S47"], `500 V d.c. test voltage (${MEMORY})`),
  compressor: cite(
    PROCEDURE_SOURCES,
    ["S48", "S49"],
    `re-test after the crankcase heater has run (${COMMON_PRACTICE})`,
  ),
  motor: cite(PROCEDURE_SOURCES, ["S47"], `IEEE 43 5 MΩ for random-wound machines below 1 kV (${MEMORY})`),
};

/**
 * Judges an insulation-resistance reading to earth. Nothing is refused; every reading is judged.
 *
 * - wiring: at least 1 MΩ (AS/NZS 3000 Wiring Rules, Section 8 verification [S47], weak
 *   source) at 500 V d.c. (memory). Below fails; a pass at a lower test voltage is a warn,
 *   because the Wiring Rules figure is for 500 V.
 * - compressor (hermetic or semi-hermetic, pin to shell): below 0.5 MΩ fails (under even the
 *   scroll maker's allowance [S49]); 0.5 up to 2 MΩ warns (one maker calls below 2 MΩ a ground
 *   fault [S48], a scroll maker accepts down to 0.5 MΩ [S49]: check the maker's figure, run the
 *   crankcase heater and re-test — a cold, refrigerant-logged compressor can recover, common
 *   practice); 2 MΩ and above passes. Never megger a compressor under vacuum [S49].
 * - motor (fan, pump): below the 1 MΩ wiring minimum fails [S47]; 1 up to 5 MΩ warns (IEEE 43
 *   gives 5 MΩ for random-wound machines below 1 kV, memory); 5 MΩ and above passes.
 *
 * `minimumMegohms` is the reading needed for a pass (wiring 1, compressor 2, motor 5 by default).
 *
 * @param input reading (MΩ ≥ 0), tester voltage (V d.c. > 0) and what was tested
 * @param limits organisation override of INSULATION_LIMITS
 * @returns verdict, reason, source and the pass minimum, MΩ
 * @throws RangeError "judgeInsulationResistance requires ..." for a negative or non-finite reading or a test voltage ≤ 0
 * @example judgeInsulationResistance({ megohms: 1.2, testVoltageV: 500, kind: "compressor" }).verdict // "warn"
 */
export function judgeInsulationResistance(
  input: { megohms: number; testVoltageV: number; kind: InsulationKind },
  limits?: Partial<InsulationLimits>,
): InsulationResistanceResult {
  const { megohms, testVoltageV, kind } = input;
  if (!Number.isFinite(megohms) || megohms < 0)
    throw new RangeError("judgeInsulationResistance requires a finite reading of zero or more megohms");
  if (!Number.isFinite(testVoltageV) || !(testVoltageV > 0))
    throw new RangeError("judgeInsulationResistance requires a test voltage above zero");
  const { limits: applied, overridden } = resolveLimits(INSULATION_LIMITS, limits);
  const source = limitSource(SOURCES[kind], overridden);
  const reading = `${formatHundredths(megohms)} MΩ at ${testVoltageV} V`;

  if (kind === "wiring") {
    const minimumMegohms = applied.wiringMinimumMegohms;
    if (megohms < minimumMegohms) {
      return {
        verdict: "fail",
        reason: `Wiring insulation ${reading} is below the ${minimumMegohms} MΩ minimum: find the fault before energising`,
        source,
        minimumMegohms,
      };
    }
    if (testVoltageV < applied.wiringTestVoltageV) {
      return {
        verdict: "warn",
        reason: `Wiring insulation ${reading} meets ${minimumMegohms} MΩ, but the test voltage is below ${applied.wiringTestVoltageV} V d.c.: re-test at ${applied.wiringTestVoltageV} V`,
        source,
        minimumMegohms,
      };
    }
    return {
      verdict: "pass",
      reason: `Wiring insulation ${reading} meets the ${minimumMegohms} MΩ minimum`,
      source,
      minimumMegohms,
    };
  }

  const failBelow = kind === "compressor" ? applied.compressorFailBelowMegohms : applied.motorFailBelowMegohms;
  const minimumMegohms = kind === "compressor" ? applied.compressorPassFromMegohms : applied.motorPassFromMegohms;
  const what = kind === "compressor" ? "Compressor winding insulation" : "Motor winding insulation";
  if (megohms < failBelow) {
    return {
      verdict: "fail",
      reason: `${what} ${reading} is below ${failBelow} MΩ: treat it as a ground fault and do not energise`,
      source,
      minimumMegohms,
    };
  }
  if (megohms < minimumMegohms) {
    const advice =
      kind === "compressor"
        ? "check the maker's minimum, run the crankcase heater and re-test"
        : "dry out or re-test, and check the maker's minimum";
    return {
      verdict: "warn",
      reason: `${what} ${reading} is below ${minimumMegohms} MΩ: ${advice}`,
      source,
      minimumMegohms,
    };
  }
  return { verdict: "pass", reason: `${what} ${reading} is at or above ${minimumMegohms} MΩ`, source, minimumMegohms };
}
