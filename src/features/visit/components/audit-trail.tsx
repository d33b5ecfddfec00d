import { History } from "lucide-react";
import { VISIT_EVENT_LABELS, type VisitEvent } from "@shared/schemas/visits.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

/**
 * The visit's audit trail: who did what to the record, when and why — review steps,
 * reopening, voids and imports, oldest first. Shown on the visit page and in the report.
 */
export function AuditTrail({ events, headingLevel = 2 }: { events: readonly VisitEvent[]; headingLevel?: 2 | 3 }) {
  const Heading = `h${headingLevel}` as const;
  return (
    <section
      aria-labelledby="audit-trail-heading"
      className="space-y-2 rounded-card border-2 border-rule bg-surface p-4"
    >
      <Heading id="audit-trail-heading" className="flex items-center gap-2 text-lg font-semibold">
        <History aria-hidden className="size-5" /> Audit trail
      </Heading>
      {events.length === 0 ? (
        <p className="text-muted">Nothing recorded yet.</p>
      ) : (
        <ol className="space-y-2">
          {events.map((event) => (
            <li key={event.id} className="border-l-4 border-rule pl-3" data-testid="audit-event">
              <p>
                <span className="font-semibold">{VISIT_EVENT_LABELS[event.action]}</span>
                {event.action !== "started" && event.summary !== VISIT_EVENT_LABELS[event.action] && (
                  <> — {event.summary}</>
                )}
              </p>
              {event.reason && <p>Reason: {event.reason}</p>}
              <p className="text-sm text-muted">
                {event.actor?.name ?? "A former member"} · <span className="num">{formatDateTime(event.at)}</span>
              </p>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
