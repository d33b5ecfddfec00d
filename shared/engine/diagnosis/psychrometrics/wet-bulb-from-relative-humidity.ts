import psychrolib from "psychrolib";

/** Lowest and highest dry bulb this helper accepts, °C (psychrolib's SI validity is wider). */
const MIN_DRY_BULB_C = -50;
const MAX_DRY_BULB_C = 70;

/**
 * Wet-bulb temperature from dry bulb and relative humidity (thermodynamic wet bulb, ASHRAE
 * Handbook Fundamentals 2017 ch. 1 equations as implemented by psychrolib 1.1.1,
 * https://github.com/psychrometrics/psychrolib). Used for the fixed-orifice target superheat
 * when the technician measured relative humidity instead of wet bulb.
 *
 * psychrolib keeps its unit system as module-wide state, so every call sets SI first; another
 * caller may have switched it to IP.
 *
 * Units: dry bulb °C, relative humidity percent (0–100], atmospheric pressure kPa absolute;
 * returns °C. Valid range: dry bulb -50–70 °C.
 *
 * @throws {RangeError} when an input is outside its range or not finite
 * @example wetBulbFromRelativeHumidity(26.7, 50, 101.325) // ≈ 19.29 (80 °F DB / 50 % → ≈ 66.7 °F WB)
 */
export function wetBulbFromRelativeHumidity(
  dryBulbC: number,
  relativeHumidityPercent: number,
  atmosphericPressureKPa: number,
): number {
  if (!Number.isFinite(dryBulbC) || dryBulbC < MIN_DRY_BULB_C || dryBulbC > MAX_DRY_BULB_C) {
    throw new RangeError(
      `wetBulbFromRelativeHumidity requires a dry bulb between ${MIN_DRY_BULB_C} and ${MAX_DRY_BULB_C} °C`,
    );
  }
  if (!Number.isFinite(relativeHumidityPercent) || relativeHumidityPercent <= 0 || relativeHumidityPercent > 100) {
    throw new RangeError("wetBulbFromRelativeHumidity requires a relative humidity above 0 and at most 100 %");
  }
  if (!Number.isFinite(atmosphericPressureKPa) || atmosphericPressureKPa <= 0) {
    throw new RangeError("wetBulbFromRelativeHumidity requires a positive atmospheric pressure in kPa");
  }
  psychrolib.SetUnitSystem(psychrolib.SI);
  return psychrolib.GetTWetBulbFromRelHum(
    dryBulbC,
    relativeHumidityPercent / 100,
    atmosphericPressureKPa * 1000,
  ) as number;
}
