import { MutationCache, QueryCache, QueryClient } from "@tanstack/react-query";
import { toastError } from "@/components/ui/toaster/toaster.tsx";
import { ApiError } from "./api-client.ts";

/** Client and server errors will not change on retry; only network and 5xx failures are retried. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/**
 * The app's single QueryClient. Background refetch failures surface as a toast; a query
 * whose data is on screen keeps showing it, and components render their own error states.
 */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        // Offline, the bar at the top already says so; the screen keeps what it shows.
        if (query.state.data !== undefined && (typeof navigator === "undefined" || navigator.onLine))
          toastError(`Could not refresh: ${error.message}`);
      },
    }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _context, mutation) => {
        // Forms show field errors themselves; a toast covers everything else.
        if (mutation.options.meta?.silentErrors) return;
        // A write the outbox keeps when there is no connection: the form says it was kept.
        if (mutation.options.meta?.keptOffline && error instanceof ApiError && error.status === 0) return;
        if (error instanceof ApiError && Object.keys(error.fields).length > 0) return;
        toastError(error.message);
      },
    }),
    defaultOptions: {
      queries: { staleTime: 30_000, retry: shouldRetry, refetchOnWindowFocus: true },
      // A write is sent at once and fails at once without a connection: TanStack's default
      // ("online") would hold it silently and send it minutes later, stamped with the
      // reconnect time. The form keeps the values and says it was not saved.
      mutations: { retry: false, networkMode: "always" },
    },
  });
}

declare module "@tanstack/react-query" {
  interface Register {
    mutationMeta: { silentErrors?: boolean; keptOffline?: boolean };
  }
}
