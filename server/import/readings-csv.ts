/**
 * Import of a logged reading series from CSV (a data logger's export or a spreadsheet).
 * Values are SI-metric as stored: kPa gauge, °C, %, A, minutes. Each row goes through the same
 * builder as a hand-entered reading (server/visits/reading-input.ts), so its targets, RLA and
 * atmosphere come from the equipment and the site; every bad row is reported with its line.
 *
 * This module runs in a worker thread (readings-csv-worker.mjs through csv-import-pool.ts):
 * parsing and diagnosing thousands of rows would otherwise hold up every other request. It is
 * pure — text and plain data in, plain data out — so it also runs directly in tests.
 */
import { parse } from "csv-parse/sync";
import { z } from "zod";
import { diagnose } from "@shared/engine/index.ts";
import { instant, isStorableInstant } from "@shared/schemas/dates.ts";
import { text } from "@shared/schemas/text.ts";
import {
  ColumnMappingSchema,
  guessMapping,
  NO_TIME_COLUMN_MESSAGE,
  type ColumnMapping,
  type ImportableField,
} from "@shared/schemas/readings-import.ts";
import { packResult } from "../db/stored-result.ts";
import { readingInput, type ReadingContext } from "../visits/reading-input.ts";

export const MAX_IMPORT_ROWS = 5000;
/** A logger's export has a time column and a dozen readings; 64 columns leaves room for any. */
export const MAX_IMPORT_COLUMNS = 64;
/** 64 columns of 60 characters; a longer line is not a reading series (or has lost its line breaks). */
export const MAX_IMPORT_LINE_CHARS = 4096;
/** Rows per slice handed back for storing: each slice holds the database for a few tens of milliseconds. */
export const IMPORT_SLICE_ROWS = 50;

export interface RowProblem {
  /** 1-based line in the file, counting the header as line 1. */
  line: number;
  field?: string;
  message: string;
}

/** What the import route sends the worker: only plain data, so it crosses threads as is. */
export interface CsvImportTask {
  text: string;
  mapping?: ColumnMapping;
  /** The equipment, circuit nameplate and site the readings belong to. */
  context: ReadingContext;
  /** Local midnight of the logging day (ISO, with the client's offset), for times of day like 10:05. */
  dayStart: string;
  /** True to hand back the valid rows, judged and serialised for storing; false for a preview. */
  keepRows: boolean;
}

export interface ImportPreview {
  headers: string[];
  mapping: ColumnMapping;
  rowCount: number;
  validCount: number;
  problems: RowProblem[];
  /**
   * The valid rows as UTF-8 JSON arrays of { takenAt, input, result }, the result packed as
   * stored (server/db/stored-result.ts), IMPORT_SLICE_ROWS at a time (only when keepRows), all
   * views of one buffer. Serialised here and handed over without a copy (the worker transfers
   * the buffer), so the server's thread neither builds, compresses nor clones thousands of
   * objects; PostgreSQL unpacks them (stageImportedReadings).
   */
  slices: Uint8Array[];
}

/** A file refused as a whole, with the status and message the route answers. */
export interface ImportRefusal {
  refused: { status: number; message: string };
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

const thousands = (value: number) => value.toLocaleString("en-GB").replace(/,/g, " ");

/** Refuses what is not a reading series before parsing it: an overlong line (e.g. a 1.9 MB header). */
function overlongLine(text: string): ImportRefusal | null {
  let line = 1;
  let start = 0;
  while (start <= text.length) {
    const end = text.indexOf("\n", start);
    const stop = end === -1 ? text.length : end;
    if (stop - start > MAX_IMPORT_LINE_CHARS) {
      const message = `Line ${line} has ${thousands(stop - start)} characters; a line may have at most ${thousands(MAX_IMPORT_LINE_CHARS)}. Is this a logger's reading series?`;
      return { refused: { status: 400, message } };
    }
    if (end === -1) break;
    start = end + 1;
    line += 1;
  }
  return null;
}

const readError = (error: unknown): ImportRefusal => ({
  refused: { status: 400, message: `This is not a readable CSV file: ${(error as Error).message}` },
});

export function judgeReadingsCsv(task: CsvImportTask): ImportPreview | ImportRefusal {
  const tooLong = overlongLine(task.text);
  if (tooLong) return tooLong;
  let records: string[][];
  try {
    const [header = []] = parse(task.text, {
      to_line: 1,
      bom: true,
      trim: true,
      relax_column_count: true,
    }) as string[][];
    if (header.length > MAX_IMPORT_COLUMNS) {
      return {
        refused: {
          status: 400,
          message: `The header has ${thousands(header.length)} columns; Satura reads at most ${MAX_IMPORT_COLUMNS}.`,
        },
      };
    }
    records = parse(task.text, { skip_empty_lines: true, trim: true, relax_column_count: true, bom: true });
  } catch (error) {
    return readError(error);
  }
  const [headers = [], ...rows] = records;
  const mapping = task.mapping ?? guessMapping(headers);
  const problems: RowProblem[] = [];
  const valid: { takenAt: string; input: unknown; result: unknown }[] = [];
  const summary = () => ({
    headers,
    mapping,
    rowCount: rows.length,
    validCount: valid.length,
    problems,
    slices: task.keepRows ? slicesOf(valid) : [],
  });
  const timeColumn = headers.findIndex((header) => mapping[header] === "takenAt");
  if (headers.length === 0) problems.push({ line: 1, message: "The file is empty" });
  if (timeColumn < 0 && headers.length > 0) problems.push({ line: 1, message: NO_TIME_COLUMN_MESSAGE });
  if (rows.length > MAX_IMPORT_ROWS)
    problems.push({ line: MAX_IMPORT_ROWS + 2, message: `At most ${MAX_IMPORT_ROWS} rows per import` });
  if (problems.length > 0) return summary();

  const dayStart = new Date(task.dayStart);
  let previousTime = -Infinity;
  rows.forEach((row, index) => {
    const line = index + 2;
    const takenAt = parseTime(row[timeColumn] ?? "", dayStart);
    if (!takenAt)
      return problems.push({
        line,
        field: "takenAt",
        message: `“${row[timeColumn] ?? ""}” is not a time (use 2026-03-14T10:05 or 10:05)`,
      });
    if (takenAt.getTime() <= previousTime)
      return problems.push({
        line,
        field: "takenAt",
        message: "Rows must be in time order, each later than the one before",
      });
    previousTime = takenAt.getTime();

    const values: Partial<Record<ImportableField, number>> = {};
    for (const [column, header] of headers.entries()) {
      const field = mapping[header];
      if (!field || field === "ignore" || field === "takenAt") continue;
      const cell = (row[column] ?? "").replace(",", ".");
      if (cell === "") continue;
      const number = Number(cell);
      if (!Number.isFinite(number))
        return problems.push({ line, field, message: `${header}: “${row[column]}” is not a number` });
      values[field] = number;
    }
    const parsed = readingInput(values, task.context);
    if (!parsed.success) {
      // A failed parse names at least one issue; the row reports the first.
      const [issue] = parsed.error.issues;
      return problems.push({
        line,
        field: issue?.path.join(".") || undefined,
        message: issue?.message ?? "This row is not a reading",
      });
    }
    const result = diagnose(parsed.data, { withMeasuredCycle: true });
    // Packed here, in the worker, as every stored result is (server/db/stored-result.ts): a preview stores nothing.
    valid.push({
      takenAt: takenAt.toISOString(),
      input: parsed.data,
      result: task.keepRows ? packResult(result) : result,
    });
  });
  return summary();
}

function slicesOf(rows: readonly unknown[]): Uint8Array[] {
  const encoder = new TextEncoder();
  const encoded: Uint8Array[] = [];
  for (let start = 0; start < rows.length; start += IMPORT_SLICE_ROWS)
    encoded.push(encoder.encode(JSON.stringify(rows.slice(start, start + IMPORT_SLICE_ROWS))));
  // One buffer for all slices, so the worker can transfer it in one move.
  const buffer = new Uint8Array(encoded.reduce((total, slice) => total + slice.length, 0));
  let offset = 0;
  return encoded.map((slice) => {
    buffer.set(slice, offset);
    offset += slice.length;
    return buffer.subarray(offset - slice.length, offset);
  });
}

/** The form fields sent with a CSV file: the circuit, the logging day's start, preview or store, and the column mapping (JSON). */
export const ImportFieldsSchema = z.object({
  circuit: z.coerce.number().int().min(1),
  dayStart: instant("dayStart must be an ISO date-time"),
  mode: z.enum(["preview", "all", "valid-only"]).default("preview"),
  mapping: text({ multiline: true })
    .optional()
    .transform((json, context) => {
      if (!json) return undefined;
      try {
        return ColumnMappingSchema.parse(JSON.parse(json));
      } catch {
        context.addIssue({ code: "custom", message: "The column mapping is not valid" });
        return z.NEVER;
      }
    }),
});
