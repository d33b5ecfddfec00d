import { STANDARD_ATMOSPHERE_KPA } from "../properties/property-tolerances.ts";

/**
 * Absolute pressure to gauge pressure: p_gauge = p_abs − p_atmosphere.
 *
 * @param kPaAbs absolute pressure in kPa
 * @param atmosphericKPa local atmospheric pressure in kPa, default 101.325 (standard atmosphere)
 * @returns gauge pressure in kPa (negative means below atmosphere: a vacuum)
 * @throws Error "absoluteToGauge requires finite numbers and a positive atmospheric pressure"
 * @example absoluteToGauge(813.1) // 711.775
 */
export function absoluteToGauge(kPaAbs: number, atmosphericKPa: number = STANDARD_ATMOSPHERE_KPA): number {
  if (!Number.isFinite(kPaAbs) || !Number.isFinite(atmosphericKPa) || !(atmosphericKPa > 0)) {
    throw new Error("absoluteToGauge requires finite numbers and a positive atmospheric pressure");
  }
  return kPaAbs - atmosphericKPa;
}
