import { ChevronRight } from "lucide-react";
import { Link } from "react-router-dom";
import { visitReasonText, type VisitSummary } from "@shared/schemas/visits.ts";
import { VisitStatusBadge } from "@/components/ui/state/visit-status-badge.tsx";
import { paths } from "@/config/paths.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

/** A short list of one unit's visits, newest first, each a link to its run log. */
export function VisitList({ visits }: { visits: readonly VisitSummary[] }) {
  if (visits.length === 0) {
    return (
      <p className="rounded-card border-2 border-dashed border-rule p-4 text-center">No visits to this unit yet.</p>
    );
  }
  const newestFirst = [...visits].sort((a, b) => Date.parse(b.startedAt) - Date.parse(a.startedAt));
  return (
    <ul className="divide-y-2 divide-rule overflow-hidden rounded-card border-2 border-rule bg-surface">
      {newestFirst.map((visit) => (
        <li key={visit.id}>
          <Link
            to={paths.visits.detail.getHref(visit.id)}
            className="flex min-h-touch items-center gap-3 p-3 hover:bg-sunken"
          >
            <span className="min-w-0 flex-1 space-y-1">
              <span className="flex flex-wrap items-center gap-2">
                <span className="num font-semibold">{formatDateTime(visit.startedAt)}</span>
                <VisitStatusBadge status={visit.status} />
              </span>
              <span className="block">{visitReasonText(visit.reason)}</span>
              <span className="block text-sm text-muted">
                <span className="num">{visit.readingCount}</span> {visit.readingCount === 1 ? "reading" : "readings"}
                {visit.technicians.length > 0 && ` · ${visit.technicians.map((person) => person.name).join(", ")}`}
              </span>
            </span>
            <ChevronRight aria-hidden className="size-5 shrink-0 text-muted" />
          </Link>
        </li>
      ))}
    </ul>
  );
}
