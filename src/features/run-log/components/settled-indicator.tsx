import { Hourglass, CircleCheck } from "lucide-react";
import type { TrendResult } from "@shared/schemas/diagnosis.ts";
import { cn } from "@/lib/cn.ts";
import { SourceNote } from "./source-note.tsx";

/** Settled or still moving, in words, with the rule it was judged by. */
export function SettledIndicator({ trend }: { trend: TrendResult | null }) {
  if (!trend) return null;
  const Icon = trend.settled ? CircleCheck : Hourglass;
  return (
    <div
      className={cn(
        "flex items-start gap-2 rounded-card border-2 p-3",
        trend.settled ? "border-good" : "border-caution",
      )}
      data-testid="settled-indicator"
    >
      <Icon aria-hidden className={cn("mt-0.5 size-6 shrink-0", trend.settled ? "text-good" : "text-caution")} />
      <div className="min-w-0 flex-1">
        <p className="font-semibold">{trend.settled ? "Settled" : "Still settling"}</p>
        <p className="text-sm">{trend.reason}</p>
        {/* The rule behind a tap, as on the evidence lines: the finding column stays short enough to stay in view. */}
        <SourceNote
          label="Rule"
          source={`change under ${trend.criterion.maxChangeK} K over ${trend.criterion.windowMinutes} min after at least ${trend.criterion.minRunMinutes} min of running (${trend.criterion.source})`}
        />
      </div>
    </div>
  );
}
