import { ListFilter } from "lucide-react";
import { VISIT_STATUSES, type VisitStatus } from "@shared/schemas/visits.ts";
import { VisitStatusBadge } from "@/components/ui/state/visit-status-badge.tsx";
import { cn } from "@/lib/cn.ts";

/** Narrows the jobs list to one status; each choice carries the status's word and icon. */
export function StatusFilter({
  value,
  onChange,
}: {
  value: VisitStatus | null;
  onChange: (status: VisitStatus | null) => void;
}) {
  const choices: (VisitStatus | null)[] = [null, ...VISIT_STATUSES];
  return (
    <div role="radiogroup" aria-label="Show visits that are" className="flex flex-wrap gap-2">
      {choices.map((status) => {
        const checked = status === value;
        return (
          <button
            key={status ?? "all"}
            type="button"
            role="radio"
            aria-checked={checked}
            onClick={() => onChange(status)}
            className={cn(
              "inline-flex min-h-touch items-center gap-2 rounded-card border-2 px-2 font-medium",
              checked ? "border-ink bg-sunken ring-2 ring-ink" : "border-rule bg-surface hover:border-ink",
            )}
          >
            {status ? (
              <VisitStatusBadge status={status} className="border-0 px-0" />
            ) : (
              <span className="inline-flex items-center gap-1.5 px-1 text-sm font-semibold">
                <ListFilter aria-hidden className="size-4" /> All visits
              </span>
            )}
          </button>
        );
      })}
    </div>
  );
}
