import {
  convertTemperature,
  convertTemperatureDifference,
  pressureFromDisplay,
  pressureToDisplay,
  type PressureUnit,
} from "@shared/engine/index.ts";

/**
 * What the user sees; storage and the engine stay SI-metric (°C, kPa, K) whatever is chosen.
 */
export type TemperatureDisplayUnit = "C" | "F";
export type PressureDisplayUnit = Extract<PressureUnit, "kPa" | "psi" | "bar" | "MPa">;

export interface DisplayUnits {
  temperature: TemperatureDisplayUnit;
  pressure: PressureDisplayUnit;
}

export const METRIC_UNITS: DisplayUnits = { temperature: "C", pressure: "kPa" };

export const TEMPERATURE_LABEL: Record<TemperatureDisplayUnit, string> = { C: "°C", F: "°F" };
export const DIFFERENCE_LABEL: Record<TemperatureDisplayUnit, string> = { C: "K", F: "°F" };
/** Gauge pressures are marked as such; "psig" is the trade's own spelling. */
export const GAUGE_LABEL: Record<PressureDisplayUnit, string> = {
  kPa: "kPa g",
  psi: "psig",
  bar: "bar g",
  MPa: "MPa g",
};
export const ABSOLUTE_LABEL: Record<PressureDisplayUnit, string> = {
  kPa: "kPa abs",
  psi: "psia",
  bar: "bar abs",
  MPa: "MPa abs",
};

/** Decimals that match what a gauge of that unit can be read to. */
export const PRESSURE_DECIMALS: Record<PressureDisplayUnit, number> = { kPa: 0, psi: 1, bar: 2, MPa: 3 };
export const TEMPERATURE_DECIMALS = 1;

export function temperatureToDisplay(celsius: number, unit: TemperatureDisplayUnit): number {
  return unit === "C" ? celsius : convertTemperature(celsius, "C", "F");
}

export function temperatureFromDisplay(value: number, unit: TemperatureDisplayUnit): number {
  return unit === "C" ? value : convertTemperature(value, "F", "C");
}

export function differenceToDisplay(kelvin: number, unit: TemperatureDisplayUnit): number {
  return unit === "C" ? kelvin : convertTemperatureDifference(kelvin, "K", "F");
}

/** kPa gauge (storage) → display unit, gauge. */
export function gaugeToDisplay(kPaGauge: number, unit: PressureDisplayUnit, atmosphericKPa: number): number {
  return pressureToDisplay(kPaGauge + atmosphericKPa, unit, "gauge", atmosphericKPa);
}

/** Display unit, gauge → kPa gauge (storage). */
export function gaugeFromDisplay(value: number, unit: PressureDisplayUnit, atmosphericKPa: number): number {
  return pressureFromDisplay(value, unit, "gauge", atmosphericKPa) - atmosphericKPa;
}

export function formatNumber(value: number, decimals: number): string {
  // Avoid "-0.0" for values that round to zero.
  const rounded = Number(value.toFixed(decimals));
  return (Object.is(rounded, -0) ? 0 : rounded).toFixed(decimals);
}
