import { findInterval } from "./find-interval.ts";
import { interpolateHermite } from "./interpolate-hermite.ts";
import { PropertyRangeError } from "./property-range-error.ts";
import { requireSaturationPoint, type SaturationPoint } from "./require-saturation-point.ts";
import { resolveRefrigerant } from "./resolve-refrigerant.ts";

const formatKPa = (value: number) => (value >= 100 ? value.toFixed(1) : value.toPrecision(4));

/**
 * Saturation temperature of a refrigerant at a pressure, from its generated table.
 *
 * The inverse of saturationPressure: cubic Hermite interpolation of T against p
 * with slopes dT/dp = 1/(dp/dT) from the table, the interval found by binary search;
 * within 0.005 K of the equation of state everywhere (tested). For blends use "dew" for superheat (suction pressure)
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
export function saturationTemperature(id: string, pressureKPaAbs: number, point: SaturationPoint = "dew"): number {
  const refrigerant = resolveRefrigerant(id);
  requireSaturationPoint(id, point);
  if (typeof pressureKPaAbs !== "number" || !Number.isFinite(pressureKPaAbs)) {
    throw new PropertyRangeError(
      "NOT_FINITE",
      id,
      `${id}: the pressure must be a number in kPa absolute (got ${String(pressureKPaAbs)})`,
    );
  }
  const curve = point === "bubble" ? refrigerant.bubble : refrigerant.dew;
  const last = refrigerant.rowCount - 1;
  const pressures = curve.pressure;
  // Hot path, no checks: a compiled table has two rows or more (schema), so 0 and `last` are rows,
  // and findInterval below returns i ≤ last − 1.
  if (!(pressureKPaAbs >= pressures[0]!)) {
    const lowest = pressures[0]!;
    throw new PropertyRangeError(
      "BELOW_RANGE",
      id,
      `${id} below ${formatKPa(lowest)} kPa absolute is outside the table (its lowest temperature, ${refrigerant.minimumC} °C; check that the reading is absolute, not gauge)`,
    );
  }
  if (pressureKPaAbs > pressures[last]!) {
    const highest = pressures[last]!;
    throw new PropertyRangeError(
      "ABOVE_RANGE",
      id,
      `${id} above ${formatKPa(highest)} kPa absolute is outside the table (its highest temperature, ${refrigerant.maximumC} °C, near the critical point)`,
    );
  }
  const i = findInterval(pressures, pressureKPaAbs);
  const t = refrigerant.temperatureC;
  const temperatureC = interpolateHermite(
    pressures[i]!,
    t[i]!,
    curve.inverseSlope[i]!,
    pressures[i + 1]!,
    t[i + 1]!,
    curve.inverseSlope[i + 1]!,
    pressureKPaAbs,
  );
  // Rounding can put a query at the very end of the table a hair outside it.
  return Math.min(Math.max(temperatureC, refrigerant.minimumC), refrigerant.maximumC);
}
