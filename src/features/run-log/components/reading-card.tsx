import type { ReactNode } from "react";
import { useId } from "react";
import { cn } from "@/lib/cn.ts";

interface ReadingCardProps {
  step: number;
  title: string;
  /** Where on the circuit, in words: "evaporator outlet". */
  where: string;
  side?: "low side" | "high side";
  children: ReactNode;
  /** The computed line: saturation counterpart, derived value, target. */
  derived?: ReactNode;
}

/** One stop on the refrigerant's way round the circuit: what was measured there and what it means. */
export function ReadingCard({ step, title, where, side, children, derived }: ReadingCardProps) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="@container rounded-card border-2 border-rule bg-surface">
      <header className="flex flex-wrap items-baseline gap-x-3 gap-y-1 border-b-2 border-rule px-4 py-2">
        <span
          aria-hidden
          className="num flex size-7 items-center justify-center rounded-full border-2 border-ink text-sm font-semibold"
        >
          {step}
        </span>
        <h3 id={headingId} className="text-lg font-semibold">
          {title}
        </h3>
        <span className="text-sm text-muted">{where}</span>
        {side && (
          <span
            className={cn(
              "ml-auto text-xs font-semibold uppercase tracking-wider",
              side === "low side" ? "text-low" : "text-high",
            )}
          >
            {side}
          </span>
        )}
      </header>
      {/* Two fields a row only when the card itself is wide enough for a gauge pressure with its
          unit and sign button: beside the tablet's finding column the card is narrow. */}
      <div className="grid gap-3 p-4 @lg:grid-cols-2">{children}</div>
      {/* Marked so the run log can keep this line above its save bar while a field is typed. */}
      {derived && (
        <div data-derived className="border-t-2 border-dashed border-rule px-4 py-3">
          {derived}
        </div>
      )}
    </section>
  );
}

/** A computed value on a card's derived line: name, number, unit, and optional target beside it. */
export function Derived({
  label,
  value,
  unit,
  target,
  testId,
}: {
  label: string;
  value: string | null;
  unit: string;
  target?: string;
  testId?: string;
}) {
  return (
    <div className="flex flex-wrap items-baseline gap-x-2">
      <span className="text-muted">{label}</span>
      <span className="num text-2xl font-semibold" data-testid={testId}>
        {value ?? "—"}
      </span>
      {value !== null && <span className="num text-muted">{unit}</span>}
      {target && <span className="text-sm text-muted">· {target}</span>}
    </div>
  );
}
