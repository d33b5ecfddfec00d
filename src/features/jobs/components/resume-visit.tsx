import { ChevronRight, PlayCircle } from "lucide-react";
import { Link } from "react-router-dom";
import { visitReasonText, type VisitSummary } from "@shared/schemas/visits.ts";
import { paths } from "@/config/paths.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

/**
 * One big target straight into the run log of the visit the technician was last working on:
 * back on the roof after a call or a ladder trip, that is the first thing they want.
 */
export function ResumeVisit({ visit }: { visit: VisitSummary }) {
  return (
    <Link
      to={paths.visits.detail.getHref(visit.id)}
      className="flex min-h-touch items-center gap-3 rounded-card bg-accent p-4 text-accent-ink hover:brightness-110"
      data-testid="resume-visit"
    >
      <PlayCircle aria-hidden className="size-10 shrink-0" />
      <span className="min-w-0 flex-1">
        <span className="block text-sm font-semibold uppercase tracking-wider">Resume</span>
        <span className="block text-2xl font-semibold">{visit.equipmentName}</span>
        <span className="block truncate">
          {visit.customerName} · {visit.siteName}
        </span>
        <span className="block truncate">{visitReasonText(visit.reason)}</span>
        <span className="block text-sm">
          {visit.yourLastActivityAt && <>You last worked on it {formatDateTime(visit.yourLastActivityAt)} · </>}
          <span className="num">{visit.readingCount}</span> {visit.readingCount === 1 ? "reading" : "readings"}
        </span>
      </span>
      <ChevronRight aria-hidden className="size-8 shrink-0" />
    </Link>
  );
}
