import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { OutboxList } from "@/features/outbox/components/outbox-list.tsx";
import { outboxQueryOptions } from "@/lib/api/outbox.ts";
import { loadQuery } from "@/lib/api/screen-data.ts";

/** The caught mail before the screen renders (it then refreshes itself: outboxQueryOptions). */
export const clientLoader = (queryClient: QueryClient) => () => loadQuery(queryClient, outboxQueryOptions());

function Mail() {
  return <OutboxList messages={useSuspenseQuery(outboxQueryOptions()).data} />;
}

export default function OutboxRoute() {
  return (
    <div className="space-y-6">
      <header>
        <h1 className="text-3xl font-semibold">Outbox</h1>
        <p className="mt-1 text-muted">
          Development only: mail caught by the built-in mail server instead of being delivered. Set SMTP_HOST to send
          real mail.
        </p>
      </header>
      <ScreenBoundary
        pending={<p>Loading mail…</p>}
        failed={(error) => (
          <p role="alert" className="font-medium text-fault">
            ⚠ {error.message}
          </p>
        )}
      >
        <Mail />
      </ScreenBoundary>
    </div>
  );
}
