import { convertMeasure } from "./convert-measure.ts";

export const TEMPERATURE_UNITS = ["C", "F", "K"] as const;
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];

/**
 * Temperature conversion for display through convert-units (`convertMeasure`): °C, °F and K.
 *
 * @param value temperature in `from` units, finite
 * @param from "C", "F" or "K"
 * @param to "C", "F" or "K"
 * @returns temperature in `to` units
 * @throws Error "convertTemperature requires a finite number" for NaN/±Infinity
 * @example convertTemperature(0, "C", "F") // 32
 */
export function convertTemperature(value: number, from: TemperatureUnit, to: TemperatureUnit): number {
  if (!Number.isFinite(value)) throw new Error("convertTemperature requires a finite number");
  if (from === to) return value;
  return convertMeasure(value, from, to);
}
