import { CautionLine } from "@/components/ui/caution-panel/caution-line.tsx";
import { applicationText } from "@shared/content/applications.ts";
import { FileText, Lock, Undo2 } from "lucide-react";
import { useState, type ReactNode } from "react";
import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import { Link, useParams, useSearchParams, type LoaderFunctionArgs } from "react-router-dom";
import { getRefrigerant } from "@shared/engine/index.ts";
import { can } from "@shared/schemas/auth.ts";
import { acceptsEntries, closedVisitMessage, visitReasonText } from "@shared/schemas/visits.ts";
import { canCasebook } from "@shared/schemas/casebook-permissions.ts";
import { circuitFacts } from "@shared/schemas/circuit-facts.ts";
import { safetyClasses } from "@shared/content/safety-classes.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { ScreenFailed } from "@/components/errors/screen-failed.tsx";
import { lazyPanel } from "@/components/lazy/lazy-panel.tsx";
import { Segmented } from "@/components/ui/field/segmented.tsx";
import { VisitStatusBadge } from "@/components/ui/state/visit-status-badge.tsx";
import { paths } from "@/config/paths.ts";
import { RunLog } from "@/features/run-log/components/run-log.tsx";
import { ROLE_READ_ONLY_NOTE } from "@/features/procedures/utils/read-only-note.ts";
import { CautionPanel } from "@/components/ui/caution-panel/caution-panel.tsx";
import { useMe } from "@/lib/api/auth.ts";
import { useChargeReferences } from "@/lib/api/charge-references.ts";
import { equipmentDetailQueryOptions } from "@/lib/api/equipment.ts";
import { loadVisitScreen } from "@/lib/api/screen-data.ts";
import { visitQueryOptions } from "@/lib/api/visits.ts";
import { useDisplayUnits } from "@/lib/units/use-display-units.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

// Sections other than the run log, and the senior's case-from-reading, load when first shown.
const ElectricalPanel = lazyPanel(
  () => import("@/features/procedures/components/electrical-panel.tsx"),
  "ElectricalPanel",
);
const LeakSearchPanel = lazyPanel(
  () => import("@/features/procedures/components/leak-search-panel.tsx"),
  "LeakSearchPanel",
);
const StandingPressurePanel = lazyPanel(
  () => import("@/features/procedures/components/standing-pressure-panel.tsx"),
  "StandingPressurePanel",
);
const PressureTestPanel = lazyPanel(
  () => import("@/features/procedures/components/pressure-test-panel.tsx"),
  "PressureTestPanel",
);
const EvacuationPanel = lazyPanel(
  () => import("@/features/procedures/components/evacuation-panel.tsx"),
  "EvacuationPanel",
);
const VisitRefrigerant = lazyPanel(
  () => import("@/features/register/components/visit-refrigerant.tsx"),
  "VisitRefrigerant",
);
const CaseFromReading = lazyPanel(
  () => import("@/features/casebook/components/case-from-reading.tsx"),
  "CaseFromReading",
);
// The panels below the visit's section: fetched once the first screen is drawn with its data, so
// that on a slow link they never hold up the run log and its finding.
const belowTheSection = { afterFirstScreen: true };
const ReviewPanel = lazyPanel(
  () => import("@/features/visit/components/review-panel.tsx"),
  "ReviewPanel",
  belowTheSection,
);
const CommentsPanel = lazyPanel(
  () => import("@/features/visit/components/comments-panel.tsx"),
  "CommentsPanel",
  belowTheSection,
);
const PhotosPanel = lazyPanel(
  () => import("@/features/visit/components/photos-panel.tsx"),
  "PhotosPanel",
  belowTheSection,
);
const AuditTrail = lazyPanel(
  () => import("@/features/visit/components/audit-trail.tsx"),
  "AuditTrail",
  belowTheSection,
);

const METERING_LABELS = { txv: "TXV", eev: "EEV", "fixed-orifice": "fixed orifice", capillary: "capillary" } as const;

/** The visit, its unit and its refrigerant's table before the screen renders (screen-data.ts). */
export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    loadVisitScreen(queryClient, params.visitId ?? "");

export default function VisitRoute() {
  const { visitId = "" } = useParams();
  return (
    // Keyed by the visit: another visit's page starts afresh, a failed one is not carried over.
    <ScreenBoundary
      key={visitId}
      pending={<p aria-busy="true">Loading the visit…</p>}
      failed={(error, retry) => (
        <ScreenFailed
          title="This visit could not be opened"
          error={error}
          retry={retry}
          back={{ to: paths.jobs.getHref(), label: "Back to jobs" }}
        />
      )}
    >
      <VisitScreen visitId={visitId} />
    </ScreenBoundary>
  );
}

// A failed refresh of a visit on screen is a toast (query-client.ts), and the run log, with what
// is being typed, stays: a suspense query throws only when it has nothing to show.
function VisitScreen({ visitId }: { visitId: string }) {
  const { data } = useSuspenseQuery(visitQueryOptions(visitId));
  // The unit is asked for once the visit names it: never "/equipment/" with an empty id.
  const unit = useSuspenseQuery(equipmentDetailQueryOptions(data.equipmentId)).data.equipment;
  // Optional: the run log judges without the circuit's reference point until it comes.
  const chargeReferences = useChargeReferences(data.equipmentId);
  const me = useMe();
  const { units } = useDisplayUnits();
  const [circuit, setCircuit] = useState(1);
  const [searchParams, setSearchParams] = useSearchParams();

  const role = me.data?.role ?? "apprentice";
  // Entries and voids only while the visit is open or sent back; awaiting review and signed off are closed.
  const open = acceptsEntries(data.status);
  const canWrite = can(role, "writeRecords") && open;
  const readOnlyNote = open ? ROLE_READ_ONLY_NOTE : closedVisitMessage(data.status);
  // The site's atmosphere (from the server), for every gauge pressure on this visit.
  const atmosphericKPa = data.atmosphere.pressureKPa;
  const nameplate = unit.circuits.find((candidate) => candidate.number === circuit) ?? unit.circuits[0]!;
  const refrigerant = getRefrigerant(unit.refrigerant);
  const caution = safetyClasses[refrigerant.safety.class].caution;
  // The circuit's correct charge and reference point, as the server diagnoses with them.
  const circuitCharge = chargeReferences.data?.circuits.find((candidate) => candidate.circuit === nameplate.number);

  // The visit's sections: one line each, shown one at a time (?section= keeps the choice on reload).
  const sections: { id: string; label: string; element: ReactNode }[] = [
    {
      id: "run-log",
      label: "Run log",
      element: (
        <div className="space-y-4">
          {unit.circuits.length > 1 && (
            <Segmented<string>
              label="Circuit"
              value={String(circuit)}
              onChange={(value) => setCircuit(Number(value))}
              options={unit.circuits.map((candidate) => ({
                value: String(candidate.number),
                label: `Circuit ${candidate.number}`,
              }))}
            />
          )}
          <p className="text-sm text-muted">
            {applicationText[unit.application].label} · Circuit {nameplate.number}:{" "}
            {METERING_LABELS[nameplate.meteringDevice]}, factory charge{" "}
            <span className="num">{nameplate.factoryChargeKg} kg</span>
            {nameplate.targetSuperheatK != null && (
              <>
                {" "}
                · target superheat <span className="num">{nameplate.targetSuperheatK} K</span>
              </>
            )}
            {nameplate.targetSubcoolingK != null && (
              <>
                {" "}
                · target subcooling <span className="num">{nameplate.targetSubcoolingK} K</span>
              </>
            )}
          </p>
          {unit.kind === "packaged rooftop" && <CautionLine topic="height" />}

          <PanelBoundary>
            <RunLog
              key={`${data.id}-${nameplate.number}`}
              visit={data}
              circuit={nameplate.number}
              context={circuitFacts(unit, nameplate, {
                chargeKg: circuitCharge?.correctChargeKg ?? null,
                chargeReference: circuitCharge?.current?.values ?? null,
              })}
              isBlend={refrigerant.kind === "blend"}
              units={units}
              atmosphere={data.atmosphere}
              canWrite={canWrite}
              readOnlyNote={readOnlyNote}
            />
          </PanelBoundary>
        </div>
      ),
    },
    {
      id: "electrical",
      label: "Electrical",
      element: (
        <ElectricalPanel
          visitId={data.id}
          circuits={unit.circuits.map((candidate) => candidate.number)}
          canWrite={canWrite}
          readOnlyNote={readOnlyNote}
        />
      ),
    },
    {
      id: "leak-search",
      label: "Leak search",
      element: <LeakSearchPanel visitId={data.id} canWrite={canWrite} readOnlyNote={readOnlyNote} />,
    },
    {
      id: "standing-pressure",
      label: "Standing pressure",
      element: (
        <StandingPressurePanel
          visitId={data.id}
          refrigerant={unit.refrigerant}
          isBlend={refrigerant.kind === "blend"}
          circuits={unit.circuits.map((candidate) => candidate.number)}
          units={units}
          atmosphericKPa={atmosphericKPa}
          canWrite={canWrite}
          readOnlyNote={readOnlyNote}
        />
      ),
    },
    {
      id: "pressure-test",
      label: "Pressure test",
      element: (
        <PressureTestPanel
          visitId={data.id}
          units={units}
          atmosphericKPa={atmosphericKPa}
          canWrite={canWrite}
          readOnlyNote={readOnlyNote}
        />
      ),
    },
    { id: "evacuation", label: "Evacuation", element: <EvacuationPanel visitId={data.id} canWrite={canWrite} /> },
    {
      id: "refrigerant",
      label: "Refrigerant",
      element: <VisitRefrigerant visitId={data.id} unit={unit} circuit={nameplate.number} canWrite={canWrite} />,
    },
  ];
  const activeSection = sections.find((section) => section.id === searchParams.get("section")) ?? sections[0]!;

  return (
    <div className="space-y-5">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to={paths.jobs.getHref()} className="text-accent underline underline-offset-4">
          Jobs
        </Link>{" "}
        /{" "}
        <Link to={paths.equipment.detail.getHref(unit.id)} className="text-accent underline underline-offset-4">
          {unit.name}
        </Link>
      </nav>
      <header className="space-y-1">
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-semibold">{unit.name}</h1>
          <VisitStatusBadge status={data.status} />
        </div>
        <p className="text-muted">
          {data.customerName} · {data.siteName} · <span className="num">{unit.refrigerant}</span> · started{" "}
          {formatDateTime(data.startedAt)}
        </p>
        <p>
          <span className="font-medium">Reason:</span> {visitReasonText(data.reason)}
        </p>
        <Link
          to={paths.visits.report.getHref(data.id)}
          className="inline-flex min-h-touch items-center gap-2 font-medium text-accent underline underline-offset-4"
        >
          <FileText aria-hidden className="size-5" /> Visit report
        </Link>
      </header>

      {!open && (
        <div
          role="status"
          className="flex items-start gap-3 rounded-card border-2 border-ink bg-surface p-4"
          data-testid="visit-closed"
        >
          <Lock aria-hidden className="mt-0.5 size-5 shrink-0" />
          <div>
            <p className="font-semibold">{closedVisitMessage(data.status)}.</p>
            {can(role, "signOff") && (
              <p className="text-sm">To correct it, reopen it with a reason in the Review panel below.</p>
            )}
          </div>
        </div>
      )}

      {data.status === "sent-back" && (
        <div
          role="alert"
          className="flex items-start gap-3 rounded-card border-2 border-caution bg-surface p-4"
          data-testid="sent-back-note"
        >
          <Undo2 aria-hidden className="mt-0.5 size-5 shrink-0 text-caution" />
          <div>
            <p className="font-semibold">Sent back by the reviewer</p>
            <p>{data.reviewNote ?? "No reason was given; see the comments."}</p>
            <p className="text-sm text-muted">
              Record what was asked for, then submit for review again (Review panel below).
            </p>
          </div>
        </div>
      )}

      {caution && <CautionPanel topic={caution} compact />}

      <Segmented<string>
        label="Visit section"
        value={activeSection.id}
        onChange={(id) => setSearchParams({ section: id }, { replace: true })}
        options={sections.map(({ id, label }) => ({ value: id, label }))}
        className="flex flex-wrap"
      />
      <PanelBoundary key={activeSection.id}>{activeSection.element}</PanelBoundary>

      <div className="grid gap-4 lg:grid-cols-2">
        <PanelBoundary>
          <ReviewPanel visit={data} canSubmit={can(role, "writeRecords")} canSignOff={can(role, "signOff")} />
        </PanelBoundary>
        <PanelBoundary>
          <CommentsPanel visit={data} canComment={can(role, "writeRecords") && data.status !== "signed-off"} />
        </PanelBoundary>
      </div>
      <PanelBoundary>
        <PhotosPanel visit={data} canUpload={canWrite} />
      </PanelBoundary>
      <PanelBoundary>
        <AuditTrail events={data.events} />
      </PanelBoundary>
      {canCasebook(role, "author") && (
        <PanelBoundary>
          <CaseFromReading readings={data.readings} />
        </PanelBoundary>
      )}
    </div>
  );
}
