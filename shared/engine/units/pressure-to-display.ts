import { STANDARD_ATMOSPHERE_KPA } from "../properties/property-tolerances.ts";
import { convertPressure, type PressureUnit } from "./convert-pressure.ts";

export type PressureScale = "absolute" | "gauge" | "vacuum";

/**
 * Absolute pressure (kPa, the engine's unit) to a display value on a chosen scale:
 * "absolute", "gauge" (relative to atmosphere) or "vacuum" (how far below
 * atmosphere, positive, as vacuum gauges in inHg read). Unit factors via convertPressure.
 *
 * @param kPaAbs absolute pressure in kPa
 * @param unit display unit (e.g. "psi", "bar", "inHg", "micron")
 * @param scale "absolute" | "gauge" | "vacuum"
 * @param atmosphericKPa local atmosphere in kPa, default 101.325
 * @returns the number to show
 * @throws Error for non-finite inputs
 * @example pressureToDisplay(813.1, "psi", "gauge") // ≈ 103.23 (psig)
 */
export function pressureToDisplay(
  kPaAbs: number,
  unit: PressureUnit,
  scale: PressureScale,
  atmosphericKPa: number = STANDARD_ATMOSPHERE_KPA,
): number {
  if (!Number.isFinite(kPaAbs) || !Number.isFinite(atmosphericKPa)) {
    throw new Error("pressureToDisplay requires finite numbers");
  }
  const onScale = scale === "absolute" ? kPaAbs : scale === "gauge" ? kPaAbs - atmosphericKPa : atmosphericKPa - kPaAbs;
  return convertPressure(onScale, "kPa", unit);
}
