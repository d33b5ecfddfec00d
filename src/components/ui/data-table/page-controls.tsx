import { ChevronLeft, ChevronRight } from "lucide-react";
import { Button } from "@/components/ui/button/button.tsx";

interface PageControlsProps {
  /** What the list holds, for the buttons' and the status's words ("visits", "units"). */
  noun: string;
  pageNumber: number;
  shown: number;
  hasNext: boolean;
  /** A page is on its way: the buttons wait, the rows shown stay until it comes. */
  loading: boolean;
  onPrevious: () => void;
  onNext: () => void;
}

/**
 * Previous and next page of a list the server pages. Large buttons (gloved hands on a roof),
 * each naming what it does for a screen reader, and the position said politely when it changes.
 */
export function PageControls({ noun, pageNumber, shown, hasNext, loading, onPrevious, onNext }: PageControlsProps) {
  if (pageNumber === 1 && !hasNext) return null;
  return (
    <nav aria-label={`Pages of ${noun}`} className="flex flex-wrap items-center justify-between gap-3">
      <Button variant="secondary" size="lg" onClick={onPrevious} disabled={pageNumber === 1 || loading} aria-label={`Previous page of ${noun}`}>
        <ChevronLeft aria-hidden className="size-5" /> Previous
      </Button>
      <p className="text-sm text-muted" aria-live="polite">
        {loading ? "Loading…" : `Page ${pageNumber} · ${shown} ${noun}`}
      </p>
      <Button variant="secondary" size="lg" onClick={onNext} disabled={!hasNext || loading} aria-label={`Next page of ${noun}`}>
        Next <ChevronRight aria-hidden className="size-5" />
      </Button>
    </nav>
  );
}
