import type { QueryClient } from "@tanstack/react-query";
import { ApiError, apiRequest, formWithFile, UPLOAD_TIMEOUT_MS } from "@/lib/api/api-client.ts";
import { PROCEDURE_RECORD_KINDS, procedureRecordsKey } from "@/lib/api/procedure-paths.ts";
import { countAttempt, discardEntry, entriesOf, markRefused } from "./outbox-store.ts";

/** How a round of sending ended: what the sender does next depends on it (use-outbox.ts). */
export type SendOutcome = "sent" | "no-connection" | "signed-out";

/**
 * Failures that say nothing about the entry itself — no connection, no answer in time, the
 * server busy or failing — leave it waiting, to be sent again under the same id (the server
 * stores it once). A session that has ended leaves it waiting for the same person to sign in.
 * Any other refusal (the visit was signed off meanwhile, a value a rule refuses) is the
 * server's answer on the entry: it is marked refused, with the reason, for the technician.
 */
function isRefusal(error: unknown): error is ApiError {
  return (
    error instanceof ApiError && error.status >= 400 && error.status < 500 && ![401, 408, 429].includes(error.status)
  );
}

let round: Promise<SendOutcome> | null = null;

/**
 * Sends one person's waiting entries in the order they were made, one at a time; a refused entry
 * does not hold back the ones after it. One round at a time: a call during a round gets that
 * round. The visits written to are fetched again afterwards.
 */
export function sendWaitingEntries(queryClient: QueryClient, userId: string): Promise<SendOutcome> {
  round ??= sendRound(queryClient, userId).finally(() => {
    round = null;
  });
  return round;
}

async function sendRound(queryClient: QueryClient, userId: string): Promise<SendOutcome> {
  const touched = new Set<string>();
  try {
    for (const entry of await entriesOf(userId)) {
      if (entry.state !== "waiting") continue;
      try {
        await apiRequest(
          entry.path,
          entry.file
            ? { method: "POST", body: formWithFile(entry.body, entry.file), timeoutMs: UPLOAD_TIMEOUT_MS }
            : { method: "POST", body: entry.body },
        );
        await discardEntry(entry.clientId);
        touched.add(entry.visitId);
      } catch (error) {
        if (isRefusal(error)) {
          await markRefused(entry, error.message, error.fields);
          continue;
        }
        await countAttempt(entry);
        return error instanceof ApiError && error.status === 401 ? "signed-out" : "no-connection";
      }
    }
    return "sent";
  } finally {
    for (const visitId of touched) {
      void queryClient.invalidateQueries({ queryKey: ["visits", "detail", visitId] });
      void queryClient.invalidateQueries({ queryKey: ["register", "visit", visitId] });
      for (const kind of PROCEDURE_RECORD_KINDS)
        void queryClient.invalidateQueries({ queryKey: procedureRecordsKey(kind, visitId) });
    }
    if (touched.size > 0) {
      void queryClient.invalidateQueries({ queryKey: ["visits", "list"] });
      // A reading may set a charge reference; an adjustment of charge moves a cylinder's contents.
      for (const kind of ["charge-references", "cylinders", "equipment"])
        void queryClient.invalidateQueries({ queryKey: [kind] });
    }
  }
}
