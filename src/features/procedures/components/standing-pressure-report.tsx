import { isStanding } from "@shared/schemas/visits.ts";
import type { DisplayUnits } from "@/lib/units/display-units.ts";
import { useStandingPressureChecks } from "@/lib/api/procedures.ts";
import { ReportSection } from "./report-section.tsx";
import { StandingPressureView } from "./standing-pressure-view.tsx";

/** The visit report's standing-pressure section: each standing check with its verdict, reason and source. */
export function StandingPressureReport({ visitId, units }: { visitId: string; units: DisplayUnits }) {
  const checks = useStandingPressureChecks(visitId);
  // Voided records are corrections: the report leaves them out (the audit trail names them).
  const list = (checks.data?.standingPressureChecks ?? []).filter(isStanding);
  return (
    <ReportSection id="standing-pressure-report" title="Standing pressure" state={checks} empty={list.length === 0}>
      {list.map((check) => (
        <StandingPressureView key={check.id} check={check} units={units} />
      ))}
    </ReportSection>
  );
}
