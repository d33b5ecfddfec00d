/**
 * The register's CSV as it is read, chunk by chunk: the export's memory is one chunk whatever the
 * register's size, the header leaves before any line is read and the first lines soon after (the
 * first chunk is small), and between chunks the database answers other requests (PGlite has one
 * connection; one query for the whole register would hold it for as long as that takes). The
 * route streams this text into the response, so a slow phone link holds the reading back
 * (back-pressure) and a cancelled download stops it.
 */
import type { MovementRow } from "../db/register.ts";
import { registerCsvHeader } from "./register-csv.ts";

/** Lines read and written per step: about 100 kB of CSV, some tens of milliseconds of database time. */
export const EXPORT_CHUNK_LINES = 500;
/** Lines of the first step: a few milliseconds of database time, so a download starts at once. */
export const FIRST_EXPORT_CHUNK_LINES = 50;

/**
 * @param chunks the register's lines in order, a chunk at a time (registerChunks)
 * @param lineOf one CSV line of a movement; `undefined` leaves the movement out
 * @returns the header, then each chunk's lines: registerCsv's text, in pieces
 */
export async function* registerCsvText(
  chunks: AsyncIterable<readonly MovementRow[]>,
  lineOf: (movement: MovementRow) => string | undefined,
): AsyncGenerator<string> {
  yield registerCsvHeader();
  for await (const chunk of chunks) {
    const lines = chunk.map(lineOf).filter((line) => line !== undefined);
    if (lines.length > 0) yield lines.join("");
  }
}
