import { Ban } from "lucide-react";
import type { ReactNode } from "react";
import type { VoidInfo } from "@shared/schemas/visits.ts";
import { cn } from "@/lib/cn.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

/** When and by whom a record was voided, and why, in one line. */
export function VoidNote({ voided }: { voided: NonNullable<VoidInfo> }) {
  return (
    <p className="flex items-start gap-2 text-sm font-medium" data-testid="void-note">
      <Ban aria-hidden className="mt-0.5 size-4 shrink-0" />
      <span>
        <span className="uppercase tracking-wide">Void</span>: {voided.reason} — {voided.by?.name ?? "a former member"},{" "}
        <span className="num">{formatDateTime(voided.at)}</span>
      </span>
    </p>
  );
}

/**
 * A record as it was written, struck through once voided, with the void's reason under it. The
 * word "Void" and the icon say it as well as the strike-through, so colour is never the only sign.
 */
export function VoidedRecord({
  voided,
  children,
  className,
}: {
  voided: VoidInfo;
  children: ReactNode;
  className?: string;
}) {
  if (!voided) return <div className={className}>{children}</div>;
  // The void comes first, so it is read before the record it corrects.
  return (
    <div className={cn("space-y-1", className)}>
      <VoidNote voided={voided} />
      {/* Struck through in the muted ink, not faded: a voided line must stay readable (WCAG AA contrast). */}
      <div className="text-muted line-through decoration-2" aria-label="Voided record">
        {children}
      </div>
    </div>
  );
}
