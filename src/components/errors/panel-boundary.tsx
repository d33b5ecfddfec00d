import type { ReactNode } from "react";
import { ErrorBoundary, type FallbackProps } from "react-error-boundary";

function PanelFallback({ error, resetErrorBoundary }: FallbackProps) {
  return (
    <div role="alert" className="rounded-card border-2 border-fault bg-surface p-4">
      <p className="font-semibold text-fault">
        ⚠ This panel failed: {error instanceof Error ? error.message : String(error)}
      </p>
      <button
        type="button"
        onClick={resetErrorBoundary}
        className="mt-2 min-h-touch rounded-card border-2 border-rule px-4 font-medium"
      >
        Try again
      </button>
    </div>
  );
}

/** Wraps one panel that can fail alone, so a broken chart never takes the readings with it. */
export function PanelBoundary({ children }: { children: ReactNode }) {
  return <ErrorBoundary FallbackComponent={PanelFallback}>{children}</ErrorBoundary>;
}
