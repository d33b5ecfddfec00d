import { ChevronRight } from "lucide-react";
import { Link } from "react-router-dom";
import { can } from "@shared/schemas/auth.ts";
import { visitReasonText, type VisitSummary } from "@shared/schemas/visits.ts";
import { VisitStatusBadge } from "@/components/ui/state/visit-status-badge.tsx";
import { paths } from "@/config/paths.ts";
import { QuickStartVisit } from "@/features/jobs/components/quick-start-visit.tsx";
import { ResumeVisit } from "@/features/jobs/components/resume-visit.tsx";
import { visitToResume } from "@/features/jobs/utils/visit-to-resume.ts";
import { useMe } from "@/lib/api/auth.ts";
import { MY_OPEN_VISITS, OPEN_VISITS_FIRST_PAGE, useVisits } from "@/lib/api/visits.ts";

/** Today lists a short first page of each kind; the jobs page holds the rest. */
const SHORT_LIST = 10;

function VisitLinks({
  title,
  visits,
  empty,
  more,
}: {
  title: string;
  visits: VisitSummary[] | undefined;
  empty: string;
  more: { shown: boolean; href: string };
}) {
  return (
    <section aria-label={title} className="rounded-card border-2 border-rule bg-surface p-4">
      <h2 className="text-lg font-semibold">{title}</h2>
      {visits === undefined ? (
        <p className="mt-1 text-muted">Loading…</p>
      ) : visits.length === 0 ? (
        <p className="mt-1 text-muted">{empty}</p>
      ) : (
        <ul className="mt-2 divide-y-2 divide-rule">
          {visits.map((visit) => (
            <li key={visit.id}>
              <Link
                to={paths.visits.detail.getHref(visit.id)}
                className="flex min-h-touch items-center gap-3 py-2 hover:bg-sunken"
              >
                <div className="min-w-0 flex-1">
                  <p className="font-medium">{visit.equipmentName}</p>
                  <p className="truncate text-sm text-muted">
                    {visit.customerName} · {visitReasonText(visit.reason)}
                  </p>
                </div>
                <VisitStatusBadge status={visit.status} />
                <ChevronRight aria-hidden className="size-5 shrink-0" />
              </Link>
            </li>
          ))}
        </ul>
      )}
      {more.shown && (
        <Link
          to={more.href}
          className="mt-2 inline-flex min-h-touch items-center gap-1 font-medium text-accent underline underline-offset-4"
        >
          See all on the jobs page <ChevronRight aria-hidden className="size-5" />
        </Link>
      )}
    </section>
  );
}

export default function HomeRoute() {
  const me = useMe();
  const inProgress = useVisits(OPEN_VISITS_FIRST_PAGE);
  // The visit to resume is among those the person is on the crew of (they join it by recording).
  const own = useVisits(MY_OPEN_VISITS);
  const reviewer = me.data ? can(me.data.role, "signOff") : false;
  const awaiting = useVisits({ status: "awaiting-review", limit: SHORT_LIST }, { enabled: reviewer });
  const resume = own.data ? visitToResume(own.data.visits) : null;
  const writer = me.data ? can(me.data.role, "writeRecords") : false;

  return (
    <div className="space-y-5">
      <header>
        <h1 className="text-3xl font-semibold">Today</h1>
        <p className="mt-1 max-w-prose text-muted">
          Readings in, saturation out: enter gauge pressures and line temperatures at the unit and Satura works out
          superheat, subcooling and what the circuit is telling you — and keeps the visit as a record.
        </p>
      </header>
      {(inProgress.isError || own.isError || awaiting.isError) && (
        <p role="alert" className="font-medium text-fault">
          ⚠ {(inProgress.error ?? own.error ?? awaiting.error)?.message}
        </p>
      )}
      {resume && <ResumeVisit visit={resume} />}
      {writer && <QuickStartVisit />}
      <VisitLinks
        title="Visits in progress"
        visits={inProgress.data?.visits}
        empty={writer ? "No open visits. Find a unit above to start one." : "No open visits."}
        more={{ shown: Boolean(inProgress.data?.nextCursor), href: paths.jobs.getHref() }}
      />
      {reviewer && (
        <VisitLinks
          title="Waiting for your review"
          visits={awaiting.data?.visits}
          empty="Nothing is waiting for review."
          more={{ shown: Boolean(awaiting.data?.nextCursor), href: paths.jobs.getHref("awaiting-review") }}
        />
      )}
      <section className="rounded-card border-2 border-caution bg-surface p-4">
        <h2 className="font-semibold">Before you open a panel or a valve</h2>
        <p className="mt-1">
          Isolation, flammable refrigerants, nitrogen testing and recovery cylinders: read the{" "}
          <Link to={paths.safety.getHref()} className="font-medium text-accent underline underline-offset-4">
            safety notes
          </Link>
          .
        </p>
      </section>
    </div>
  );
}
