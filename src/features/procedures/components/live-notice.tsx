import { OctagonX, TriangleAlert } from "lucide-react";
import type { LiveNotice } from "@shared/engine/index.ts";
import { cn } from "@/lib/cn.ts";

/**
 * A check computed while typing, shown under the fields it is about: a caution to look again,
 * or a danger to stop. Words and icon shape carry the level, not colour alone (sunlight, print).
 */
export function LiveNoticeLine({
  notice,
  label,
  testId,
}: {
  notice: LiveNotice | null;
  label?: string;
  testId?: string;
}) {
  // The region stays mounted so screen readers announce the notice when it appears.
  return (
    <div aria-live="polite" data-testid={testId}>
      {notice && (
        <p
          data-level={notice.level}
          className={cn(
            "flex items-start gap-2 rounded-card border-2 bg-surface p-2 text-sm",
            notice.level === "danger" ? "border-fault" : "border-caution",
          )}
        >
          {notice.level === "danger" ? (
            <OctagonX aria-hidden className="mt-0.5 size-5 shrink-0 text-fault" strokeWidth={2.4} />
          ) : (
            <TriangleAlert aria-hidden className="mt-0.5 size-5 shrink-0 text-caution" strokeWidth={2.4} />
          )}
          <span>
            <span className="font-semibold">
              {notice.level === "danger" ? "Danger" : "Check"}
              {label ? ` (${label})` : ""}:
            </span>{" "}
            {notice.message} <span className="text-xs text-muted">Rule: {notice.source}</span>
          </span>
        </p>
      )}
    </div>
  );
}
