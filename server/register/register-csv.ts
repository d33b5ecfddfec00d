/**
 * The register as CSV for the regulator's record keeping (TRADE.md §8: AU trading
 * authorisation records of refrigerant recovered and otherwise disposed of; EU F-gas and US
 * §82.157 records name the equipment, refrigerant, amounts, technician and date).
 *
 * Quoting follows RFC 4180 §2: a field holding a comma, a double quote, CR or LF is wrapped
 * in double quotes and its quotes doubled; lines end with CRLF. Text that a spreadsheet would
 * run as a formula (leading =, +, -, @, tab or CR) gets a leading apostrophe, as the OWASP
 * "CSV Injection" guidance advises, because exports are opened in spreadsheets.
 */
import { MOVEMENT_KIND_LABELS } from "@shared/schemas/register.ts";
import type { MovementRow } from "../db/register.ts";

export const REGISTER_CSV_COLUMNS = [
  "date (UTC)",
  "technician",
  "licence number",
  "equipment",
  "location",
  "refrigerant",
  "kind",
  "kg",
  "cylinder",
  "circuit",
  "note",
] as const;

/** Neutralises spreadsheet formulas in free text (OWASP CSV Injection). */
function defuse(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

/** One CSV field, quoted when RFC 4180 requires it. */
export function csvField(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return "";
  const text = typeof value === "number" ? String(value) : defuse(value);
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

export function csvLine(fields: (string | number | null | undefined)[]): string {
  return `${fields.map(csvField).join(",")}\r\n`;
}

/**
 * One movement as a CSV line.
 * @param licenceNumbers licence or certificate number per user id, from each member's profile;
 * blank for anyone who has not entered one.
 */
export function registerCsvLine(movement: MovementRow, licenceNumbers: ReadonlyMap<string, string>): string {
  const location = [movement.siteName, movement.location].filter(Boolean).join(" — ");
  return csvLine([
    movement.at,
    movement.technician?.name ?? "",
    movement.technician ? (licenceNumbers.get(movement.technician.id) ?? "") : "",
    movement.equipmentName ?? "",
    location,
    movement.refrigerant,
    MOVEMENT_KIND_LABELS[movement.kind],
    // Grams are the scale's resolution (TRADE.md §6 weigh-in: about ±28 g).
    Number(movement.kg.toFixed(3)),
    movement.cylinder?.label ?? "",
    movement.circuit,
    movement.note ?? "",
  ]);
}

/** The header line: the columns' names. */
export const registerCsvHeader = (): string => csvLine([...REGISTER_CSV_COLUMNS]);

/** The whole export at once: the header and a line per movement (the route streams the same lines in chunks). */
export function registerCsv(
  movements: readonly MovementRow[],
  licenceNumbers: ReadonlyMap<string, string> = new Map(),
): string {
  return registerCsvHeader() + movements.map((movement) => registerCsvLine(movement, licenceNumbers)).join("");
}
