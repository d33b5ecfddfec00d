import { ChevronRight } from "lucide-react";
import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import { Link } from "react-router-dom";
import { can } from "@shared/schemas/auth.ts";
import { visitReasonText } from "@shared/schemas/visits.ts";
import { VisitStatusBadge } from "@/components/ui/state/visit-status-badge.tsx";
import { paths } from "@/config/paths.ts";
import { QuickStartVisit } from "@/features/jobs/components/quick-start-visit.tsx";
import { ResumeVisit } from "@/features/jobs/components/resume-visit.tsx";
import { visitToResume } from "@/features/jobs/utils/visit-to-resume.ts";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { meQueryOptions, useMe } from "@/lib/api/auth.ts";
import { loadQuery } from "@/lib/api/screen-data.ts";
import { MY_OPEN_VISITS, OPEN_VISITS_FIRST_PAGE, visitsQueryOptions } from "@/lib/api/visits.ts";

/** Today lists a short first page of each kind; the jobs page holds the rest. */
const SHORT_LIST = 10;

/** Today's short lists; the review list is a reviewer's only. */
const IN_PROGRESS = visitsQueryOptions(OPEN_VISITS_FIRST_PAGE);
// The visit to resume is among those the person is on the crew of (they join it by recording).
const OWN = visitsQueryOptions(MY_OPEN_VISITS);
const AWAITING_REVIEW = visitsQueryOptions({ status: "awaiting-review", limit: SHORT_LIST });
type VisitsQuery = typeof IN_PROGRESS;

/** Today's lists before the screen renders (the person's role says whether the review list is one). */
export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await loadQuery(queryClient, meQueryOptions());
  const reviewer = me ? can(me.role, "signOff") : false;
  await Promise.all(
    [IN_PROGRESS, OWN, ...(reviewer ? [AWAITING_REVIEW] : [])].map((query) => loadQuery(queryClient, query)),
  );
  return null;
};

/** Each list fails alone, in the words Today used for any of them. */
const listFailed = (error: Error) => (
  <p role="alert" className="font-medium text-fault">
    ⚠ {error.message}
  </p>
);

function VisitLinks({ title, query, empty, more }: { title: string; query: VisitsQuery; empty: string; more: string }) {
  return (
    <section aria-label={title} className="rounded-card border-2 border-rule bg-surface p-4">
      <h2 className="text-lg font-semibold">{title}</h2>
      <ScreenBoundary pending={<p className="mt-1 text-muted">Loading…</p>} failed={listFailed}>
        <VisitLinkList query={query} empty={empty} more={more} />
      </ScreenBoundary>
    </section>
  );
}

function VisitLinkList({ query, empty, more }: { query: VisitsQuery; empty: string; more: string }) {
  const { visits, nextCursor } = useSuspenseQuery(query).data;
  return (
    <>
      {visits.length === 0 ? (
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
      {nextCursor && (
        <Link
          to={more}
          className="mt-2 inline-flex min-h-touch items-center gap-1 font-medium text-accent underline underline-offset-4"
        >
          See all on the jobs page <ChevronRight aria-hidden className="size-5" />
        </Link>
      )}
    </>
  );
}

/** The open visit the person was last on, if any. */
function Resume() {
  const resume = visitToResume(useSuspenseQuery(OWN).data.visits);
  return resume && <ResumeVisit visit={resume} />;
}

export default function HomeRoute() {
  const me = useMe();
  const reviewer = me.data ? can(me.data.role, "signOff") : false;
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
      <ScreenBoundary pending={null} failed={listFailed}>
        <Resume />
      </ScreenBoundary>
      {writer && <QuickStartVisit />}
      <VisitLinks
        title="Visits in progress"
        query={IN_PROGRESS}
        empty={writer ? "No open visits. Find a unit above to start one." : "No open visits."}
        more={paths.jobs.getHref()}
      />
      {reviewer && (
        <VisitLinks
          title="Waiting for your review"
          query={AWAITING_REVIEW}
          empty="Nothing is waiting for review."
          more={paths.jobs.getHref("awaiting-review")}
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
