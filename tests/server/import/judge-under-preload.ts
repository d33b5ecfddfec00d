/**
 * Run by csv-import-pool.test.ts as its own process, with preloaded-probe.ts given to Node with
 * `--import`: asks the CSV import thread to preview a file of headers only and prints what came back.
 */
import { closeCsvImportPool, judgeCsvOffThread } from "../../../server/import/csv-import-pool.ts";
import type { CsvImportTask } from "../../../server/import/readings-csv.ts";

const task = {
  text: "time,suction pressure\n",
  context: { unit: { refrigerant: "R410A" } },
  dayStart: "2026-12-03T00:00:00+13:00",
  keepRows: false,
} as unknown as CsvImportTask;
try {
  const preview = await judgeCsvOffThread(task);
  console.log(JSON.stringify({ answered: "preview", headers: preview.headers, rowCount: preview.rowCount }));
} catch (error) {
  const { status, message } = error as { status?: number; message: string };
  console.log(JSON.stringify({ answered: "refusal", status, message }));
}
await closeCsvImportPool();
