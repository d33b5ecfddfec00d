import type { StandingPressureInput, StandingPressureResult } from "../../schemas/procedures.ts";
import { formatTenths } from "../diagnosis/format-tenths.ts";
import { getRefrigerant } from "../properties/get-refrigerant.ts";
import { STANDARD_ATMOSPHERE_KPA } from "../properties/property-tolerances.ts";
import { saturationPressure } from "../properties/saturation-pressure.ts";
import { saturationTemperature } from "../properties/saturation-temperature.ts";
import { cite } from "../sources/cite.ts";
import { PROCEDURE_SOURCES } from "../sources/procedure-sources.ts";
import { COMMON_PRACTICE } from "../sources/marks.ts";

/**
 * Saturation temperature above the equalised temperature beyond which the standing pressure
 * shows non-condensables, K: 5 °F [S31].
 */
export const NON_CONDENSABLE_EXCESS_K = 3;
/** Allowance for the thermometer and gauge before any excess is read as real, K (sensor ±0.6 K [S10], gauge ±1 %). */
export const STANDING_PRESSURE_TOLERANCE_K = 1;
/** Glide at the equalised temperature above which a blend is treated as zeotropic, K. */
const ZEOTROPE_GLIDE_K = 0.5;

const SOURCE = cite(
  PROCEDURE_SOURCES,
  ["S27", "S28", "S31"],
  `±${STANDING_PRESSURE_TOLERANCE_K} K for thermometer and gauge (${COMMON_PRACTICE})`,
);
const BLEND_SOURCE = cite(
  PROCEDURE_SOURCES,
  ["S27", "S31", "S1"],
  `a blend's standing pressure lies between its dew and bubble pressures (${COMMON_PRACTICE})`,
);

/**
 * Non-condensables check from the off-cycle standing pressure: with the unit stopped and the
 * condenser at the outdoor temperature (fan run until the air leaving equals the air entering),
 * a condenser holding liquid stands at the saturation pressure of that temperature; air or
 * nitrogen adds its own partial pressure on top [S27][S28]. The excess is expressed as the
 * saturation temperature at the standing pressure minus the equalised temperature: more than
 * 3 K (5 °F) is non-condensables [S31]; 1–3 K is suspect (re-check the thermometer and give the
 * condenser longer to equalise); within ±1 K none is shown; more than 1 K below means no liquid
 * is left to hold saturation (very short of charge) or the circuit has not equalised.
 *
 * Zeotropic blends (glide over 0.5 K): the standing pressure lies between the dew and the
 * bubble pressure, depending on how much liquid remains and its shifted composition, so the
 * check compares with the bubble pressure (its upper bound). Only a pressure above it shows air;
 * a pressure inside the glide can neither show air nor rule a small amount out.
 *
 * Units: kPa gauge, °C in; kPa, K out. Valid: the refrigerant's saturation table.
 *
 * @throws {PropertyRangeError} for an unknown refrigerant or a temperature or pressure outside its table
 * @throws {RangeError} for non-finite readings or a pressure below a perfect vacuum
 * @example judgeStandingPressure({ refrigerant: "R410A", standingGaugeKPa: 1750, equalisedTempC: 25 }).verdict // "fail" (4.2 K above 25 °C: air in the condenser)
 */
export function judgeStandingPressure(input: StandingPressureInput): StandingPressureResult {
  const atmosphere = input.atmosphericPressureKPa ?? STANDARD_ATMOSPHERE_KPA;
  const { refrigerant, standingGaugeKPa, equalisedTempC } = input;
  if (![standingGaugeKPa, equalisedTempC, atmosphere].every(Number.isFinite))
    throw new RangeError("judgeStandingPressure requires finite readings");
  const standingAbs = standingGaugeKPa + atmosphere;
  if (!(standingAbs > 0)) throw new RangeError("judgeStandingPressure requires a pressure above a perfect vacuum");
  const info = getRefrigerant(refrigerant);
  const bubbleAbs = saturationPressure(refrigerant, equalisedTempC, "bubble");
  const dewAbs = saturationPressure(refrigerant, equalisedTempC, "dew");
  const zeotrope =
    info.kind === "blend" && saturationTemperature(refrigerant, bubbleAbs, "dew") - equalisedTempC > ZEOTROPE_GLIDE_K;
  // Bubble point: the temperature a liquid-holding condenser would be at for this pressure.
  const standingSaturationC = saturationTemperature(refrigerant, standingAbs, "bubble");
  const excessK = standingSaturationC - equalisedTempC;
  const standingDewC = saturationTemperature(refrigerant, standingAbs, "dew");
  const expected = `${formatTenths(bubbleAbs - atmosphere)} kPa at ${formatTenths(equalisedTempC)} °C`;
  const base = {
    expectedGaugeKPa: bubbleAbs - atmosphere,
    dewGaugeKPa: dewAbs - atmosphere,
    excessKPa: standingAbs - bubbleAbs,
    excessK,
    zeotrope,
    source: zeotrope ? BLEND_SOURCE : SOURCE,
  };
  const read = `standing ${formatTenths(standingGaugeKPa)} kPa against ${zeotrope ? "a bubble pressure of " : ""}${expected}`;
  if (excessK > NON_CONDENSABLE_EXCESS_K) {
    return {
      ...base,
      verdict: "fail",
      reason: `Non-condensables: ${read}, worth ${formatTenths(excessK)} K above the condenser's temperature (limit ${NON_CONDENSABLE_EXCESS_K} K). Recover, evacuate and recharge by weight`,
    };
  }
  if (excessK > STANDING_PRESSURE_TOLERANCE_K) {
    return {
      ...base,
      verdict: "warn",
      reason: `Suspect: ${read}, ${formatTenths(excessK)} K above the condenser's temperature. Check the thermometer, let the condenser equalise longer and read again`,
    };
  }
  if (standingDewC < equalisedTempC - STANDING_PRESSURE_TOLERANCE_K) {
    return {
      ...base,
      verdict: "warn",
      reason: `Below saturation: ${read} (dew point ${formatTenths(standingDewC)} °C). No liquid is left to hold the saturation pressure (very short of charge), or the circuit has not equalised; this check cannot show air`,
    };
  }
  return {
    ...base,
    verdict: "pass",
    reason: zeotrope
      ? `No excess over the bubble pressure: ${read}. For a zeotropic blend a small amount of air inside the glide (dew ${formatTenths(dewAbs - atmosphere)} kPa to bubble) can neither be shown nor ruled out`
      : `No non-condensables shown: ${read} (${formatTenths(excessK)} K)`,
  };
}
