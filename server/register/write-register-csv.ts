/**
 * Writes the register's CSV to a response as it is read, chunk by chunk: the export's memory is
 * one chunk whatever the register's size, the first bytes leave at once, and between chunks the
 * database answers other requests (PGlite has one connection; one query for the whole register
 * would hold it for as long as that takes).
 */
import type { Writable } from "node:stream";
import type { MovementRow } from "../db/register.ts";
import { registerCsvHeader } from "./register-csv.ts";

/** Lines read and written per step: about 100 kB of CSV, a few milliseconds of database time. */
export const EXPORT_CHUNK_LINES = 500;

/** Resolves when the stream wants more, or has closed (a download cancelled mid-way). */
function ready(out: Writable): Promise<void> {
  return new Promise((resolve) => {
    const done = () => {
      out.off("drain", done);
      out.off("close", done);
      resolve();
    };
    out.once("drain", done);
    out.once("close", done);
  });
}

/**
 * @param chunks the register's lines in order, a chunk at a time (registerChunks)
 * @param lineOf one CSV line of a movement; `undefined` leaves the movement out
 * @returns false when the reader went away before the end (nothing more is read)
 */
export async function writeRegisterCsv(
  out: Writable,
  chunks: AsyncIterable<readonly MovementRow[]>,
  lineOf: (movement: MovementRow) => string | undefined,
): Promise<boolean> {
  if (!out.write(registerCsvHeader())) await ready(out);
  for await (const chunk of chunks) {
    if (out.destroyed) return false;
    const text = chunk.map(lineOf).filter((line) => line !== undefined).join("");
    // Respect back-pressure: a slow phone link must not make the server buffer the whole file.
    if (!out.write(text)) await ready(out);
  }
  if (out.destroyed) return false;
  out.end();
  return true;
}
