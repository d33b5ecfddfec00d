import type { ReactNode } from "react";

/** A report section that loads alone: heading, then its records, "none recorded", or the error. */
export function ReportSection({
  id,
  title,
  state,
  empty,
  children,
}: {
  id: string;
  title: string;
  state: { isPending: boolean; isError: boolean; error: Error | null };
  empty: boolean;
  children: ReactNode;
}) {
  return (
    <section aria-labelledby={`${id}-heading`} className="space-y-2 break-inside-avoid-page">
      <h2 id={`${id}-heading`} className="text-lg font-semibold">
        {title}
      </h2>
      {state.isPending ? (
        <p aria-busy="true" className="text-muted">
          Loading…
        </p>
      ) : state.isError ? (
        <p role="alert" className="font-medium text-fault">
          ⚠ Could not be loaded: {state.error?.message}
        </p>
      ) : empty ? (
        <p className="text-muted">None recorded.</p>
      ) : (
        children
      )}
    </section>
  );
}
