import { QueryErrorResetBoundary } from "@tanstack/react-query";
import { Suspense, type ReactNode } from "react";
import { ErrorBoundary } from "react-error-boundary";

/**
 * Around a screen (or one of its panels) that reads its data with `useSuspenseQuery`: `pending`
 * while the data is on its way (the route's loader normally has it already; offline without a
 * kept copy it waits for the signal), `failed` in the screen's own words when it could not be
 * had. `retry` fetches again: inside the reset boundary a failed query is not asked again on
 * mount (the loader's answer is shown as it came) until the person asks.
 */
export function ScreenBoundary({
  pending,
  failed,
  children,
}: {
  pending: ReactNode;
  failed: (error: Error, retry: () => void) => ReactNode;
  children: ReactNode;
}) {
  return (
    <QueryErrorResetBoundary>
      {({ reset }) => (
        <ErrorBoundary
          onReset={reset}
          fallbackRender={({ error, resetErrorBoundary }) =>
            failed(error instanceof Error ? error : new Error(String(error)), resetErrorBoundary)
          }
        >
          <Suspense fallback={pending}>{children}</Suspense>
        </ErrorBoundary>
      )}
    </QueryErrorResetBoundary>
  );
}
