import { findTemperatureRow } from "./find-temperature-row.ts";
import { interpolateHermite } from "./interpolate-hermite.ts";
import { requireSaturationPoint, type SaturationPoint } from "./require-saturation-point.ts";
import { requireTableTemperature } from "./require-table-temperature.ts";
import { resolveRefrigerant } from "./resolve-refrigerant.ts";

/**
 * Saturation pressure of a refrigerant at a temperature, from its generated table.
 *
 * Cubic Hermite interpolation of p against T between rows 0.5 K apart, with the
 * exact slopes dp/dT stored in the table (Clausius–Clapeyron from the EOS for pure
 * fluids, the derivative of the published pL/pV equations for blends); tests prove
 * the result stays within 0.005 K of the equation of state everywhere. For blends,
 * "bubble" is the liquid side (use for subcooling) and "dew" the vapour side (use
 * for superheat); for pure fluids both give the same value.
 * Source: tables computed from the published EOS (data/refrigerants/<id>.json `source`).
 *
 * @param id ASHRAE designation, e.g. "R410A", "R1234ze(E)"
 * @param temperatureC saturation temperature in °C, inside the table's validRange
 *   (from max(triple point, −60 °C) to just below the critical point)
 * @param point "bubble" or "dew" (default "dew")
 * @returns pressure in kPa absolute
 * @throws PropertyRangeError for an unknown id, a non-finite or out-of-range temperature, or an invalid point
 * @example saturationPressure("R32", 0) // 813.10 (kPa absolute)
 */
export function saturationPressure(id: string, temperatureC: number, point: SaturationPoint = "dew"): number {
  const refrigerant = resolveRefrigerant(id);
  requireTableTemperature(refrigerant, temperatureC);
  requireSaturationPoint(id, point);
  const curve = point === "bubble" ? refrigerant.bubble : refrigerant.dew;
  const i = findTemperatureRow(refrigerant, temperatureC);
  const t = refrigerant.temperatureC;
  // Hot path, no checks: findTemperatureRow returns i ≤ rowCount − 2, so i and i + 1 are rows.
  return interpolateHermite(
    t[i]!,
    curve.pressure[i]!,
    curve.slope[i]!,
    t[i + 1]!,
    curve.pressure[i + 1]!,
    curve.slope[i + 1]!,
    temperatureC,
  );
}
