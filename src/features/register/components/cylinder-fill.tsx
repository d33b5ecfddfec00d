import type { Cylinder } from "@shared/schemas/register.ts";
import { cn } from "@/lib/cn.ts";
import { formatKg } from "../utils/format-register.ts";
import { VerdictLine } from "./verdict-line.tsx";

/** A cylinder's contents against its 80 % liquid limit, as a bar with figures and the verdict. */
export function CylinderFillBar({ cylinder, compact = false }: { cylinder: Cylinder; compact?: boolean }) {
  const { fill } = cylinder;
  // Supplier-filled cylinders are not judged against the recovery limit: contents only.
  const limit = cylinder.kind === "recovery" ? fill.maxContentsKg : null;
  const share = limit ? Math.min(1, cylinder.contentsKg / limit) : 0;
  const tone = fill.check?.verdict === "fail" ? "bg-fault" : fill.check?.verdict === "warn" ? "bg-caution" : "bg-good";
  return (
    <div className="space-y-1" data-testid={`cylinder-fill-${cylinder.label}`}>
      <p className="num text-sm">
        {formatKg(cylinder.contentsKg)}{" "}
        {limit !== null && (
          <>
            of {formatKg(limit)} limit ({Math.round((cylinder.contentsKg / limit) * 100)} %)
          </>
        )}{" "}
        · gross {formatKg(cylinder.grossKg)}
      </p>
      {limit !== null && (
        <div className="h-3 overflow-hidden rounded-full border-2 border-rule bg-sunken" aria-hidden>
          <div className={cn("h-full", tone)} style={{ width: `${share * 100}%` }} />
        </div>
      )}
      {fill.check && (!compact || fill.check.verdict !== "pass") && (
        <VerdictLine result={fill.check} showSource={!compact} />
      )}
      {fill.note && !compact && <p className="text-sm text-muted">{fill.note}</p>}
    </div>
  );
}
