import { ChevronRight } from "lucide-react";

/**
 * The rule or source behind one line, folded behind a small tap: closed, it shows the start of
 * the citation cut to one line, so the evidence stays one short line each; opened, all of it.
 */
export function SourceNote({ source, label = "Source" }: { source: string; label?: string }) {
  return (
    <details className="group text-xs text-muted">
      <summary className="flex min-h-touch max-w-full cursor-pointer list-none items-center gap-1 [&::-webkit-details-marker]:hidden">
        <ChevronRight aria-hidden className="size-4 shrink-0 transition-transform group-open:rotate-90" />
        <span className="font-medium text-ink underline underline-offset-2">{label}</span>
        <span aria-hidden className="min-w-0 truncate group-open:hidden">
          {source}
        </span>
      </summary>
      <p className="pb-2 pl-5">{source}</p>
    </details>
  );
}
