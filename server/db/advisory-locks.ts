/**
 * Work that several app servers sharing one PostgreSQL must not do at the same time, guarded by
 * PostgreSQL advisory locks (docs, "Advisory Locks", explicit-locking.html#ADVISORY-LOCKS). The
 * same calls run on PGlite, where one process holds the database and every lock is free.
 */
import { sql } from "drizzle-orm";
import type { Database } from "./client.ts";

/** One key per kind of work; any fixed numbers only Satura uses on its database. */
export const LOCK_KEYS = {
  /** Applying migrations (server/db/postgres-client.ts): a session lock on the migrating connection. */
  migrations: 7_215_020_001,
  /** Start-up data work: clearing cut-off imports, the demo seed, upgrading stored results. */
  startUp: 7_215_020_002,
  /** The hourly purge of expired sessions, throttle counters and abandoned imports. */
  purge: 7_215_020_003,
  /** Refreshing the planner's statistics. */
  statistics: 7_215_020_004,
} as const;

export type LockKey = (typeof LOCK_KEYS)[keyof typeof LOCK_KEYS];

/**
 * Runs `job` in a transaction that first waits for the lock: servers starting together take
 * turns, and the later ones find the work done (e.g. the demo already seeded).
 */
export function withLock<T>(db: Database, key: LockKey, job: (tx: Database) => Promise<T>): Promise<T> {
  return db.transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(${key})`);
    return job(tx);
  });
}

/**
 * Runs `job` in a transaction holding the lock if no other server holds it, else skips it and
 * answers undefined: for periodic work another server is already doing right now.
 */
export function ifLockFree<T>(db: Database, key: LockKey, job: (tx: Database) => Promise<T>): Promise<T | undefined> {
  return db.transaction(async (tx) => {
    const { rows } = await tx.execute<{ locked: boolean }>(sql`select pg_try_advisory_xact_lock(${key}) as locked`);
    return rows[0]?.locked ? job(tx) : undefined;
  });
}
