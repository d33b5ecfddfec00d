import { convertPressure } from "../units/convert-pressure.ts";

/**
 * Vacuum reading in microns of mercury (µmHg, = millitorr) to pascals absolute, through
 * `convertPressure` (convert-units; no hand-written factor). 1 micron = 1 mTorr = 0.133322 Pa
 * [S60]; 500 microns ≈ 66.7 Pa.
 *
 * @param microns absolute pressure, microns (finite)
 * @returns absolute pressure, Pa
 * @throws Error "convertPressure requires a finite number" for NaN or ±Infinity
 * @example micronsToPa(500) // ≈ 66.661
 */
export function micronsToPa(microns: number): number {
  return convertPressure(microns, "micron", "Pa");
}
