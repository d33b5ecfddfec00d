import { Dexie, liveQuery, type EntityTable } from "dexie";
import type { OutboxEntry } from "./outbox-store.ts";

/** The outbox in IndexedDB ("satura-outbox"): entries by client id, read per person in order. */
class OutboxDatabase extends Dexie {
  entries!: EntityTable<OutboxEntry, "clientId">;
  constructor() {
    super("satura-outbox");
    this.version(1).stores({ entries: "clientId, [userId+queuedAt], [userId+visitId]" });
  }
}

export const outbox = new OutboxDatabase();

/** A person's entries in the order they were made. */
export const entriesOf = (userId: string): Promise<OutboxEntry[]> =>
  outbox.entries.where("[userId+queuedAt]").between([userId, Dexie.minKey], [userId, Dexie.maxKey]).toArray();

export { liveQuery };
