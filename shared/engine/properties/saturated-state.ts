import { findTemperatureRow } from "./find-temperature-row.ts";
import { requireTableTemperature } from "./require-table-temperature.ts";
import { resolveRefrigerant } from "./resolve-refrigerant.ts";
import { saturationPressure } from "./saturation-pressure.ts";

export interface SaturatedState {
  temperatureC: number;
  bubblePressureKPa: number;
  dewPressureKPa: number;
  liquidDensityKgPerM3: number;
  vapourDensityKgPerM3: number;
  liquidEnthalpyKJPerKg: number;
  vapourEnthalpyKJPerKg: number;
}

/**
 * Saturated liquid and vapour at one temperature: pressures, densities and
 * enthalpies (IIR reference: h = 200 kJ/kg for saturated liquid at 0 °C), for
 * later P–h work. Pressures by cubic Hermite interpolation (as saturationPressure),
 * densities and enthalpies linear in T between rows 0.5 K apart.
 * For blends the liquid is at its bubble pressure and the vapour at its dew
 * pressure at the same temperature.
 *
 * @param id ASHRAE designation
 * @param temperatureC °C inside the table's validRange
 * @returns bubble/dew pressure (kPa absolute), liquid/vapour density (kg/m³), liquid/vapour enthalpy (kJ/kg)
 * @throws PropertyRangeError for an unknown id or a non-finite or out-of-range temperature
 * @example saturatedState("R134a", 0).liquidDensity // ≈ 1294.78 (kg/m³)
 */
export function saturatedState(id: string, temperatureC: number): SaturatedState {
  const refrigerant = resolveRefrigerant(id);
  requireTableTemperature(refrigerant, temperatureC);
  const t = refrigerant.temperatureC;
  const i = findTemperatureRow(refrigerant, temperatureC);
  // findTemperatureRow returns i ≤ rowCount − 2, so i and i + 1 are rows of every column.
  const fraction = (temperatureC - t[i]!) / (t[i + 1]! - t[i]!);
  const linear = (column: Float64Array) => column[i]! + fraction * (column[i + 1]! - column[i]!);
  return {
    temperatureC,
    bubblePressureKPa: saturationPressure(id, temperatureC, "bubble"),
    dewPressureKPa: saturationPressure(id, temperatureC, "dew"),
    liquidDensityKgPerM3: linear(refrigerant.liquidDensity),
    vapourDensityKgPerM3: linear(refrigerant.vapourDensity),
    liquidEnthalpyKJPerKg: linear(refrigerant.liquidEnthalpy),
    vapourEnthalpyKJPerKg: linear(refrigerant.vapourEnthalpy),
  };
}
