/**
 * Entries stored once per client id (README decision 026). A device names each entry it makes
 * on a visit with a UUID of its own and sends it again, with the same id, whenever it did not
 * hear the answer; every table of visit entries has a nullable client_id and a unique index on
 * (visit_id, client_id) where it is set (server/db/schema.ts). The insert goes in with
 * ON CONFLICT DO NOTHING on that index and, when it stored nothing, reads the row that holds the
 * id: so of two sends racing each other the index decides, never a read made before the insert.
 *
 * The scope is the visit (which is one organisation's): another visit, or another company, using
 * the same id stores an entry of its own and never sees this one; and each table is its own
 * scope, so a reading and an adjustment never answer for each other.
 */
import { and, eq, sql } from "drizzle-orm";
import type { AnyPgColumn, PgTable } from "drizzle-orm/pg-core";
import type { Database } from "./client.ts";

/** A table of visit entries: it has the visit and the client id the unique index is on. */
export type EntryTable = PgTable & { visitId: AnyPgColumn; clientId: AnyPgColumn };

/** A table's entries as the API shows them: how a stored row becomes the answer. */
export interface EntryKind<Table extends EntryTable, Entry> {
  table: Table;
  present: (db: Database, row: Table["$inferSelect"]) => Promise<Entry>;
}

/** An entry with whether it was stored by this send (false) or by an earlier one with its client id (true). */
export interface StoredEntry<Entry> {
  entry: Entry;
  replayed: boolean;
}

export function entryKind<Table extends EntryTable, Entry>(
  table: Table,
  present: (db: Database, row: Table["$inferSelect"]) => Promise<Entry>,
): EntryKind<Table, Entry> {
  return { table, present };
}

/** The row of the visit holding the client id, if any (none without an id). */
export async function findRowByClientId<Table extends EntryTable>(
  db: Database,
  table: Table,
  visitId: string,
  clientId: string | null | undefined,
): Promise<Table["$inferSelect"] | undefined> {
  if (!clientId) return undefined;
  const rows = (await db
    .select()
    .from(table as PgTable)
    .where(and(eq(table.visitId, visitId), eq(table.clientId, clientId)))) as Table["$inferSelect"][];
  return rows[0];
}

/** The entry of the visit holding the client id, as the API shows it, if any. */
export async function findEntry<Table extends EntryTable, Entry>(
  db: Database,
  kind: EntryKind<Table, Entry>,
  visitId: string,
  clientId: string | null | undefined,
): Promise<Entry | undefined> {
  const row = await findRowByClientId(db, kind.table, visitId, clientId);
  return row ? kind.present(db, row) : undefined;
}

/**
 * Inserts a row unless the visit already holds its client id; then answers with the row stored
 * first (the values sent again are not compared: the id names the entry). Race-safe: the unique
 * index decides which of two concurrent sends stores the row; the other reads it.
 */
export async function insertRowOnce<Table extends EntryTable>(
  db: Database,
  table: Table,
  values: Table["$inferInsert"] & { visitId: string | null; clientId?: string | null },
): Promise<{ row: Table["$inferSelect"]; replayed: boolean }> {
  const insert = db.insert(table as PgTable).values(values);
  // An entry with no visit (a cylinder sent for reclaim) has no scope for a client id.
  if (!values.clientId || !values.visitId) {
    const [row] = (await insert.returning()) as Table["$inferSelect"][];
    return { row: row!, replayed: false };
  }
  const [row] = (await insert
    .onConflictDoNothing({ target: [table.visitId, table.clientId], where: sql`${table.clientId} is not null` })
    .returning()) as Table["$inferSelect"][];
  if (row) return { row, replayed: false };
  const stored = await findRowByClientId(db, table, values.visitId, values.clientId);
  // The conflicting row is committed (or the insert would have waited for it), so it is there to read.
  if (!stored) throw new Error(`insertRowOnce found no row holding client id ${values.clientId}`);
  return { row: stored, replayed: true };
}

/** What every new visit entry may carry from the device: its client id and when it was taken (README decision 026). */
export interface DeviceEntryValues {
  clientId?: string;
  takenAt?: Date;
}

/** insertRowOnce, answered as the API shows the entry. */
export async function insertEntryOnce<Table extends EntryTable, Entry>(
  db: Database,
  kind: EntryKind<Table, Entry>,
  values: Table["$inferInsert"] & { visitId: string | null; clientId?: string | null },
): Promise<StoredEntry<Entry>> {
  const { row, replayed } = await insertRowOnce(db, kind.table, values);
  return { entry: await kind.present(db, row), replayed };
}
