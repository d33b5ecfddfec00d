import { isStanding } from "@shared/schemas/visits.ts";
import { usePressureTests } from "@/lib/api/procedures.ts";
import type { DisplayUnits } from "@/lib/units/display-units.ts";
import { PressureTestView } from "./pressure-test-view.tsx";
import { ReportSection } from "./report-section.tsx";

/** The visit report's nitrogen pressure test section. */
export function PressureTestReport({
  visitId,
  units,
  atmosphericKPa,
}: {
  visitId: string;
  units: DisplayUnits;
  atmosphericKPa: number;
}) {
  const tests = usePressureTests(visitId);
  // Voided records are corrections: the report leaves them out (the audit trail names them).
  const list = (tests.data?.pressureTests ?? []).filter(isStanding);
  return (
    <ReportSection id="pressure-report" title="Nitrogen pressure test" state={tests} empty={list.length === 0}>
      {list.map((test) => (
        <PressureTestView key={test.id} test={test} units={units} atmosphericKPa={atmosphericKPa} />
      ))}
    </ReportSection>
  );
}
