/**
 * The one way anything is written to a visit. The visit's row is locked (SELECT … FOR UPDATE)
 * and its status checked inside the same transaction as the write, so a write racing a
 * sign-off either lands before it or is refused after it: nothing is ever stored on a visit
 * that is already closed. Review steps (submit, sign off, send back, reopen) take the same
 * lock. On PGlite, where transactions already run one at a time, the lock costs nothing and
 * keeps the code right on a real PostgreSQL.
 *
 * Taking the lock also bumps the visit's revision (one UPDATE … RETURNING both locks and bumps),
 * and every run-log row written in the transaction is stamped with the new revision by a
 * trigger (migration 0014): so the visit detail's ETag and deltas (server/visits/visit-revision.ts)
 * see every write. A refused or failed write rolls the bump back with everything else.
 */

import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { STATUSES_OPEN_FOR_ENTRIES, type VisitStatus } from "@shared/schemas/visits.ts";
import type { Database } from "../db/client.ts";
import { visits } from "../db/schema.ts";
import { notFound, type HttpError } from "../http/http-error.ts";
import { requireWritableVisit } from "../http/require-writable-visit.ts";

export type VisitRow = typeof visits.$inferSelect;

export interface VisitWriteOptions {
  /** Statuses the write is allowed in; entries and voids by default (open, sent back). */
  allow?: readonly VisitStatus[];
  /** The refusal when the status is not allowed; the closed-visit message by default. */
  refuse?: (status: VisitStatus) => HttpError;
}

export function writeToVisit<T>(
  db: Database,
  organisationId: string,
  visitId: string,
  write: (tx: Database, visit: VisitRow) => Promise<T>,
  { allow = STATUSES_OPEN_FOR_ENTRIES, refuse }: VisitWriteOptions = {},
): Promise<T> {
  return db.transaction(async (tx) => {
    const [visit] = await tx
      .update(visits)
      .set({ revision: sql`${visits.revision} + 1` })
      .where(and(eq(visits.organisationId, organisationId), eq(visits.id, visitId)))
      .returning();
    if (!visit) throw notFound("Visit");
    if (!allow.includes(visit.status)) {
      if (refuse) throw refuse(visit.status);
      requireWritableVisit(visit.status, allow);
    }
    return write(tx, visit);
  });
}

/**
 * Several visits' rows locked at once, in id order (so two writers locking overlapping sets on a
 * real PostgreSQL never deadlock), for a write that covers them all in one transaction (readings
 * saved together, server/visits/save-readings.ts). The caller checks each row's organisation and
 * status, as writeToVisit does for one.
 */
export function lockVisits(tx: Database, visitIds: readonly string[]): Promise<VisitRow[]> {
  return tx
    .select()
    .from(visits)
    .where(inArray(visits.id, [...visitIds]))
    .orderBy(asc(visits.id))
    .for("update");
}

/**
 * Bumps the revision of the locked visits a batch is about to write to (before its inserts, so
 * the trigger stamps the rows with the new revision); visits whose saves were all refused keep theirs.
 */
export async function bumpVisitRevisions(tx: Database, visitIds: readonly string[]): Promise<void> {
  if (visitIds.length === 0) return;
  await tx
    .update(visits)
    .set({ revision: sql`${visits.revision} + 1` })
    .where(inArray(visits.id, [...visitIds]));
}
