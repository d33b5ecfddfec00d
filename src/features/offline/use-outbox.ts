import { useQueryClient } from "@tanstack/react-query";
import { liveQuery } from "dexie";
import { useCallback, useEffect, useState } from "react";
import { useMe } from "@/lib/api/auth.ts";
import { useOnlineStatus } from "./online-status.ts";
import { entriesOf, OUTBOX_KIND_LABELS, sendOrKeep, type OutboxEntry, type OutboxKind } from "./outbox-store.ts";
import { sendWaitingEntries } from "./outbox-sender.ts";

const NONE: OutboxEntry[] = [];

/** The signed-in person's entries on this device (waiting and refused), kept up to date. */
export function useOutboxEntries(): OutboxEntry[] {
  const userId = useMe().data?.id;
  // Tagged with whose they are, so that another person's never show while theirs load.
  const [held, setHeld] = useState<{ userId: string; entries: OutboxEntry[] } | null>(null);
  useEffect(() => {
    if (!userId) return;
    const subscription = liveQuery(() => entriesOf(userId)).subscribe({
      next: (entries) => setHeld({ userId, entries }),
      error: () => setHeld({ userId, entries: [] }),
    });
    return () => subscription.unsubscribe();
  }, [userId]);
  return held && held.userId === userId ? held.entries : NONE;
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
  const userId = useMe().data?.id ?? "";
  return useCallback(
    <T>(
      send: () => Promise<T>,
      entry: { kind: OutboxKind; visitId: string; path: string; label?: string; takenAt?: string; body: Record<string, unknown> & { clientId: string; takenAt?: string } },
    ) =>
      sendOrKeep(send, {
        ...entry,
        clientId: entry.body.clientId,
        userId,
        label: entry.label ?? OUTBOX_KIND_LABELS[entry.kind],
        takenAt: entry.takenAt ?? entry.body.takenAt ?? new Date().toISOString(),
      }),
    [userId],
  );
}
