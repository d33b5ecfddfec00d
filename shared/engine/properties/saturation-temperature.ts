/**
 * Saturation temperature of a refrigerant at a pressure, from its generated table.
 *
 * The inverse of saturationPressure: cubic Hermite interpolation of 1/T against
 * ln p with slopes d(1/T)/d ln p from the table; within 0.005 K of the equation of
 * state everywhere (tested). For blends use "dew" for superheat (suction pressure)
 * and "bubble" for subcooling (liquid-line pressure) — common practice, TRADE.md §1.1.
 *
 * @param id ASHRAE designation, e.g. "R404A"
 * @param pressureKPaAbs pressure in kPa absolute (use gaugeToAbsolute for gauge readings),
 *   between the table's saturation pressures at its lowest and highest temperature
 * @param point "bubble" or "dew" (default "dew")
 * @returns saturation temperature in °C
 * @throws PropertyRangeError for an unknown id, a non-finite or out-of-range pressure, or an invalid point
 * @example saturationTemperature("R32", 813.1013) // ≈ 0.000 (°C)
 */
import { findInterval } from "./find-interval.ts";
import { interpolateHermite } from "./interpolate-hermite.ts";
import { PropertyRangeError } from "./property-range-error.ts";
import { KELVIN_OFFSET } from "./property-tolerances.ts";
import { requireSaturationPoint, type SaturationPoint } from "./require-saturation-point.ts";
import { resolveRefrigerant } from "./resolve-refrigerant.ts";

const formatKPa = (value: number) => (value >= 100 ? value.toFixed(1) : value.toPrecision(4));

export function saturationTemperature(id: string, pressureKPaAbs: number, point: SaturationPoint = "dew"): number {
  const refrigerant = resolveRefrigerant(id);
  requireSaturationPoint(id, point);
  if (typeof pressureKPaAbs !== "number" || !Number.isFinite(pressureKPaAbs)) {
    throw new PropertyRangeError("NOT_FINITE", id, `${id}: the pressure must be a number in kPa absolute (got ${String(pressureKPaAbs)})`);
  }
  const curve = point === "bubble" ? refrigerant.bubble : refrigerant.dew;
  const last = refrigerant.rowCount - 1;
  const lnPressure = pressureKPaAbs > 0 ? Math.log(pressureKPaAbs) : -Infinity;
  if (!(lnPressure >= curve.lnPressure[0]!)) {
    const lowest = Math.exp(curve.lnPressure[0]!);
    throw new PropertyRangeError(
      "BELOW_RANGE",
      id,
      `${id} below ${formatKPa(lowest)} kPa absolute is outside the table (its lowest temperature, ${refrigerant.minimumC} °C; check that the reading is absolute, not gauge)`,
    );
  }
  if (lnPressure > curve.lnPressure[last]!) {
    const highest = Math.exp(curve.lnPressure[last]!);
    throw new PropertyRangeError(
      "ABOVE_RANGE",
      id,
      `${id} above ${formatKPa(highest)} kPa absolute is outside the table (its highest temperature, ${refrigerant.maximumC} °C, near the critical point)`,
    );
  }
  const i = findInterval(curve.lnPressure, lnPressure);
  const x = refrigerant.inverseTemperature;
  const inverseTemperature = interpolateHermite(
    curve.lnPressure[i]!, x[i]!, 1 / curve.slope[i]!,
    curve.lnPressure[i + 1]!, x[i + 1]!, 1 / curve.slope[i + 1]!,
    lnPressure,
  );
  const temperatureC = 1 / inverseTemperature - KELVIN_OFFSET;
  // Rounding can put a query at the very end of the table a hair outside it.
  return Math.min(Math.max(temperatureC, refrigerant.minimumC), refrigerant.maximumC);
}
