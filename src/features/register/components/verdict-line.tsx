import { CircleAlert, CircleCheck, CircleX, type LucideIcon } from "lucide-react";
import type { Verdict } from "@shared/schemas/procedures.ts";
import { cn } from "@/lib/cn.ts";

const ICONS: Record<Verdict["verdict"], LucideIcon> = { pass: CircleCheck, warn: CircleAlert, fail: CircleX };
const WORDS: Record<Verdict["verdict"], string> = { pass: "Pass", warn: "Warning", fail: "Fail" };
const TONES: Record<Verdict["verdict"], string> = { pass: "text-good", warn: "text-caution", fail: "text-fault" };

/** A judged check as an icon, a word and its reason; colour is never the only signal. */
export function VerdictLine({
  result,
  showSource = true,
  testId,
}: {
  result: Verdict;
  showSource?: boolean;
  testId?: string;
}) {
  const Icon = ICONS[result.verdict];
  return (
    <div className="space-y-0.5" data-testid={testId}>
      <p className={cn("flex items-start gap-2 font-semibold", TONES[result.verdict])}>
        <Icon aria-hidden className="mt-0.5 size-5 shrink-0" />
        <span>
          {WORDS[result.verdict]}: <span className="font-normal text-ink">{result.reason}</span>
        </span>
      </p>
      {showSource && <p className="pl-7 text-sm text-muted">Source: {result.source}</p>}
    </div>
  );
}
