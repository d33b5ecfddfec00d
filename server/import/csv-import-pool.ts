/**
 * The worker pool that parses and judges CSV imports off the server's thread, so a 5 000-row
 * file (or a 2 MB header) never holds up other requests. One thread on this 2-core class of
 * machine leaves the other core to the server; threads start on first use and end when idle,
 * so a server that never imports spends nothing on them.
 */
import { Piscina } from "piscina";
import { HttpError } from "../http/http-error.ts";
import type { CsvImportTask, ImportPreview, ImportRefusal } from "./readings-csv.ts";

/** Imports waiting for the thread beyond which new ones are turned away (each holds up to 2 MB). */
const MAX_QUEUED_IMPORTS = 8;
/** An idle thread ends after this long; the next import starts one again (about a second). */
const IDLE_TIMEOUT_MS = 5 * 60_000;

let pool: Piscina<CsvImportTask, ImportPreview | ImportRefusal> | undefined;

function csvPool() {
  pool ??= new Piscina({
    filename: new URL("./readings-csv-worker.mjs", import.meta.url).href,
    minThreads: 0,
    maxThreads: 1,
    maxQueue: MAX_QUEUED_IMPORTS,
    idleTimeout: IDLE_TIMEOUT_MS,
  });
  return pool;
}

/** Judges a CSV file in the worker thread; a refused file becomes its 4xx. */
export async function judgeCsvOffThread(task: CsvImportTask): Promise<ImportPreview> {
  let outcome: ImportPreview | ImportRefusal;
  try {
    outcome = await csvPool().run(task);
  } catch (error) {
    if ((error as Error).message === "Task queue is at limit")
      throw new HttpError(503, "Too many imports are running at once; try again in a minute");
    throw error;
  }
  if ("refused" in outcome)
    throw new HttpError(outcome.refused.status, outcome.refused.message, { file: outcome.refused.message });
  return outcome;
}

/** Stops the worker thread (server shutdown). */
export async function closeCsvImportPool(): Promise<void> {
  await pool?.destroy();
  pool = undefined;
}
