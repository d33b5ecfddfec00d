import { isStanding } from "@shared/schemas/visits.ts";
import { useElectricalChecks } from "@/lib/api/procedures.ts";
import { ElectricalCheckView } from "./electrical-check-view.tsx";
import { ReportSection } from "./report-section.tsx";

/** The visit report's electrical section: every check, each judged. */
export function ElectricalReport({ visitId }: { visitId: string }) {
  const checks = useElectricalChecks(visitId);
  // Voided records are corrections: the report leaves them out (the audit trail names them).
  const list = (checks.data?.electricalChecks ?? []).filter(isStanding);
  return (
    <ReportSection id="electrical-report" title="Electrical checks" state={checks} empty={list.length === 0}>
      {list.map((check) => (
        <ElectricalCheckView key={check.id} check={check} />
      ))}
    </ReportSection>
  );
}
