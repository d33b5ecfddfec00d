/** Rows shown under each header, so the user sees what a column holds before mapping it. */
export const PREVIEW_ROWS = 3;
/**
 * Bytes read from the file for the preview. The header and the first rows fit many times over
 * (the server refuses a line over 4 096 characters); the rest of the file is only read by the
 * server, which judges every row at import.
 */
const PREVIEW_BYTES = 64 * 1024;

/** A CSV file's header and first rows, as the browser read them for the column mapping. */
export interface CsvPreview {
  headers: string[];
  rows: string[][];
}

/**
 * The header and first rows of a CSV text, read as the server reads the whole file: commas
 * only, blank lines skipped, cells trimmed, a byte-order mark dropped (papaparse drops it).
 */
export async function previewCsvText(text: string): Promise<CsvPreview> {
  // Loaded when a file is chosen: the run log's first screen does without the parser.
  const { default: Papa } = await import("papaparse");
  // The whole (short) text, not papaparse's `preview`: that counts the blank lines it skips.
  const { data } = Papa.parse<string[]>(text, {
    delimiter: ",",
    skipEmptyLines: true,
    transform: (cell) => cell.trim(),
  });
  const [headers = [], ...rows] = data;
  return { headers, rows: rows.slice(0, PREVIEW_ROWS) };
}

/** The header and first rows of a chosen file, read from its start only. */
export async function previewCsvFile(file: Blob): Promise<CsvPreview> {
  return previewCsvText(await file.slice(0, PREVIEW_BYTES).text());
}
