import { STANDARD_ATMOSPHERE_KPA } from "../properties/property-tolerances.ts";
import { convertPressure, type PressureUnit } from "./convert-pressure.ts";
import type { PressureScale } from "./pressure-to-display.ts";

/**
 * A display value (unit + scale) back to absolute kPa, the engine's unit; the
 * inverse of pressureToDisplay.
 *
 * @param value number as entered
 * @param unit unit of the entry (e.g. "psi")
 * @param scale "absolute" | "gauge" | "vacuum" (vacuum: positive below atmosphere)
 * @param atmosphericKPa local atmosphere in kPa, default 101.325
 * @returns absolute pressure in kPa
 * @throws Error for non-finite inputs
 * @example pressureFromDisplay(118, "psi", "gauge") // ≈ 914.9 (kPa abs)
 */
export function pressureFromDisplay(
  value: number,
  unit: PressureUnit,
  scale: PressureScale,
  atmosphericKPa: number = STANDARD_ATMOSPHERE_KPA,
): number {
  if (!Number.isFinite(value) || !Number.isFinite(atmosphericKPa)) {
    throw new Error("pressureFromDisplay requires finite numbers");
  }
  const kPa = convertPressure(value, unit, "kPa");
  return scale === "absolute" ? kPa : scale === "gauge" ? kPa + atmosphericKPa : atmosphericKPa - kPa;
}
