import { useQueryClient } from "@tanstack/react-query";
import { useEffect } from "react";
import { meQueryOptions, useMe } from "@/lib/api/auth.ts";
import { useOnlineStatus } from "./online-status.ts";
import type { OutboxEntry } from "./outbox-store.ts";
import { sendWaitingEntries } from "./outbox-sender.ts";

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
  const waiting = entries
    .filter((entry) => entry.state === "waiting")
    .map((entry) => entry.clientId)
    .join(" ");
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
