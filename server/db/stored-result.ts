/**
 * How a reading's result is stored (README decision 030). The result is what the technician saw
 * and is kept as computed (decision 004), but as plain jsonb it was about 10.5 kB of JSON that
 * the embedded database parsed, compressed (pglz, in WebAssembly, on the server's one thread) and
 * wrote out of line in three TOAST chunks: about 90 % of a saved reading's insert.
 *
 * It is stored instead as a small jsonb object, a *packed* result: the result's exact JSON text
 * compressed by zlib with a preset dictionary (stored-result-dictionary-1.txt: results repeat
 * the same keys, sentences and sources), in base64, beside a copy of the few fields SQL reads
 * (RESULT_FIELDS_READ_IN_SQL: the generated figure columns of migration 0015, the start-up
 * upgrade's marker, the report's charge estimate). About 1.2 kB of compressed text instead of
 * 10.5 kB of JSON; the database parses a small object and keeps it in one piece. Reading it back
 * is lossless: JSON.parse of the very text JSON.stringify made, so the object the engine returned.
 *
 * The `storedResult` column type packs on the way in and unpacks on the way out, so every read
 * and write through drizzle sees a DiagnosisResult; a row stored before this format (a plain
 * result) reads as it is. SQL that reads a field of `result` other than those copied would read
 * null from a packed result: add the field to RESULT_FIELDS_READ_IN_SQL (new writes only) first.
 *
 * The dictionary is part of the format: never edit a dictionary file; a new one gets the next
 * number (scripts/build-stored-result-dictionary.ts) and every older one stays readable.
 */
import { readFileSync } from "node:fs";
import { deflateSync, inflateSync } from "node:zlib";
import { customType } from "drizzle-orm/pg-core";
import type { DiagnosisResult } from "@shared/schemas/diagnosis.ts";

/** The fields of a result that SQL reads, copied beside the packed text (present only where the result has them). */
export const RESULT_FIELDS_READ_IN_SQL = [
  "superheatK",
  "subcoolingK",
  "evaporatingTempC",
  "condensingTempC",
  "chargeState",
  "chargeDeviation",
] as const;

/** The dictionary new results are packed with. */
const CURRENT_DICTIONARY = 1;
const dictionaries = new Map<number, Buffer>([
  [1, readFileSync(new URL("./stored-result-dictionary-1.txt", import.meta.url))],
]);
/**
 * zlib's level for packing. Over 2,000 results of the large data set, level 3 packs to 1.22 kB in
 * about 120 µs, level 6 (zlib's default) to 1.1 kB in about 170 µs. Reading does not depend on it.
 */
const PACK_LEVEL = 3;

/** A result as stored: its zlib-compressed JSON text (base64) and the fields SQL reads. */
export interface PackedResult extends Partial<Pick<DiagnosisResult, (typeof RESULT_FIELDS_READ_IN_SQL)[number]>> {
  /** The number of the dictionary `packed` was compressed with. */
  packedWith: number;
  /** zlib stream (RFC 1950) of the result's JSON text, with the dictionary preset, in base64. */
  packed: string;
}

function envelope(result: DiagnosisResult, packed: string): PackedResult {
  const stored: PackedResult = { packedWith: CURRENT_DICTIONARY, packed };
  for (const field of RESULT_FIELDS_READ_IN_SQL) if (field in result) Object.assign(stored, { [field]: result[field] });
  return stored;
}

/** The packed form of a result, as stored (the CSV import's worker packs its rows with this). */
export function packResult(result: DiagnosisResult): PackedResult {
  const compressed = deflateSync(JSON.stringify(result), {
    dictionary: dictionaries.get(CURRENT_DICTIONARY)!,
    level: PACK_LEVEL,
  });
  return envelope(result, compressed.toString("base64"));
}

const isPacked = (value: object): value is PackedResult => "packed" in value && "packedWith" in value;

/** The stored value as the result it holds: a packed result unpacked, a plain one (stored before packing) as it is. */
export function unpackResult(stored: unknown): DiagnosisResult {
  const value = (typeof stored === "string" ? JSON.parse(stored) : stored) as DiagnosisResult | PackedResult;
  if (!isPacked(value)) return value;
  const dictionary = dictionaries.get(value.packedWith);
  if (!dictionary)
    throw new Error(`A stored result was packed with dictionary ${value.packedWith}, which this server does not have`);
  return JSON.parse(
    inflateSync(Buffer.from(value.packed, "base64"), { dictionary }).toString("utf8"),
  ) as DiagnosisResult;
}

/** A jsonb column holding a packed result; drizzle code reads and writes DiagnosisResult. */
export const storedResult = customType<{ data: DiagnosisResult; driverData: unknown }>({
  dataType: () => "jsonb",
  toDriver: (result) => JSON.stringify(packResult(result)),
  fromDriver: unpackResult,
});
