/**
 * Periodic work done once per interval across every app server sharing the database, rather than
 * once per server: the first server whose timer fires in an interval counts it on the shared
 * counters (one atomic statement, server/db/rate-limit-counters.ts) and does the work, all under
 * the job's advisory lock; the others find the interval counted and skip it. A job that fails
 * takes its count back with its transaction, so the next timer, on any server, tries again.
 */
import { ifLockFree, type LockKey } from "./advisory-locks.ts";
import type { Database } from "./client.ts";
import { countHit } from "./rate-limit-counters.ts";

/** Runs `job` unless it already ran, on this server or another, in the current interval; undefined when skipped. */
export function oncePerInterval<T>(
  db: Database,
  key: LockKey,
  intervalMs: number,
  job: (tx: Database) => Promise<T>,
): Promise<T | undefined> {
  return ifLockFree(db, key, async (tx) => {
    const { hits } = await countHit(tx, `job:${key}`, intervalMs);
    return hits === 1 ? job(tx) : undefined;
  });
}
