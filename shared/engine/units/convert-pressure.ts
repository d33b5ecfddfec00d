import { convertMeasure } from "./convert-measure.ts";

export const PRESSURE_UNITS = ["Pa", "kPa", "MPa", "bar", "psi", "torr", "inHg", "micron"] as const;
export type PressureUnit = (typeof PRESSURE_UNITS)[number];

type LibraryUnit = "Pa" | "kPa" | "MPa" | "bar" | "psi" | "torr";

function toLibrary(value: number, unit: PressureUnit): { value: number; unit: LibraryUnit } {
  if (unit === "inHg") return { value: convertMeasure(value, "in", "mm"), unit: "torr" };
  if (unit === "micron") return { value: value / 1000, unit: "torr" };
  return { value, unit };
}

function fromTorr(valueTorr: number, unit: "inHg" | "micron"): number {
  return unit === "inHg" ? convertMeasure(valueTorr, "mm", "in") : valueTorr * 1000;
}

/**
 * Pressure conversion for display, through the convert-units package (`convertMeasure`; no
 * hand-written factors): Pa, kPa, MPa, bar, psi and torr come straight from it;
 * inHg is torr → mmHg (1 torr = 1 mmHg to 1.4e-7, below display precision) and
 * mm → in via convert-units' length table; "micron" is the vacuum-gauge micron of
 * mercury (1 µmHg = 1 mTorr to the same precision).
 * All units here are on one scale (absolute or gauge — the caller keeps track;
 * see pressureToDisplay for gauge and vacuum scales).
 *
 * @param value pressure in `from` units, finite
 * @param from source unit
 * @param to target unit
 * @returns pressure in `to` units
 * @throws Error "convertPressure requires a finite number" for NaN/±Infinity
 * @example convertPressure(101.325, "kPa", "psi") // ≈ 14.696
 */
export function convertPressure(value: number, from: PressureUnit, to: PressureUnit): number {
  if (!Number.isFinite(value)) throw new Error("convertPressure requires a finite number");
  if (from === to) return value;
  const source = toLibrary(value, from);
  if (to === "inHg" || to === "micron") {
    const torr = source.unit === "torr" ? source.value : convertMeasure(source.value, source.unit, "torr");
    return fromTorr(torr, to);
  }
  return source.unit === to ? source.value : convertMeasure(source.value, source.unit, to);
}
