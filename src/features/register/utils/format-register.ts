import { formatNumber } from "@/lib/units/display-units.ts";

/** Masses to the gram a refrigerant scale resolves (TRADE.md §6: about ±28 g), as "4.20 kg". */
export const formatKg = (kg: number) => `${formatNumber(kg, 2)} kg`;

/** A signed mass difference: "+0.30 kg" / "−0.30 kg". */
export const formatSignedKg = (kg: number) => `${kg >= 0 ? "+" : "−"}${formatNumber(Math.abs(kg), 2)} kg`;
