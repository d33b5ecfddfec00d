import { isStanding } from "@shared/schemas/visits.ts";
import { useLeakSearches } from "@/lib/api/procedures.ts";
import { LeakSearchView } from "./leak-search-view.tsx";
import { ReportSection } from "./report-section.tsx";

/** The visit report's leak search section. */
export function LeakSearchReport({ visitId }: { visitId: string }) {
  const searches = useLeakSearches(visitId);
  // Voided records are corrections: the report leaves them out (the audit trail names them).
  const list = (searches.data?.leakSearches ?? []).filter(isStanding);
  return (
    <ReportSection id="leak-report" title="Leak search" state={searches} empty={list.length === 0}>
      {list.map((search) => (
        <LeakSearchView key={search.id} search={search} />
      ))}
    </ReportSection>
  );
}
