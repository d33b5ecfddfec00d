import {
  LEAK_METHOD_LABELS,
  LEAK_SEVERITY_LABELS,
  RECHECK_LABELS,
  type LeakSearch,
} from "@shared/schemas/procedure-records.ts";
import { VerdictBadge, VerdictLine } from "./verdict-badge.tsx";
import { formatDateTime } from "@shared/format/date-time.ts";

/** One saved leak search: method, places, each leak with its repair, the recheck and the verdict. */
export function LeakSearchView({ search }: { search: LeakSearch }) {
  const { input, result } = search;
  return (
    <article aria-label="Leak search" className="rounded-card border-2 border-rule bg-surface p-3">
      <header className="flex flex-wrap items-center gap-2">
        <h3 className="font-semibold">Leak search — {LEAK_METHOD_LABELS[input.method]}</h3>
        <VerdictBadge verdict={result.verdict} />
        <span className="num text-sm text-muted">{formatDateTime(search.takenAt)}</span>
        {search.recordedBy && <span className="text-sm text-muted">· {search.recordedBy.name}</span>}
      </header>
      <p className="mt-1 text-sm">
        <span className="text-muted">Checked:</span> {input.placesChecked.join("; ")}
      </p>
      {input.leaks.length === 0 ? (
        <p className="text-sm">No leak found.</p>
      ) : (
        <ul className="mt-1 list-disc pl-6 text-sm" aria-label="Leaks found">
          {input.leaks.map((leak, index) => (
            <li key={index}>
              <span className="font-medium">{leak.location}</span> — {LEAK_SEVERITY_LABELS[leak.severity]};{" "}
              {leak.repaired ? `repaired${leak.repair ? `: ${leak.repair}` : ""}` : "not repaired"}
            </li>
          ))}
        </ul>
      )}
      <p className="text-sm">
        <span className="text-muted">Recheck:</span> {RECHECK_LABELS[input.recheck]}
      </p>
      <ul className="mt-1">
        <VerdictLine label="Fit to evacuate" verdict={result.verdict} reason={result.reason} source={result.source} />
      </ul>
      {input.note && <p className="mt-1 text-sm">Note: {input.note}</p>}
    </article>
  );
}
