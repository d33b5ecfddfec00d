/**
 * A visit's audit trail (visit_events): review steps, reopening, voids and imports, with who,
 * when and why. Rows are only ever added, inside the same transaction as the change they record.
 */
import { and, asc, eq, gt } from "drizzle-orm";
import type { VisitEvent, VisitEventAction, VoidableKind } from "@shared/schemas/visits.ts";
import type { Database } from "./client.ts";
import { peopleById, person } from "./people.ts";
import { visitEvents } from "./schema.ts";
import { oneRow } from "./one-row.ts";

export interface VisitEventInsert {
  visitId: string;
  action: VisitEventAction;
  summary: string;
  actorId: string;
  reason?: string | null;
  recordKind?: VoidableKind | null;
  recordId?: string | null;
  /** Now, unless a history is being written (the demo). */
  at?: Date;
}

type EventRow = typeof visitEvents.$inferSelect;

function toEvent(row: EventRow, people: Awaited<ReturnType<typeof peopleById>>): VisitEvent {
  return {
    id: row.id,
    action: row.action,
    recordKind: row.recordKind,
    recordId: row.recordId,
    summary: row.summary,
    reason: row.reason,
    actor: person(people, row.actorId),
    at: row.at.toISOString(),
  };
}

export async function insertVisitEvent(
  db: Database,
  organisationId: string,
  values: VisitEventInsert,
): Promise<VisitEvent> {
  const rows = await db
    .insert(visitEvents)
    .values({
      ...values,
      reason: values.reason ?? null,
      recordKind: values.recordKind ?? null,
      recordId: values.recordId ?? null,
      organisationId,
    })
    .returning();
  const row = oneRow(rows, "insert visit event");
  return toEvent(row, await peopleById(db, [row.actorId]));
}

/**
 * The line that records this person voiding this record for this reason, if there is one: a void
 * sent again from a device's outbox (its first answer lost) is that same void, not a new one.
 */
export async function findVoidEvent(
  db: Database,
  organisationId: string,
  visitId: string,
  values: { recordKind: VoidableKind; recordId: string; reason: string; actorId: string },
): Promise<VisitEvent | undefined> {
  const [row] = await db
    .select()
    .from(visitEvents)
    .where(
      and(
        eq(visitEvents.organisationId, organisationId),
        eq(visitEvents.visitId, visitId),
        eq(visitEvents.action, "voided"),
        eq(visitEvents.recordKind, values.recordKind),
        eq(visitEvents.recordId, values.recordId),
        eq(visitEvents.actorId, values.actorId),
        eq(visitEvents.reason, values.reason),
      ),
    )
    .limit(1);
  return row && toEvent(row, await peopleById(db, [row.actorId]));
}

/** The visit's trail, oldest first; with `sinceRevision`, only the lines written after that visit revision. */
export async function listVisitEvents(
  db: Database,
  organisationId: string,
  visitId: string,
  sinceRevision?: number,
): Promise<VisitEvent[]> {
  const rows = await db
    .select()
    .from(visitEvents)
    .where(
      and(
        eq(visitEvents.organisationId, organisationId),
        eq(visitEvents.visitId, visitId),
        sinceRevision === undefined ? undefined : gt(visitEvents.revision, sinceRevision),
      ),
    )
    .orderBy(asc(visitEvents.at), asc(visitEvents.id));
  const people = await peopleById(
    db,
    rows.map((row) => row.actorId),
  );
  return rows.map((row) => toEvent(row, people));
}
