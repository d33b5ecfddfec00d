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

/** Node options that preload a module; their value is the next argument unless given with `=`. */
const PRELOAD_FLAGS = new Set(["--import", "--require", "-r", "--loader", "--experimental-loader"]);

/**
 * The server's Node options for the worker, without its preloaded modules. A worker inherits
 * them by default, but those preloads were meant for the server's thread (a tool's probe, tsx
 * itself): the worker registers tsx on its own, and a preload that cannot start in a worker
 * (a .ts file before tsx is registered) would end the thread before it judged anything.
 */
export function workerExecArgv(serverArgv: readonly string[] = process.execArgv): string[] {
  const kept: string[] = [];
  let moduleFollows = false;
  for (const option of serverArgv) {
    if (moduleFollows) {
      moduleFollows = false; // the preloaded module of `--import x`, left out with its flag
      continue;
    }
    const equals = option.indexOf("=");
    const flag = equals === -1 ? option : option.slice(0, equals);
    if (!PRELOAD_FLAGS.has(flag)) kept.push(option);
    else moduleFollows = equals === -1;
  }
  return kept;
}

type CsvPool = Piscina<CsvImportTask, ImportPreview | ImportRefusal>;

let pool: CsvPool | undefined;
/** Pools whose thread failed to start, with why (see csvPool). */
const failedPools = new WeakMap<CsvPool, Error>();

function csvPool(): CsvPool {
  if (pool) return pool;
  const created: CsvPool = new Piscina({
    filename: new URL("./readings-csv-worker.mjs", import.meta.url).href,
    minThreads: 0,
    maxThreads: 1,
    maxQueue: MAX_QUEUED_IMPORTS,
    idleTimeout: IDLE_TIMEOUT_MS,
    execArgv: workerExecArgv(),
  });
  // A thread that fails outside a task (while starting) is an 'error' event on the pool: with no
  // listener it would end the whole server, and the imports queued for the thread would wait
  // forever. The pool is dropped instead: its imports are refused (503) and the next import
  // starts a new one.
  created.on("error", (error: Error) => {
    failedPools.set(created, error);
    if (pool === created) pool = undefined;
    // Not awaited: the handler only lets go of the broken threads; no caller waits on them.
    void created.destroy();
  });
  pool = created;
  return created;
}

/** Judges a CSV file in the worker thread; a refused file becomes its 4xx. */
export async function judgeCsvOffThread(task: CsvImportTask): Promise<ImportPreview> {
  let outcome: ImportPreview | ImportRefusal;
  const running = csvPool();
  try {
    outcome = await running.run(task);
  } catch (error) {
    if ((error as Error).message === "Task queue is at limit")
      throw new HttpError(503, "Too many imports are running at once; try again in a minute");
    const failure = failedPools.get(running);
    if (failure)
      throw new HttpError(503, "The import could not start on the server; try again in a minute", undefined, {
        cause: failure,
      });
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
