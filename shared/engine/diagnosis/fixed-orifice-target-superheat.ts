import {
  FIXED_ORIFICE_OUTDOOR_RANGE_C,
  FIXED_ORIFICE_WET_BULB_RANGE_C,
  MIN_VALID_TARGET_SUPERHEAT_K,
} from "./diagnosis-limits.ts";

/** Outcome of the fixed-orifice target: a usable target, or why there is none. */
export type FixedOrificeTarget =
  | { status: "ok"; targetK: number }
  | { status: "outside-range"; reason: string }
  | { status: "weigh-in"; targetK: number; reason: string };

/** Coefficients of the metric form: SH = 1.5 × WB − 0.5 × DB − 40/9 (K, °C). */
const WET_BULB_COEFFICIENT = 1.5;
const DRY_BULB_COEFFICIENT = 0.5;
const OFFSET_K = 40 / 9;

/**
 * Target suction superheat for a fixed metering device (piston / capillary), from the indoor
 * return-air wet bulb and the outdoor dry bulb entering the condenser.
 *
 * The commonly taught linear approximation of manufacturers' charging charts is
 * SH(°F) = (3 × WB(°F) − 80 − DB(°F)) / 2 (trade training, from memory, TRADE.md §1.4).
 * Substituting °F = 1.8 °C + 32 and dividing by 1.8 gives the exact metric form
 * SH(K) = 1.5 × WB(°C) − 0.5 × DB(°C) − 40/9.
 *
 * Valid only inside the charts' input range — wet bulb 10–24 °C, outdoor 13–46 °C
 * [S17][S18], and outdoor ≥ 12.8 °C for the Title 24 procedure [S19]; outside it the result
 * says so instead of extrapolating. A target below 2.8 K (5 °F) means no valid superheat test
 * (a "dash" in the chart): weigh in the charge instead [S10][S17][S18].
 *
 * Units: °C in, K out.
 *
 * @throws never; non-finite inputs come back as "outside-range"
 * @example fixedOrificeTargetSuperheat(19, 32) // { status: "ok", targetK: 8.0555… }
 */
export function fixedOrificeTargetSuperheat(returnAirWetBulbC: number, outdoorAirDryBulbC: number): FixedOrificeTarget {
  const wetBulb = FIXED_ORIFICE_WET_BULB_RANGE_C;
  const outdoor = FIXED_ORIFICE_OUTDOOR_RANGE_C;
  if (!(returnAirWetBulbC >= wetBulb.min && returnAirWetBulbC <= wetBulb.max)) {
    return {
      status: "outside-range",
      reason: `Return air wet bulb ${returnAirWetBulbC.toFixed(1)} °C is outside the charging-chart range ${wetBulb.min}–${wetBulb.max} °C: no superheat target; weigh in the charge or use the unit's own chart`,
    };
  }
  if (!(outdoorAirDryBulbC >= outdoor.min && outdoorAirDryBulbC <= outdoor.max)) {
    return {
      status: "outside-range",
      reason: `Outdoor air ${outdoorAirDryBulbC.toFixed(1)} °C is outside the charging-chart range ${outdoor.min}–${outdoor.max} °C: no superheat target; weigh in the charge or use the unit's own chart`,
    };
  }
  const targetK = WET_BULB_COEFFICIENT * returnAirWetBulbC - DRY_BULB_COEFFICIENT * outdoorAirDryBulbC - OFFSET_K;
  if (targetK < MIN_VALID_TARGET_SUPERHEAT_K) {
    return {
      status: "weigh-in",
      targetK,
      reason: `Target superheat ${targetK.toFixed(1)} K is below ${MIN_VALID_TARGET_SUPERHEAT_K} K: conditions too hot and dry for a superheat test; weigh in the charge, or raise the indoor load and retest`,
    };
  }
  return { status: "ok", targetK };
}
