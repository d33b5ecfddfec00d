import { STANDARD_ATMOSPHERE_KPA } from "../../schemas/diagnosis.ts";
import { saturationTemperature } from "../properties/saturation-temperature.ts";
import { gaugeToAbsolute } from "../units/gauge-to-absolute.ts";

/**
 * Subcooling: the **bubble point** at the liquid pressure minus the liquid line temperature
 * (TRADE.md §1.1 [S1][S2][S3]); the bubble point is where a blend is fully condensed.
 * Only valid for a temperature taken on the liquid line (never the discharge line).
 *
 * Units: kPa gauge, °C in; K out. Valid range: the refrigerant's table.
 *
 * @throws {PropertyRangeError} for an unknown refrigerant or a pressure outside its table
 * @example subcooling("R407C", 1770, 38) // ≈ 4.80 K
 */
export function subcooling(
  refrigerant: string,
  liquidPressureKPaGauge: number,
  liquidLineTempC: number,
  atmosphericPressureKPa: number = STANDARD_ATMOSPHERE_KPA,
): number {
  const bubblePointC = saturationTemperature(
    refrigerant,
    gaugeToAbsolute(liquidPressureKPaGauge, atmosphericPressureKPa),
    "bubble",
  );
  return bubblePointC - liquidLineTempC;
}
