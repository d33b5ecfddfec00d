import { formatNumber } from "@/lib/units/display-units.ts";
import { applicationText } from "@shared/content/applications.ts";
import { Printer } from "lucide-react";
import { useState } from "react";
import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import { Link, useParams, type LoaderFunctionArgs } from "react-router-dom";
import {
  ADJUSTMENT_KIND_LABELS,
  isStanding,
  REPORT_LATEST_READINGS,
  VISIT_STATUS_LABELS,
  visitReasonText,
} from "@shared/schemas/visits.ts";
import { can } from "@shared/schemas/auth.ts";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { Button } from "@/components/ui/button/button.tsx";
import { VisitStatusBadge } from "@/components/ui/state/visit-status-badge.tsx";
import { paths } from "@/config/paths.ts";
import { ElectricalReport } from "@/features/procedures/components/electrical-report.tsx";
import { EvacuationReport } from "@/features/procedures/components/evacuation-report.tsx";
import { LeakSearchReport } from "@/features/procedures/components/leak-search-report.tsx";
import { StandingPressureReport } from "@/features/procedures/components/standing-pressure-report.tsx";
import { PressureTestReport } from "@/features/procedures/components/pressure-test-report.tsx";
import { RefrigerantReport } from "@/features/register/components/refrigerant-report.tsx";
import { ReadingsTable } from "@/features/report/components/readings-table.tsx";
import { SendReportForm } from "@/features/report/components/send-report-form.tsx";
import { FindingPanel } from "@/features/run-log/components/finding-panel.tsx";
import { MeasuredCyclePanel } from "@/features/run-log/components/measured-cycle-panel.tsx";
import { TrendChart } from "@/features/run-log/components/lazy-trend-chart.tsx";
import { circuitSeries } from "@/features/run-log/utils/circuit-series.ts";
import { AuditTrail } from "@/features/visit/components/audit-trail.tsx";
import { useMe } from "@/lib/api/auth.ts";
import { equipmentDetailQueryOptions } from "@/lib/api/equipment.ts";
import { loadVisitScreen } from "@/lib/api/screen-data.ts";
import { visitQueryOptions } from "@/lib/api/visits.ts";
import { useDisplayUnits } from "@/lib/units/use-display-units.ts";
import { formatDateTime, viewerTimeZone } from "@shared/format/date-time.ts";

/** Width that fits an A4 page inside its print margins at 96 px per inch (≈ 180 mm). */
/**
 * Charts are drawn at a fixed width so the printed page is laid out the same everywhere; on a
 * phone the same width would push the page sideways, so it shrinks to the screen there.
 */
const PRINT_CHART_WIDTH = 680;
const SCREEN_MARGIN_PX = 32;
const chartWidthFor = (viewportWidth: number) =>
  Math.max(280, Math.min(PRINT_CHART_WIDTH, viewportWidth - SCREEN_MARGIN_PX));

/** The visit, its unit and its refrigerant's table before the report renders (screen-data.ts). */
export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    loadVisitScreen(queryClient, params.visitId ?? "");

export default function VisitReportRoute() {
  const { visitId = "" } = useParams();
  return (
    <ScreenBoundary
      key={visitId}
      pending={<p aria-busy="true">Preparing the report…</p>}
      failed={(error) => (
        <p role="alert" className="font-medium text-fault">
          ⚠ The report could not be prepared: {error.message}
        </p>
      )}
    >
      <VisitReport visitId={visitId} />
    </ScreenBoundary>
  );
}

function VisitReport({ visitId }: { visitId: string }) {
  const { data } = useSuspenseQuery(visitQueryOptions(visitId));
  // The unit is asked for once the visit names it: never "/equipment/" with an empty id.
  const unit = useSuspenseQuery(equipmentDetailQueryOptions(data.equipmentId)).data.equipment;
  const me = useMe();
  const { units } = useDisplayUnits();
  const [chartWidth] = useState(() =>
    chartWidthFor(typeof window === "undefined" ? PRINT_CHART_WIDTH + SCREEN_MARGIN_PX : window.innerWidth),
  );
  const atmosphericKPa = data.atmosphere.pressureKPa;
  // Voided records are corrections: left out of the report, named in its audit trail.
  const adjustments = data.adjustments.filter(isStanding);

  return (
    <article className="report space-y-6" aria-label="Visit report">
      <div className="no-print flex flex-wrap items-center gap-3">
        <Link
          to={paths.visits.detail.getHref(data.id)}
          className="font-medium text-accent underline underline-offset-4"
        >
          ← Back to the visit
        </Link>
        <Button variant="secondary" onClick={() => window.print()}>
          <Printer aria-hidden className="size-5" /> Print or save as PDF
        </Button>
      </div>

      <header className="border-b-2 border-ink pb-3">
        <p className="text-sm uppercase tracking-wider text-muted">Service visit report</p>
        <h1 className="text-2xl font-semibold">{unit.name}</h1>
        <p>
          {data.customerName} · {data.siteName}
        </p>
        <p className="flex flex-wrap items-center gap-2 text-sm">
          <VisitStatusBadge status={data.status} /> Started {formatDateTime(data.startedAt)} ({viewerTimeZone()} time) ·
          Crew: {data.technicians.map((person) => person.name).join(", ") || "—"}
        </p>
        <p className="mt-1">
          <span className="font-medium">Reason:</span> {visitReasonText(data.reason)}
        </p>
      </header>

      <section aria-labelledby="nameplate-heading">
        <h2 id="nameplate-heading" className="text-lg font-semibold">
          Equipment
        </h2>
        <dl className="num mt-1 grid grid-cols-2 gap-x-6 text-sm sm:grid-cols-4">
          <dt className="font-sans text-muted">Refrigerant</dt>
          <dd>{unit.refrigerant}</dd>
          <dt className="font-sans text-muted">Application</dt>
          <dd className="font-sans">{applicationText[unit.application].label}</dd>
          <dt className="font-sans text-muted">Maker / model</dt>
          <dd>{[unit.maker, unit.model].filter(Boolean).join(" ") || "—"}</dd>
          <dt className="font-sans text-muted">Serial</dt>
          <dd>{unit.serial ?? "—"}</dd>
          <dt className="font-sans text-muted">Supply</dt>
          <dd>{unit.supplyVoltageV ? `${unit.supplyVoltageV} V ${unit.phases ?? ""}~` : "—"}</dd>
          {unit.circuits.map((circuit) => (
            <div key={circuit.number} className="contents">
              <dt className="font-sans text-muted">Circuit {circuit.number}</dt>
              <dd>
                {circuit.factoryChargeKg} kg, {circuit.meteringDevice.toUpperCase().replace("-", " ")}
              </dd>
            </div>
          ))}
        </dl>
      </section>

      {unit.circuits.map((circuit) => {
        const series = circuitSeries(data, circuit.number);
        const last = series.readings.at(-1);
        // Chosen by the server over the whole series (server/report/readings-that-matter.ts).
        const listed = { readings: series.keyReadings, leftOut: series.readingCount - series.keyReadings.length };
        return (
          <section key={circuit.number} aria-labelledby={`circuit-${circuit.number}-heading`} className="space-y-3">
            <h2 id={`circuit-${circuit.number}-heading`} className="text-lg font-semibold">
              Circuit {circuit.number}
            </h2>
            <ReadingsTable readings={listed.readings} units={units} atmosphericKPa={atmosphericKPa} />
            {listed.leftOut > 0 && (
              <p className="text-sm text-muted" data-testid="readings-left-out">
                {listed.readings.length} of {series.readingCount} readings listed: the first, those either side of each
                adjustment and the latest {REPORT_LATEST_READINGS}. The trend chart below draws the whole series.
              </p>
            )}
            {series.points.length > 0 && <TrendChart series={series} units={units} width={chartWidth} height={260} />}
            {last && (
              <p className="text-sm text-muted">
                Judged as {applicationText[last.result.application].label.toLowerCase()}
                {last.result.applicationBasis === "equipment" ? "" : " (assumed)"}; gauge readings against{" "}
                <span className="num">{formatNumber(last.result.atmosphericPressureKPa, 1)} kPa</span> atmosphere.
              </p>
            )}
            {last && (
              <MeasuredCyclePanel
                mode="report"
                input={last.input}
                previousInput={series.readings.at(-2)?.input ?? null}
                units={units}
                width={chartWidth}
              />
            )}
            {last && <FindingPanel result={last.result} variant="report" />}
          </section>
        );
      })}

      <section aria-labelledby="adjustments-heading">
        <h2 id="adjustments-heading" className="text-lg font-semibold">
          Adjustments and work done
        </h2>
        {adjustments.length === 0 ? (
          <p className="text-muted">None recorded.</p>
        ) : (
          <ul className="mt-1 space-y-1">
            {adjustments.map((adjustment) => (
              <li key={adjustment.id}>
                <span className="num text-muted">{formatDateTime(adjustment.at)}</span> —{" "}
                {ADJUSTMENT_KIND_LABELS[adjustment.kind]}
                {adjustment.circuit ? ` (circuit ${adjustment.circuit})` : ""}: {adjustment.description}
                {adjustment.amountKg != null && <span className="num"> · {adjustment.amountKg} kg</span>}
              </li>
            ))}
          </ul>
        )}
      </section>

      <ElectricalReport visitId={data.id} />
      <LeakSearchReport visitId={data.id} />
      <StandingPressureReport visitId={data.id} units={units} />
      <PressureTestReport visitId={data.id} units={units} atmosphericKPa={atmosphericKPa} />
      <EvacuationReport visitId={data.id} chartWidth={chartWidth} />
      <RefrigerantReport visitId={data.id} />

      {data.photos.length > 0 && (
        <section aria-labelledby="photos-heading" className="keep-together">
          <h2 id="photos-heading" className="text-lg font-semibold">
            Photos
          </h2>
          <div className="mt-1 grid grid-cols-3 gap-2">
            {data.photos.map((photo) => (
              <img
                key={photo.id}
                src={photo.thumbnailUrl}
                alt={`${photo.kind} photo`}
                className="w-full rounded-card border border-rule"
              />
            ))}
          </div>
        </section>
      )}

      <section aria-labelledby="signoff-heading" className="keep-together rounded-card border-2 border-ink p-4">
        <h2 id="signoff-heading" className="text-lg font-semibold">
          Sign-off
        </h2>
        {data.status === "signed-off" ? (
          <p>
            {VISIT_STATUS_LABELS["signed-off"]} by <strong>{data.signedOffBy?.name ?? "—"}</strong>
            {data.signedOffAt && ` on ${formatDateTime(data.signedOffAt)}`}
            {data.reviewNote && ` — “${data.reviewNote}”`}
          </p>
        ) : (
          <p>Not signed off yet ({VISIT_STATUS_LABELS[data.status].toLowerCase()}).</p>
        )}
      </section>

      <AuditTrail events={data.events} />

      {me.data && can(me.data.role, "writeRecords") && (
        <SendReportForm visitId={data.id} defaultTo={data.customerContactEmail} />
      )}
    </article>
  );
}
