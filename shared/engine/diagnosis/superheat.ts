import { STANDARD_ATMOSPHERE_KPA } from "../../schemas/diagnosis.ts";
import { saturationTemperature } from "../properties/saturation-temperature.ts";
import { gaugeToAbsolute } from "../units/gauge-to-absolute.ts";

/**
 * Superheat: suction line temperature minus the **dew point** at the suction pressure
 * (TRADE.md §1.1 [S1][S2][S3]); for a zeotropic blend the dew point is the saturation
 * temperature of the last drop of liquid, so a mid-point would be wrong by about half the glide.
 *
 * Units: kPa gauge, °C in; K out. Valid range: the refrigerant's table.
 *
 * @throws {PropertyRangeError} for an unknown refrigerant or a pressure outside its table
 * @example superheat("R407C", 360, 8) // ≈ 7.96 K (dew point ≈ 0.04 °C at 461.3 kPa abs)
 */
export function superheat(
  refrigerant: string,
  suctionPressureKPaGauge: number,
  suctionLineTempC: number,
  atmosphericPressureKPa: number = STANDARD_ATMOSPHERE_KPA,
): number {
  const dewPointC = saturationTemperature(
    refrigerant,
    gaugeToAbsolute(suctionPressureKPaGauge, atmosphericPressureKPa),
    "dew",
  );
  return suctionLineTempC - dewPointC;
}
