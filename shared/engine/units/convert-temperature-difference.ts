import { convertTemperature, type TemperatureUnit } from "./convert-temperature.ts";

/**
 * Conversion of a temperature difference (superheat, subcooling, glide): K ↔ °F
 * difference (1 K = 1.8 °F). Computed as the difference of two convert-units
 * temperature conversions, so no factor is written by hand.
 *
 * @param value difference in `from` units (K and °C differences are the same)
 * @param from "C", "F" or "K"
 * @param to "C", "F" or "K"
 * @returns the difference in `to` units
 * @throws Error "convertTemperatureDifference requires a finite number" for NaN/±Infinity
 * @example convertTemperatureDifference(5, "K", "F") // 9
 */
export function convertTemperatureDifference(value: number, from: TemperatureUnit, to: TemperatureUnit): number {
  if (!Number.isFinite(value)) throw new Error("convertTemperatureDifference requires a finite number");
  if (from === to) return value;
  return convertTemperature(value, from, to) - convertTemperature(0, from, to);
}
