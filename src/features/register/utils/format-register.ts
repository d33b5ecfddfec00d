import { formatNumber } from "@/lib/units/display-units.ts";

/** Masses to the gram a refrigerant scale resolves (TRADE.md §6: about ±28 g), as "4.20 kg". */
export const formatKg = (kg: number) => `${formatNumber(kg, 2)} kg`;

/** A signed mass difference: "+0.30 kg" / "−0.30 kg". */
export const formatSignedKg = (kg: number) => `${kg >= 0 ? "+" : "−"}${formatNumber(Math.abs(kg), 2)} kg`;

/**
 * A local calendar date (YYYY-MM-DD from a date input) as the instant its day starts, with the
 * viewer's offset, so a quarter's register ends at local midnight rather than UTC's.
 */
export function localDayStart(date: string): string {
  const [year, month, day] = date.split("-").map(Number);
  return new Date(year!, month! - 1, day!).toISOString();
}

/** The instant the day after `date` starts, locally: the exclusive end of a period ending on `date`. */
export function localDayEnd(date: string): string {
  const [year, month, day] = date.split("-").map(Number);
  return new Date(year!, month! - 1, day! + 1).toISOString();
}
