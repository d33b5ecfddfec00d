import { convertPressure } from "../units/convert-pressure.ts";

/**
 * Pascals absolute to microns of mercury (µmHg, = millitorr), the inverse of `micronsToPa`,
 * through `convertPressure` (convert-units). 133.322 Pa = 1000 microns [S60].
 *
 * @param pa absolute pressure, Pa (finite)
 * @returns absolute pressure, microns
 * @throws Error "convertPressure requires a finite number" for NaN or ±Infinity
 * @example paToMicrons(133.322) // ≈ 1000
 */
export function paToMicrons(pa: number): number {
  return convertPressure(pa, "Pa", "micron");
}
