/**
 * Import of a logged reading series from CSV: which columns a file's headers map to, how a
 * mapping is guessed from the header words, and the server's answer. The browser guesses and
 * shows the mapping from the headers it parsed itself; the server guesses the same way when a
 * file comes without a mapping, and judges every row (server/import/readings-csv.ts).
 */
import { z } from "zod";
import {
  NUMERIC_MEASURED_FIELDS,
  readingField,
  STORED_UNITS,
  type NumericMeasuredField,
  type Quantity,
} from "./reading-fields.ts";

/** Reading fields a column can be mapped to, besides the time column: every measured number. */
export const IMPORTABLE_FIELDS = NUMERIC_MEASURED_FIELDS;
export type ImportableField = NumericMeasuredField;

/** What a column maps to: a reading field, the reading time, or nothing. */
export const ColumnMappingSchema = z.record(
  z.string(),
  z.union([z.enum(IMPORTABLE_FIELDS), z.literal("takenAt"), z.literal("ignore")]),
);
export type ColumnMapping = z.infer<typeof ColumnMappingSchema>;
export type ColumnTarget = ColumnMapping[string];

/** Header words of a time column. Tried first: "timestamp" would otherwise read as amps. */
const TIME_HEADER = /^(time|timestamp|date.?time|taken)/i;

/** Each header mapped to the first target its words name that no earlier header took, or ignored. */
export function guessMapping(headers: readonly string[]): ColumnMapping {
  const guesses: [RegExp, ColumnTarget][] = [
    [TIME_HEADER, "takenAt"],
    ...IMPORTABLE_FIELDS.flatMap((field): [RegExp, ColumnTarget][] => {
      const pattern = readingField(field).csvHeader;
      return pattern ? [[pattern, field]] : [];
    }),
  ];
  const mapping: ColumnMapping = {};
  const used = new Set<ColumnTarget>();
  for (const header of headers) {
    const match = guesses.find(([pattern, target]) => pattern.test(header.trim()) && !used.has(target));
    mapping[header] = match ? match[1] : "ignore";
    if (match) used.add(match[1]);
  }
  return mapping;
}

/** Columns a CSV header can be mapped to, with the words shown in the mapping step (units as the file holds them). */
export const IMPORT_TARGET_LABELS: Record<ColumnTarget, string> = {
  ignore: "Ignore this column",
  takenAt: "Reading time",
  ...(Object.fromEntries(
    IMPORTABLE_FIELDS.map((field) => {
      const { label, kind } = readingField(field);
      return [field, `${label} (${STORED_UNITS[kind as Quantity]})`];
    }),
  ) as Record<ImportableField, string>),
};

/** The message when no column gives the reading time: the browser shows it before the server would. */
export const NO_TIME_COLUMN_MESSAGE = "Map one column to the reading time";

/** Answer of POST /api/visits/:id/readings/import (preview or store). */
export const ImportSummarySchema = z.object({
  headers: z.array(z.string()),
  mapping: z.record(z.string(), z.string()),
  rowCount: z.number().int(),
  validCount: z.number().int(),
  problems: z.array(z.object({ line: z.number().int(), field: z.string().optional(), message: z.string() })),
  stored: z.number().int(),
});
export type ImportSummary = z.infer<typeof ImportSummarySchema>;
