import { STANDARD_ATMOSPHERE_KPA } from "../properties/property-tolerances.ts";

/** ISO 2533 standard atmosphere, troposphere (below 11 km): sea-level temperature, K. */
const SEA_LEVEL_TEMPERATURE_K = 288.15;
/** ISO 2533 temperature lapse rate in the troposphere, K/m. */
const LAPSE_RATE_K_PER_M = 0.0065;
/**
 * Exponent g₀·M / (R*·L) of the barometric formula with ISO 2533 constants:
 * g₀ = 9.80665 m/s², M = 0.0289644 kg/mol, R* = 8.31432 J/(mol·K), L = 0.0065 K/m.
 */
const BAROMETRIC_EXPONENT = (9.80665 * 0.0289644) / (8.31432 * LAPSE_RATE_K_PER_M);
/** Lowest and highest altitude accepted, m: the Dead Sea shore to the top of the troposphere. */
const MIN_ALTITUDE_M = -500;
const MAX_ALTITUDE_M = 11_000;

/**
 * Atmospheric pressure at an altitude in the ISO 2533 standard atmosphere (troposphere):
 * p = p₀ · (1 − L·h / T₀)^(g₀·M / (R*·L)), with p₀ = 101.325 kPa, T₀ = 288.15 K,
 * L = 0.0065 K/m. Gauges read against the local atmosphere, so a site's altitude changes every
 * absolute pressure (and saturation temperature) worked out from a gauge reading; the weather
 * moves the real value by about ±2 kPa around this one.
 *
 * Units: metres above sea level in, kPa absolute out. Valid −500 m to 11 000 m.
 * Source: ISO 2533:1975 Standard Atmosphere (its tables give 89.875 kPa at 1 000 m and
 * 79.495 kPa at 2 000 m geopotential altitude; table values quoted from memory). For a site
 * the difference between geopotential and geometric altitude (0.03 % at 2 km) is far below the
 * weather's.
 *
 * @throws {RangeError} when the altitude is not finite or outside −500…11 000 m
 * @example atmosphericPressureAtAltitude(1000) // 89.8746…
 */
export function atmosphericPressureAtAltitude(altitudeM: number): number {
  if (!(altitudeM >= MIN_ALTITUDE_M && altitudeM <= MAX_ALTITUDE_M)) {
    throw new RangeError(
      `atmosphericPressureAtAltitude requires an altitude from ${MIN_ALTITUDE_M} to ${MAX_ALTITUDE_M} m`,
    );
  }
  return (
    STANDARD_ATMOSPHERE_KPA *
    Math.pow(1 - (LAPSE_RATE_K_PER_M * altitudeM) / SEA_LEVEL_TEMPERATURE_K, BAROMETRIC_EXPONENT)
  );
}
