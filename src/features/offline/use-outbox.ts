import { useQueryClient } from "@tanstack/react-query";
import { liveQuery } from "dexie";
import { useCallback, useEffect, useSyncExternalStore } from "react";
import { meQueryOptions, useMe } from "@/lib/api/auth.ts";
import { useOnlineStatus } from "./online-status.ts";
import { entriesOf, OUTBOX_KIND_LABELS, sendOrKeep, type OutboxEntry, type OutboxFile, type OutboxKind } from "./outbox-store.ts";
import { sendWaitingEntries } from "./outbox-sender.ts";

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

function watchEntries(userId: string, listener: () => void): () => void {
  let watch = watches.get(userId);
  if (!watch) {
    const created: SharedWatch = { entries: NONE, listeners: new Set(), stop: () => undefined };
    const subscription = liveQuery(() => entriesOf(userId)).subscribe({
      next: (entries) => {
        created.entries = entries;
        for (const notify of created.listeners) notify();
      },
      error: () => {
        created.entries = NONE;
        for (const notify of created.listeners) notify();
      },
    });
    created.stop = () => subscription.unsubscribe();
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
  const subscribe = useCallback((listener: () => void) => (userId ? watchEntries(userId, listener) : () => undefined), [userId]);
  return useSyncExternalStore(subscribe, () => (userId ? (watches.get(userId)?.entries ?? NONE) : NONE));
}

/** First wait after a round that could not reach the server; doubled each time, up to the most. */
const RETRY_FIRST_MS = 5_000;
const RETRY_MOST_MS = 5 * 60_000;

/**
 * Sends the signed-in person's waiting entries: at start, whenever one is kept, when the signal
 * returns, and after a failed round again and again with a growing wait. A session that has
 * ended stops it until the same person signs in again (a new `me`); someone else signing in on
 * the device never sends or sees the entries of the first.
 */
export function useOutboxSender(entries: OutboxEntry[]): void {
  const queryClient = useQueryClient();
  const userId = useMe().data?.id;
  const online = useOnlineStatus();
  const waiting = entries.filter((entry) => entry.state === "waiting").map((entry) => entry.clientId).join(" ");
  useEffect(() => {
    if (!userId || !online || !waiting) return;
    let stopped = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    let delay = RETRY_FIRST_MS;
    const send = async () => {
      const outcome = await sendWaitingEntries(queryClient, userId);
      // The session ended: asking who is signed in takes the app to the sign-in screen, and
      // the same person signing in again mounts this anew, which sends the entries.
      if (outcome === "signed-out") void queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey });
      if (stopped || outcome !== "no-connection") return;
      timer = setTimeout(() => void send(), delay);
      delay = Math.min(delay * 2, RETRY_MOST_MS);
    };
    void send();
    return () => {
      stopped = true;
      clearTimeout(timer);
    };
  }, [userId, online, waiting, queryClient]);
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
