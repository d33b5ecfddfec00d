import { useCallback, useSyncExternalStore } from "react";
import { useMe } from "@/lib/api/auth.ts";
import {
  OUTBOX_KIND_LABELS,
  watchEntries,
  sendOrKeep,
  type OutboxEntry,
  type OutboxFile,
  type OutboxKind,
} from "./outbox-store.ts";

const NONE: OutboxEntry[] = [];

/**
 * One watch on IndexedDB per person, shared by every screen part that lists entries (the top
 * bar, the run log, the procedure panels, the user menu…): each new subscriber gets the entries
 * held, and the watch ends with its last subscriber.
 */
interface SharedWatch {
  entries: OutboxEntry[];
  listeners: Set<() => void>;
  stop: () => void;
}
const watches = new Map<string, SharedWatch>();

function watchShared(userId: string, listener: () => void): () => void {
  let watch = watches.get(userId);
  if (!watch) {
    const created: SharedWatch = { entries: NONE, listeners: new Set(), stop: () => undefined };
    created.stop = watchEntries(userId, (entries) => {
      created.entries = entries;
      for (const notify of created.listeners) notify();
    });
    watches.set(userId, created);
    watch = created;
  }
  const held = watch;
  held.listeners.add(listener);
  return () => {
    held.listeners.delete(listener);
    if (held.listeners.size === 0) {
      held.stop();
      watches.delete(userId);
    }
  };
}

/** The signed-in person's entries on this device (waiting and refused), kept up to date. */
export function useOutboxEntries(): OutboxEntry[] {
  const userId = useMe().data?.id;
  // Keyed by whose they are, so that another person's never show while theirs load.
  const subscribe = useCallback(
    (listener: () => void) => (userId ? watchShared(userId, listener) : () => undefined),
    [userId],
  );
  return useSyncExternalStore(subscribe, () => (userId ? (watches.get(userId)?.entries ?? NONE) : NONE));
}

/**
 * `sendOrKeep` for a form of a visit's records, for the person signed in: the entry is named by
 * its kind (or `label`) and keeps `takenAt`, else the body's, else now, as the time it was taken.
 */
export function useKeepWhenOffline() {
  const userId = useMe().data?.id;
  return useCallback(
    <T>(
      send: () => Promise<T>,
      entry: {
        kind: OutboxKind;
        visitId: string;
        path: string;
        label?: string;
        takenAt?: string;
        file?: OutboxFile;
        /** The outbox's key, when the body carries no client id (a void: the server knows a repeat by its record and reason). */
        clientId?: string;
        body: Record<string, unknown> & { clientId?: string; takenAt?: string };
      },
    ) => {
      // Forms of a visit show only to someone signed in; an entry kept for no one could never be sent.
      if (!userId) throw new Error("Sign in again to save: this device does not know who you are");
      const clientId = entry.clientId ?? entry.body.clientId;
      if (!clientId) throw new Error("An entry kept on the device needs its client id");
      return sendOrKeep(send, {
        ...entry,
        clientId,
        userId,
        label: entry.label ?? OUTBOX_KIND_LABELS[entry.kind],
        takenAt: entry.takenAt ?? entry.body.takenAt ?? new Date().toISOString(),
      });
    },
    [userId],
  );
}
