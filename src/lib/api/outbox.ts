import { queryOptions, useQuery } from "@tanstack/react-query";
import { OutboxResponseSchema, type OutboxMessage } from "@shared/schemas/outbox.ts";
import { apiRequest } from "./api-client.ts";

export async function getOutbox(signal?: AbortSignal): Promise<OutboxMessage[]> {
  return (await apiRequest("/outbox", { schema: OutboxResponseSchema, signal })).messages;
}

/** Only owners in development get an answer; anyone else's query fails with 403 or 404. */
export const outboxQueryOptions = () =>
  queryOptions({
    queryKey: ["outbox", "list"],
    queryFn: ({ signal }) => getOutbox(signal),
    // New mail arrives while the page is open (an invitation sent from another tab).
    refetchInterval: 5_000,
    retry: false,
  });

/** Whether this server has an outbox for this user (owners, development mail server); asked once per session. */
export const outboxAvailableQueryOptions = () =>
  queryOptions({
    queryKey: ["outbox", "available"],
    queryFn: async ({ signal }) => {
      try {
        await getOutbox(signal);
        return true;
      } catch {
        return false;
      }
    },
    staleTime: Infinity,
  });

export const useOutboxAvailable = (enabled: boolean) => useQuery({ ...outboxAvailableQueryOptions(), enabled });
