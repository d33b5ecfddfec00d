import { PencilLine } from "lucide-react";
import { useLayoutEffect, useRef } from "react";
import { chargeStateText } from "@shared/content/charge-states.ts";
import { CHARGE_STATE_ICONS } from "@/components/ui/state/charge-state-badge.tsx";
import { DIFFERENCE_LABEL, differenceToDisplay, formatNumber, type DisplayUnits } from "@/lib/units/display-units.ts";
import type { CircuitSeries } from "../utils/circuit-series.ts";
import { formatTime } from "@shared/format/date-time.ts";

const STRIP_LENGTH = 8;

type Entry =
  | { kind: "reading"; at: string; reading: CircuitSeries["readings"][number] }
  | { kind: "adjustment"; at: string; adjustment: CircuitSeries["adjustments"][number] };

/** The last readings and adjustments side by side, newest on the right. */
export function TimelineStrip({ series, units }: { series: CircuitSeries; units: DisplayUnits }) {
  const k = DIFFERENCE_LABEL[units.temperature];
  const strip = useRef<HTMLOListElement>(null);
  const entries: Entry[] = [
    ...series.readings.map((reading) => ({ kind: "reading" as const, at: reading.takenAt, reading })),
    ...series.adjustments.map((adjustment) => ({ kind: "adjustment" as const, at: adjustment.at, adjustment })),
  ]
    .sort((a, b) => Date.parse(a.at) - Date.parse(b.at))
    .slice(-STRIP_LENGTH);
  const newest = entries.at(-1)?.at;
  // Open at the newest entry (the right end) whenever one is added: that is the one looked for.
  useLayoutEffect(() => {
    const list = strip.current;
    if (list) list.scrollLeft = list.scrollWidth;
  }, [newest]);
  if (entries.length === 0)
    return <p className="text-muted">No readings yet: the first one you save starts the timeline.</p>;
  const diff = (value: number | null) =>
    value === null ? "—" : formatNumber(differenceToDisplay(value, units.temperature), 1);

  return (
    // A strip that scrolls sideways takes the keyboard focus, so arrow keys can scroll it.
    <ol
      ref={strip}
      tabIndex={0}
      aria-label="Latest readings and adjustments"
      className="flex gap-2 overflow-x-auto pb-2"
    >
      {entries.map((entry) =>
        entry.kind === "reading" ? (
          <li key={entry.reading.id} className="num min-w-28 rounded-card border-2 border-rule bg-surface p-2 text-sm">
            <p className="font-sans text-xs text-muted">{formatTime(entry.at)}</p>
            <p>
              SH <strong>{diff(entry.reading.result.superheatK)}</strong> {k}
            </p>
            <p>
              SC <strong>{diff(entry.reading.result.subcoolingK)}</strong> {k}
            </p>
            <p className="mt-1 flex items-center gap-1 font-sans text-xs">
              {(() => {
                const Icon = CHARGE_STATE_ICONS[entry.reading.result.chargeState];
                return <Icon aria-hidden className="size-3.5" />;
              })()}
              {chargeStateText[entry.reading.result.chargeState].short}
            </p>
          </li>
        ) : (
          <li
            key={entry.adjustment.id}
            className="min-w-32 rounded-card border-2 border-dashed border-ink bg-sunken p-2 text-sm"
          >
            <p className="text-xs text-muted">{formatTime(entry.at)}</p>
            <p className="flex items-start gap-1 font-medium">
              <PencilLine aria-hidden className="mt-0.5 size-4 shrink-0" />
              {entry.adjustment.description}
            </p>
          </li>
        ),
      )}
    </ol>
  );
}
