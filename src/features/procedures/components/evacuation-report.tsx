import { isStanding } from "@shared/schemas/visits.ts";
import { useEvacuations } from "@/lib/api/procedures.ts";
import { EvacuationChart } from "./lazy-evacuation-chart.tsx";
import { EvacuationSummary } from "./evacuation-view.tsx";
import { ReportSection } from "./report-section.tsx";
import { formatDateTime } from "@shared/format/date-time.ts";

/** The visit report's evacuation section: each evacuation's chart and decay verdict, in microns. */
export function EvacuationReport({ visitId, chartWidth }: { visitId: string; chartWidth: number }) {
  const evacuations = useEvacuations(visitId);
  // Voided records are corrections: the report leaves them out (the audit trail names them).
  const list = (evacuations.data?.evacuations ?? []).filter(isStanding);
  return (
    <ReportSection
      id="evacuation-report"
      title="Evacuation and decay test"
      state={evacuations}
      empty={list.length === 0}
    >
      {list.map((evacuation) => (
        <article
          key={evacuation.id}
          aria-label="Evacuation"
          className="space-y-2 rounded-card border-2 border-rule bg-surface p-3"
        >
          <h3 className="font-semibold">
            Started {formatDateTime(evacuation.startedAt)}
            {evacuation.recordedBy && <span className="font-normal text-muted"> · {evacuation.recordedBy.name}</span>}
          </h3>
          <EvacuationSummary evacuation={evacuation} unit="micron" />
          <EvacuationChart evacuation={evacuation} unit="micron" width={chartWidth} height={240} />
          {evacuation.note && <p className="text-sm">Note: {evacuation.note}</p>}
        </article>
      ))}
    </ReportSection>
  );
}
