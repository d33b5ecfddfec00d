import { Play, X } from "lucide-react";
import { useState } from "react";
import type { QueryClient } from "@tanstack/react-query";
import { useNavigate, useSearchParams, type LoaderFunctionArgs } from "react-router-dom";
import { can } from "@shared/schemas/auth.ts";
import { VisitStatusSchema, type VisitStatus } from "@shared/schemas/visits.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { Button } from "@/components/ui/button/button.tsx";
import { paths } from "@/config/paths.ts";
import { firstVisitsPage, JobsTable } from "@/features/jobs/components/jobs-table.tsx";
import { StartVisitForm } from "@/features/jobs/components/start-visit-form.tsx";
import { StatusFilter } from "@/features/jobs/components/status-filter.tsx";
import { useMe } from "@/lib/api/auth.ts";
import { loadQuery } from "@/lib/api/screen-data.ts";
import { visitsQueryOptions } from "@/lib/api/visits.ts";

const EMPTY_TEXT: Record<VisitStatus | "all", string> = {
  all: "No visits yet. Start one from here or from a unit's page.",
  open: "No open visits.",
  "awaiting-review": "Nothing is waiting for review.",
  "signed-off": "No visit has been signed off yet.",
  "sent-back": "No visit has been sent back.",
};

/** The table's first page for the status in the address (the table pages and searches itself). */
export const clientLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) =>
    loadQuery(queryClient, visitsQueryOptions(firstVisitsPage(statusIn(new URL(request.url).searchParams))));

/** The status filter in the address; anything else is every status. */
function statusIn(params: URLSearchParams): VisitStatus | null {
  const parsed = VisitStatusSchema.safeParse(params.get("status"));
  return parsed.success ? parsed.data : null;
}

export default function JobsRoute() {
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const status = statusIn(params);
  const [starting, setStarting] = useState(false);
  const mayWrite = me.data ? can(me.data.role, "writeRecords") : false;
  const reviewing = status === "awaiting-review" && me.data != null && can(me.data.role, "signOff");

  return (
    <div className="space-y-6">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-3xl font-semibold">{reviewing ? "Review" : "Jobs"}</h1>
          <p className="mt-1 text-muted">
            {reviewing
              ? "Visits technicians have submitted for sign-off: read the run log, comment, then sign off or send back."
              : "Visits across all your equipment, newest first."}
          </p>
        </div>
        {mayWrite && !starting && (
          <Button onClick={() => setStarting(true)}>
            <Play aria-hidden className="size-5" /> Start a visit
          </Button>
        )}
      </header>

      {starting && (
        <section
          aria-labelledby="start-heading"
          className="space-y-3 rounded-card border-2 border-accent bg-surface p-4"
        >
          <div className="flex items-center justify-between gap-2">
            <h2 id="start-heading" className="text-xl font-semibold">
              Start a visit
            </h2>
            <Button variant="quiet" onClick={() => setStarting(false)} aria-label="Close start a visit">
              <X aria-hidden className="size-5" />
            </Button>
          </div>
          <PanelBoundary>
            <StartVisitForm onStarted={(visit) => void navigate(paths.visits.detail.getHref(visit.id))} />
          </PanelBoundary>
        </section>
      )}

      <StatusFilter value={status} onChange={(next) => setParams(next ? { status: next } : {}, { replace: true })} />

      <PanelBoundary>
        <JobsTable
          status={status}
          empty={
            <p className="rounded-card border-2 border-dashed border-rule p-6 text-center">
              {EMPTY_TEXT[status ?? "all"]}
            </p>
          }
        />
      </PanelBoundary>
    </div>
  );
}
