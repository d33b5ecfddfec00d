import { CircleCheck, OctagonX, TriangleAlert, type LucideIcon } from "lucide-react";
import type { VerdictLevel } from "@shared/schemas/procedures.ts";
import { cn } from "@/lib/cn.ts";

/** Each verdict has its own word and its own icon shape, so it reads without colour and in print. */
export const VERDICT_TEXT: Record<VerdictLevel, { word: string; icon: LucideIcon; tone: string }> = {
  pass: { word: "Pass", icon: CircleCheck, tone: "text-good border-good" },
  warn: { word: "Check", icon: TriangleAlert, tone: "text-caution border-caution" },
  fail: { word: "Fail", icon: OctagonX, tone: "text-fault border-fault" },
};

export function VerdictBadge({
  verdict,
  word,
  className,
}: {
  verdict: VerdictLevel;
  word?: string;
  className?: string;
}) {
  const text = VERDICT_TEXT[verdict];
  return (
    <span
      data-verdict={verdict}
      className={cn(
        "inline-flex shrink-0 items-center gap-1.5 rounded-md border-2 px-2 py-0.5 font-semibold",
        text.tone,
        className,
      )}
    >
      <text.icon aria-hidden className="size-4 shrink-0" strokeWidth={2.4} />
      <span>{word ?? text.word}</span>
    </span>
  );
}

/** One judged check: what it is, the verdict, the figure, the reason and where the limit comes from. */
export function VerdictLine({
  label,
  verdict,
  figure,
  reason,
  source,
  word,
}: {
  label: string;
  verdict: VerdictLevel;
  figure?: string;
  reason: string;
  source: string;
  word?: string;
}) {
  return (
    <li className="flex flex-col gap-1 border-t border-rule py-2 first:border-t-0 sm:flex-row sm:items-start sm:gap-3">
      <VerdictBadge verdict={verdict} word={word} className="self-start" />
      <div className="min-w-0">
        <p>
          <span className="font-medium">{label}</span>
          {figure && <span className="num"> · {figure}</span>} — {reason}
        </p>
        <p className="text-xs text-muted">Limit: {source}</p>
      </div>
    </li>
  );
}

/** The headline verdict of a record, large, with its reason and source. */
export function VerdictPanel({
  title,
  verdict,
  word,
  reason,
  source,
  testId,
}: {
  title: string;
  verdict: VerdictLevel;
  word?: string;
  reason: string;
  source: string;
  testId?: string;
}) {
  const text = VERDICT_TEXT[verdict];
  return (
    <section
      aria-label={title}
      aria-live="polite"
      className={cn("rounded-card border-2 bg-surface p-4", text.tone.split(" ")[1])}
    >
      <div className="flex items-start gap-3">
        <text.icon aria-hidden className={cn("mt-0.5 size-8 shrink-0", text.tone.split(" ")[0])} strokeWidth={2.4} />
        <div className="min-w-0">
          <h3 className="text-xl font-semibold" data-testid={testId}>
            {title}: {word ?? text.word}
          </h3>
          <p className="mt-1">{reason}</p>
          <p className="mt-1 text-xs text-muted">Source: {source}</p>
        </div>
      </div>
    </section>
  );
}
