/**
 * Import of a logged reading series from CSV (a data logger's export or a spreadsheet).
 * Values are SI-metric as stored: kPa gauge, °C, %, A, minutes. Each row is checked with the
 * same contract as a hand-entered reading; every bad row is reported with its line number.
 */
import { parse } from "csv-parse/sync";
import { z } from "zod";
import { diagnose } from "@shared/engine/index.ts";
import { DiagnosisInputSchema, type DiagnosisInput, type DiagnosisResult } from "@shared/schemas/diagnosis.ts";
import { isStorableInstant } from "@shared/schemas/dates.ts";

/** Reading fields a column can be mapped to, besides the time column. */
export const IMPORTABLE_FIELDS = [
  "suctionPressureKPa",
  "suctionLineTempC",
  "dischargePressureKPa",
  "dischargeLineTempC",
  "liquidPressureKPa",
  "liquidLineTempC",
  "returnAirDryBulbC",
  "returnAirWetBulbC",
  "returnAirRelativeHumidity",
  "supplyAirDryBulbC",
  "outdoorAirDryBulbC",
  "compressorAmps",
  "runMinutes",
] as const;
export type ImportableField = (typeof IMPORTABLE_FIELDS)[number];
export const MAX_IMPORT_ROWS = 5000;

// The labels the client shows for these targets live in shared/schemas/readings-import.ts.
export const ColumnMappingSchema = z.record(z.string(), z.union([z.enum(IMPORTABLE_FIELDS), z.literal("takenAt"), z.literal("ignore")]));
export type ColumnMapping = z.infer<typeof ColumnMappingSchema>;

/** Header words that identify a column without the user mapping it by hand. */
const GUESSES: [RegExp, ImportableField | "takenAt"][] = [
  [/^(time|timestamp|date.?time|taken)/i, "takenAt"],
  [/suction.*(press|kpa)|^p.?suc|low.?side.*press/i, "suctionPressureKPa"],
  [/suction.*(temp|line)|^t.?suc/i, "suctionLineTempC"],
  [/discharge.*(press|kpa)|^p.?dis/i, "dischargePressureKPa"],
  [/discharge.*(temp|line)|^dlt$|^t.?dis/i, "dischargeLineTempC"],
  [/liquid.*(press|kpa)|head.*press|^p.?liq/i, "liquidPressureKPa"],
  [/liquid.*(temp|line)|^t.?liq/i, "liquidLineTempC"],
  [/return.*(wet|wb)/i, "returnAirWetBulbC"],
  [/return.*(rh|humid)/i, "returnAirRelativeHumidity"],
  [/return.*(dry|db|air)/i, "returnAirDryBulbC"],
  [/supply/i, "supplyAirDryBulbC"],
  [/outdoor|ambient|oat/i, "outdoorAirDryBulbC"],
  [/amp|current/i, "compressorAmps"],
  [/run.?(min|time)/i, "runMinutes"],
];

export function guessMapping(headers: string[]): ColumnMapping {
  const mapping: ColumnMapping = {};
  const used = new Set<string>();
  for (const header of headers) {
    const match = GUESSES.find(([pattern, field]) => pattern.test(header.trim()) && !used.has(field));
    mapping[header] = match ? match[1] : "ignore";
    if (match) used.add(match[1]);
  }
  return mapping;
}

export interface RowProblem {
  /** 1-based line in the file, counting the header as line 1. */
  line: number;
  field?: string;
  message: string;
}

export interface ParsedRow {
  line: number;
  takenAt: Date;
  input: DiagnosisInput;
  result: DiagnosisResult;
}

export interface ImportPreview {
  headers: string[];
  mapping: ColumnMapping;
  rowCount: number;
  valid: ParsedRow[];
  problems: RowProblem[];
}

interface ImportContext {
  /** Merged into every row: refrigerant, metering device, nameplate targets, RLA, atmosphere. */
  base: Partial<DiagnosisInput> & Pick<DiagnosisInput, "refrigerant" | "meteringDevice">;
  /** Local midnight of the logging day (from the client, with its offset), for times of day like 10:05. */
  dayStart: Date;
}

/** A time cell as an instant the database can store (a cell like "99999" reads as the year 99999), or null. */
function parseTime(text: string, dayStart: Date): Date | null {
  const trimmed = text.trim();
  const clock = /^(\d{1,2}):(\d{2})(?::(\d{2}))?$/.exec(trimmed);
  let ms: number;
  if (clock) {
    if (Number(clock[1]) >= 24 || Number(clock[2]) >= 60) return null;
    ms = dayStart.getTime() + (Number(clock[1]) * 3600 + Number(clock[2]) * 60 + Number(clock[3] ?? 0)) * 1000;
  } else {
    ms = Date.parse(trimmed);
  }
  return isStorableInstant(ms) ? new Date(ms) : null;
}

export function previewReadingsCsv(text: string, mappingIn: ColumnMapping | undefined, context: ImportContext): ImportPreview {
  let records: string[][];
  try {
    records = parse(text, { skip_empty_lines: true, trim: true, relax_column_count: true, bom: true });
  } catch (error) {
    return { headers: [], mapping: {}, rowCount: 0, valid: [], problems: [{ line: 1, message: `This is not a readable CSV file: ${(error as Error).message}` }] };
  }
  const [headers = [], ...rows] = records;
  const mapping = mappingIn ?? guessMapping(headers);
  const problems: RowProblem[] = [];
  const valid: ParsedRow[] = [];
  const timeColumn = headers.findIndex((header) => mapping[header] === "takenAt");
  if (headers.length === 0) problems.push({ line: 1, message: "The file is empty" });
  if (timeColumn < 0 && headers.length > 0) problems.push({ line: 1, message: "Map one column to the reading time" });
  if (rows.length > MAX_IMPORT_ROWS) problems.push({ line: MAX_IMPORT_ROWS + 2, message: `At most ${MAX_IMPORT_ROWS} rows per import` });
  if (problems.length > 0) return { headers, mapping, rowCount: rows.length, valid, problems };

  let previousTime = -Infinity;
  rows.forEach((row, index) => {
    const line = index + 2;
    const takenAt = parseTime(row[timeColumn] ?? "", context.dayStart);
    if (!takenAt) return problems.push({ line, field: "takenAt", message: `“${row[timeColumn] ?? ""}” is not a time (use 2026-03-14T10:05 or 10:05)` });
    if (takenAt.getTime() <= previousTime) return problems.push({ line, field: "takenAt", message: "Rows must be in time order, each later than the one before" });
    previousTime = takenAt.getTime();

    const values: Record<string, number> = {};
    for (const [column, header] of headers.entries()) {
      const field = mapping[header];
      if (!field || field === "ignore" || field === "takenAt") continue;
      const cell = (row[column] ?? "").replace(",", ".");
      if (cell === "") continue;
      const number = Number(cell);
      if (!Number.isFinite(number)) return problems.push({ line, field, message: `${header}: “${row[column]}” is not a number` });
      values[field] = number;
    }
    const parsed = DiagnosisInputSchema.safeParse({ ...context.base, ...values });
    if (!parsed.success) {
      const issue = parsed.error.issues[0]!;
      return problems.push({ line, field: issue.path.join(".") || undefined, message: issue.message });
    }
    valid.push({ line, takenAt, input: parsed.data, result: diagnose(parsed.data) });
  });
  return { headers, mapping, rowCount: rows.length, valid, problems };
}
