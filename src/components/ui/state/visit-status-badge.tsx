import { CircleCheck, Clock, PencilLine, Undo2, type LucideIcon } from "lucide-react";
import { VISIT_STATUS_LABELS, type VisitStatus } from "@shared/schemas/visits.ts";
import { cn } from "@/lib/cn.ts";

const ICONS: Record<VisitStatus, LucideIcon> = {
  open: PencilLine,
  "awaiting-review": Clock,
  "signed-off": CircleCheck,
  "sent-back": Undo2,
};

const TONES: Record<VisitStatus, string> = {
  open: "border-accent text-accent",
  "awaiting-review": "border-caution text-caution",
  "signed-off": "border-good text-good",
  "sent-back": "border-fault text-fault",
};

/** A visit's status as a word and an icon. */
export function VisitStatusBadge({ status, className }: { status: VisitStatus; className?: string }) {
  const Icon = ICONS[status];
  return (
    <span
      className={cn(
        "inline-flex items-center gap-1.5 rounded-md border-2 px-2 py-0.5 text-sm font-semibold",
        TONES[status],
        className,
      )}
    >
      <Icon aria-hidden className="size-4" />
      {VISIT_STATUS_LABELS[status]}
    </span>
  );
}
