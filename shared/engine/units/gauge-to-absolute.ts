import { STANDARD_ATMOSPHERE_KPA } from "../properties/property-tolerances.ts";

/**
 * Gauge pressure to absolute pressure: p_abs = p_gauge + p_atmosphere.
 * Gauges read relative to the local atmosphere; saturation lookups need absolute.
 *
 * @param kPaGauge gauge pressure in kPa (negative below atmosphere)
 * @param atmosphericKPa local atmospheric pressure in kPa, default 101.325 (standard atmosphere, sea level)
 * @returns absolute pressure in kPa
 * @throws Error "gaugeToAbsolute requires finite numbers and a positive atmospheric pressure"
 * @example gaugeToAbsolute(1000) // 1101.325
 */
export function gaugeToAbsolute(kPaGauge: number, atmosphericKPa: number = STANDARD_ATMOSPHERE_KPA): number {
  if (!Number.isFinite(kPaGauge) || !Number.isFinite(atmosphericKPa) || !(atmosphericKPa > 0)) {
    throw new Error("gaugeToAbsolute requires finite numbers and a positive atmospheric pressure");
  }
  return kPaGauge + atmosphericKPa;
}
