import type { SupplyVoltageResult } from "../../schemas/procedures.ts";
import { formatTenths } from "../diagnosis/format-tenths.ts";
import { limitSource } from "./limit-source.ts";
import { SUPPLY_VOLTAGE_LIMITS, type SupplyVoltageLimits } from "./procedure-limits.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { COMMON_PRACTICE } from "../sources/marks.ts";
import { resolveLimits } from "./resolve-limits.ts";

const SOURCE = cite(PROCEDURE_SOURCES, ["S40"], COMMON_PRACTICE);

/**
 * Judges the supply voltage while running against the nameplate: each phase within ±10 % of
 * the nameplate voltage [S40] (also common practice). Any phase outside fails.
 *
 * @param input measured voltage per phase (1–3 readings, V ≥ 0) and the nameplate voltage (V > 0)
 * @param limits organisation override of SUPPLY_VOLTAGE_LIMITS
 * @returns verdict, reason, source and each phase's deviation, percent of nameplate (signed, + above)
 * @throws RangeError "judgeSupplyVoltage requires ..." for no readings, a negative reading or a nameplate ≤ 0
 * @example judgeSupplyVoltage({ measuredV: [410, 398, 405], nameplateV: 400 }).deviationPercent // [2.5, -0.5, 1.25]
 */
export function judgeSupplyVoltage(
  input: { measuredV: readonly number[]; nameplateV: number },
  limits?: Partial<SupplyVoltageLimits>,
): SupplyVoltageResult {
  const { measuredV, nameplateV } = input;
  if (measuredV.length === 0) throw new RangeError("judgeSupplyVoltage requires at least one measured voltage");
  if (!Number.isFinite(nameplateV) || !(nameplateV > 0))
    throw new RangeError("judgeSupplyVoltage requires a nameplate voltage above zero");
  if (measuredV.some((volts) => !Number.isFinite(volts) || volts < 0))
    throw new RangeError("judgeSupplyVoltage requires finite measured voltages of zero or more");
  const { limits: applied, overridden } = resolveLimits(SUPPLY_VOLTAGE_LIMITS, limits);
  const source = limitSource(SOURCE, overridden);
  const deviationPercent = measuredV.map((volts) => (100 * (volts - nameplateV)) / nameplateV);
  const worst = deviationPercent.reduce(
    (largest, deviation) => (Math.abs(deviation) > Math.abs(largest) ? deviation : largest),
    0,
  );
  const band = `±${applied.maxDeviationPercent} % of the ${nameplateV} V nameplate`;
  if (Math.abs(worst) > applied.maxDeviationPercent) {
    const direction = worst > 0 ? "above" : "below";
    return {
      verdict: "fail",
      reason: `Supply is ${formatTenths(Math.abs(worst))} % ${direction} the nameplate, outside ${band}: correct the supply before running`,
      source,
      deviationPercent,
    };
  }
  return {
    verdict: "pass",
    reason: `Supply is within ${band} (largest deviation ${formatTenths(worst)} %)`,
    source,
    deviationPercent,
  };
}
