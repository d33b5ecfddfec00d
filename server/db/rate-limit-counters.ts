/**
 * The database side of the throttles: one counter per key that counts hits until its reset
 * time, then starts over. Each change is one statement, so app servers sharing the database
 * never lose a hit between a read and a write.
 */
import { and, eq, gt, lt, sql } from "drizzle-orm";
import type { Database } from "./client.ts";
import { rateLimitCounters } from "./schema.ts";
import { oneRow } from "./one-row.ts";

export interface Counter {
  hits: number;
  resetAt: Date;
}

/** Adds a hit, starting a new window of `windowMs` when the last one has ended. */
export async function countHit(db: Database, key: string, windowMs: number): Promise<Counter> {
  const ended = sql`${rateLimitCounters.resetAt} <= now()`;
  const rows = await db
    .insert(rateLimitCounters)
    .values({ key, hits: 1, resetAt: sql`now() + ${windowMs} * interval '1 millisecond'` })
    .onConflictDoUpdate({
      target: rateLimitCounters.key,
      set: {
        hits: sql`case when ${ended} then 1 else ${rateLimitCounters.hits} + 1 end`,
        resetAt: sql`case when ${ended} then excluded.reset_at else ${rateLimitCounters.resetAt} end`,
      },
    })
    .returning({ hits: rateLimitCounters.hits, resetAt: rateLimitCounters.resetAt });
  return oneRow(rows, "count hit");
}

/** Takes back a hit in the current window (a request that turned out not to count). */
export async function uncountHit(db: Database, key: string): Promise<void> {
  await db
    .update(rateLimitCounters)
    .set({ hits: sql`greatest(${rateLimitCounters.hits} - 1, 0)` })
    .where(and(eq(rateLimitCounters.key, key), gt(rateLimitCounters.resetAt, sql`now()`)));
}

/** The counter in its current window, if any. */
export async function readCounter(db: Database, key: string): Promise<Counter | undefined> {
  const [row] = await db
    .select({ hits: rateLimitCounters.hits, resetAt: rateLimitCounters.resetAt })
    .from(rateLimitCounters)
    .where(and(eq(rateLimitCounters.key, key), gt(rateLimitCounters.resetAt, sql`now()`)));
  return row;
}

export async function deleteCounter(db: Database, key: string): Promise<void> {
  await db.delete(rateLimitCounters).where(eq(rateLimitCounters.key, key));
}

/** Deletes counters whose window has ended; they count nothing any more. */
export async function deleteEndedCounters(db: Database): Promise<number> {
  const removed = await db
    .delete(rateLimitCounters)
    .where(lt(rateLimitCounters.resetAt, sql`now()`))
    .returning({ key: rateLimitCounters.key });
  return removed.length;
}
