import psychrolib from "psychrolib";

/** Moist air at one dry bulb and humidity, per kilogram of dry air. */
export interface MoistAirState {
  /** kg water per kg dry air */
  humidityRatio: number;
  /** kJ per kg dry air (ASHRAE reference: dry air and liquid water at 0 °C) */
  enthalpyKJPerKgDryAir: number;
  /** m³ per kg dry air */
  specificVolumeM3PerKgDryAir: number;
}

/** Dry bulbs this helper accepts, °C (the app's air-reading range). */
const MIN_DRY_BULB_C = -50;
const MAX_DRY_BULB_C = 70;

/**
 * Humidity ratio, enthalpy and specific volume of moist air from dry bulb and either wet bulb
 * or relative humidity (ASHRAE Handbook—Fundamentals 2017 ch. 1, as implemented by psychrolib
 * 1.1.1, https://github.com/psychrometrics/psychrolib). The enthalpy difference across a coil
 * times the dry-air mass flow is its total (sensible + latent) capacity.
 *
 * psychrolib keeps its unit system as module-wide state, so every call sets SI first.
 *
 * Units: °C, percent (0–100], kPa absolute → kg/kg, kJ/kg dry air, m³/kg dry air.
 * Valid range: dry bulb −50…70 °C; wet bulb at most the dry bulb.
 *
 * @throws {RangeError} "moistAirState requires ..." for inputs outside the range
 * @example moistAirState(26.7, { wetBulbC: 19.4 }, 101.325).enthalpyKJPerKgDryAir // ≈ 55.16 (W ≈ 0.01109)
 */
export function moistAirState(
  dryBulbC: number,
  humidity: { wetBulbC: number } | { relativeHumidityPercent: number },
  atmosphericKPa: number,
): MoistAirState {
  if (!Number.isFinite(dryBulbC) || dryBulbC < MIN_DRY_BULB_C || dryBulbC > MAX_DRY_BULB_C) {
    throw new RangeError(`moistAirState requires a dry bulb between ${MIN_DRY_BULB_C} and ${MAX_DRY_BULB_C} °C`);
  }
  if (!Number.isFinite(atmosphericKPa) || !(atmosphericKPa > 0))
    throw new RangeError("moistAirState requires a positive atmospheric pressure in kPa");
  psychrolib.SetUnitSystem(psychrolib.SI);
  const pressurePa = atmosphericKPa * 1000;
  let humidityRatio: number;
  if ("wetBulbC" in humidity) {
    const { wetBulbC } = humidity;
    if (!Number.isFinite(wetBulbC) || wetBulbC > dryBulbC + 1e-9)
      throw new RangeError("moistAirState requires a wet bulb at or below the dry bulb");
    humidityRatio = psychrolib.GetHumRatioFromTWetBulb(dryBulbC, wetBulbC, pressurePa) as number;
  } else {
    const { relativeHumidityPercent } = humidity;
    if (!Number.isFinite(relativeHumidityPercent) || relativeHumidityPercent <= 0 || relativeHumidityPercent > 100) {
      throw new RangeError("moistAirState requires a relative humidity above 0 and at most 100 %");
    }
    humidityRatio = psychrolib.GetHumRatioFromRelHum(dryBulbC, relativeHumidityPercent / 100, pressurePa) as number;
  }
  return {
    humidityRatio,
    enthalpyKJPerKgDryAir: (psychrolib.GetMoistAirEnthalpy(dryBulbC, humidityRatio) as number) / 1000,
    specificVolumeM3PerKgDryAir: psychrolib.GetMoistAirVolume(dryBulbC, humidityRatio, pressurePa) as number,
  };
}
