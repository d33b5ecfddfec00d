import { ChevronLeft, ChevronRight } from "lucide-react";
import { Button } from "@/components/ui/button/button.tsx";
import type { CursorPages } from "@/hooks/use-cursor-pages.ts";

/** What the controls read from the list's query: its page's cursor and whether a page is on its way. */
interface PagedQuery {
  data?: { nextCursor: string | null };
  /** A page is on its way (keepPreviousData): the buttons wait, the rows shown stay until it comes. */
  isPlaceholderData: boolean;
}

interface PageControlsProps {
  /** What the list holds, for the buttons' and the status's words ("visits", "units"). */
  noun: string;
  /** Where the list is (useCursorPages). */
  pages: CursorPages;
  /** The list's query for the page shown. */
  query: PagedQuery;
  /** Rows on the page shown. */
  shown: number;
}

/**
 * Previous and next page of a list the server pages, for every server-driven table (jobs,
 * equipment, the register): the cursor stack of useCursorPages on one side, the page's
 * `nextCursor` on the other. Large buttons (gloved hands on a roof), each naming what it does
 * for a screen reader, and the position said politely when it changes.
 */
export function PageControls({ noun, pages, query, shown }: PageControlsProps) {
  const nextCursor = query.data?.nextCursor ?? null;
  const loading = query.isPlaceholderData;
  if (pages.pageNumber === 1 && nextCursor === null) return null;
  return (
    <nav aria-label={`Pages of ${noun}`} className="flex flex-wrap items-center justify-between gap-3">
      <Button
        variant="secondary"
        size="lg"
        onClick={pages.previous}
        disabled={pages.pageNumber === 1 || loading}
        aria-label={`Previous page of ${noun}`}
      >
        <ChevronLeft aria-hidden className="size-5" /> Previous
      </Button>
      <p className="text-sm text-muted" aria-live="polite">
        {loading ? "Loading…" : `Page ${pages.pageNumber} · ${shown} ${noun}`}
      </p>
      <Button
        variant="secondary"
        size="lg"
        onClick={() => nextCursor && pages.next(nextCursor)}
        disabled={nextCursor === null || loading}
        aria-label={`Next page of ${noun}`}
      >
        Next <ChevronRight aria-hidden className="size-5" />
      </Button>
    </nav>
  );
}
