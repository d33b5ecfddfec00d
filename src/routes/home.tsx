import { ChevronRight } from "lucide-react";
import { Link } from "react-router-dom";
import { can } from "@shared/schemas/auth.ts";
import type { Equipment } from "@shared/schemas/equipment.ts";
import { visitReasonText, type VisitSummary } from "@shared/schemas/visits.ts";
import { VisitStatusBadge } from "@/components/ui/state/visit-status-badge.tsx";
import { paths } from "@/config/paths.ts";
import { equipmentSearchText, matchesSearch } from "@/features/equipment/utils/nameplate-text.ts";
import { QuickStartVisit } from "@/features/jobs/components/quick-start-visit.tsx";
import { ResumeVisit } from "@/features/jobs/components/resume-visit.tsx";
import { visitToResume } from "@/features/jobs/utils/visit-to-resume.ts";
import { useMe } from "@/lib/api/auth.ts";
import { useVisits } from "@/lib/api/visits.ts";

/** Today's unit search is the equipment list's own, so a unit is found the same way everywhere. */
const unitMatches = (unit: Equipment, query: string) => matchesSearch(equipmentSearchText(unit), query);

function VisitLinks({ title, visits, empty }: { title: string; visits: VisitSummary[] | undefined; empty: string }) {
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
              <Link to={paths.visits.detail.getHref(visit.id)} className="flex min-h-touch items-center gap-3 py-2 hover:bg-sunken">
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
    </section>
  );
}

export default function HomeRoute() {
  const me = useMe();
  const open = useVisits({ status: "open" });
  const sentBack = useVisits({ status: "sent-back" });
  const reviewer = me.data ? can(me.data.role, "signOff") : false;
  const awaiting = useVisits({ status: "awaiting-review" });
  const inProgress = open.data && sentBack.data ? [...sentBack.data, ...open.data] : undefined;
  const resume = inProgress ? visitToResume(inProgress) : null;
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
      {(open.isError || awaiting.isError) && (
        <p role="alert" className="font-medium text-fault">
          ⚠ {(open.error ?? awaiting.error)?.message}
        </p>
      )}
      {resume && <ResumeVisit visit={resume} />}
      {writer && <QuickStartVisit matches={unitMatches} inProgress={inProgress} />}
      <VisitLinks title="Visits in progress" visits={inProgress} empty={writer ? "No open visits. Find a unit above to start one." : "No open visits."} />
      {reviewer && <VisitLinks title="Waiting for your review" visits={awaiting.data} empty="Nothing is waiting for review." />}
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
