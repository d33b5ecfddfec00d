import { PencilLine } from "lucide-react";
import { useState } from "react";
import { chargeStateText } from "@shared/content/charge-states.ts";
import { ADJUSTMENT_KIND_LABELS, type Adjustment, type Reading } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { VisitVoidAction } from "@/features/visit/components/visit-void-action.tsx";
import { VoidedRecord } from "@/components/ui/void-record/voided-record.tsx";
import { useEarlierReadings } from "@/lib/api/visits.ts";
import {
  DIFFERENCE_LABEL,
  differenceToDisplay,
  formatNumber,
  GAUGE_LABEL,
  gaugeToDisplay,
  PRESSURE_DECIMALS,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { formatTime } from "@shared/format/date-time.ts";

/**
 * Entries drawn at first, newest first; "Show earlier entries" adds as many again, fetching the
 * page of older readings from the server once the held ones are all shown. A logged series
 * holds thousands of readings: drawing (or downloading) them all made the page slow to open on
 * a phone, and the one to void is nearly always among the latest.
 */
export const ENTRIES_PAGE = 50;

type Entry =
  { kind: "reading"; at: string; reading: Reading } | { kind: "adjustment"; at: string; adjustment: Adjustment };

interface RecordedEntriesProps {
  visitId: string;
  circuit: number;
  readings: readonly Reading[];
  /** Where the circuit's older readings go on from (circuitLogs' olderCursor); null when all are held. */
  olderCursor: string | null;
  /** Readings recorded on the circuit, voided ones included, held or not. */
  recordCount: number;
  adjustments: readonly Adjustment[];
  units: DisplayUnits;
  atmosphericKPa: number;
  canVoid: boolean;
}

/**
 * Every reading and adjustment recorded on this circuit, voided ones included (struck through
 * with their reason): the place to void a wrong entry, which then counts in nothing, and enter
 * it again.
 */
export function RecordedEntries({
  visitId,
  circuit,
  readings,
  olderCursor,
  recordCount,
  adjustments,
  units,
  atmosphericKPa,
  canVoid,
}: RecordedEntriesProps) {
  const earlier = useEarlierReadings();
  const [shown, setShown] = useState(ENTRIES_PAGE);
  const entries: Entry[] = [
    ...readings
      .filter((reading) => reading.circuit === circuit)
      .map((reading) => ({ kind: "reading" as const, at: reading.takenAt, reading })),
    ...adjustments
      .filter((adjustment) => adjustment.circuit === null || adjustment.circuit === circuit)
      .map((adjustment) => ({ kind: "adjustment" as const, at: adjustment.at, adjustment })),
  ].sort((a, b) => Date.parse(b.at) - Date.parse(a.at));
  if (entries.length === 0) return <p className="text-muted">Nothing recorded on this circuit yet.</p>;
  const k = DIFFERENCE_LABEL[units.temperature];
  const diff = (value: number | null) =>
    value === null ? "—" : formatNumber(differenceToDisplay(value, units.temperature), 1);
  const pressure = (kPa: number, atmosphere: number) =>
    `${formatNumber(gaugeToDisplay(kPa, units.pressure, atmosphere), PRESSURE_DECIMALS[units.pressure])} ${GAUGE_LABEL[units.pressure]}`;

  const heldReadings = entries.filter((entry) => entry.kind === "reading").length;
  // Entries held but not drawn, and readings on the server not held yet.
  const hidden = entries.length - shown + (olderCursor === null ? 0 : Math.max(0, recordCount - heldReadings));
  const showEarlier = async () => {
    // Held entries run out within the next page: fetch the older readings first.
    if (olderCursor !== null && entries.length - shown < ENTRIES_PAGE) {
      await earlier.mutateAsync({ visitId, circuit, before: olderCursor });
    }
    setShown((count) => count + ENTRIES_PAGE);
  };

  return (
    <div className="space-y-2">
      <ol
        aria-label={`Entries on circuit ${circuit}, newest first`}
        className="divide-y-2 divide-rule rounded-card border-2 border-rule bg-surface"
      >
        {entries.slice(0, shown).map((entry) => {
          const id = entry.kind === "reading" ? entry.reading.id : entry.adjustment.id;
          const voided = entry.kind === "reading" ? entry.reading.voided : entry.adjustment.voided;
          const what =
            entry.kind === "reading"
              ? `the reading of ${formatTime(entry.at)} on circuit ${circuit}`
              : `the adjustment of ${formatTime(entry.at)}`;
          return (
            <li key={id} className="flex flex-wrap items-start justify-between gap-2 p-3" data-testid={`entry-${id}`}>
              <VoidedRecord voided={voided} className="min-w-0 flex-1">
                {entry.kind === "reading" ? (
                  <p className="num">
                    <span className="font-sans font-semibold">{formatTime(entry.at)} reading</span> · suction{" "}
                    {pressure(
                      entry.reading.input.suctionPressureKPa,
                      entry.reading.input.atmosphericPressureKPa ?? atmosphericKPa,
                    )}
                    , liquid{" "}
                    {pressure(
                      entry.reading.input.liquidPressureKPa,
                      entry.reading.input.atmosphericPressureKPa ?? atmosphericKPa,
                    )}{" "}
                    · SH {diff(entry.reading.result.superheatK)} {k}, SC {diff(entry.reading.result.subcoolingK)} {k} ·{" "}
                    <span className="font-sans">{chargeStateText[entry.reading.result.chargeState].short}</span>
                    {entry.reading.recordedBy && (
                      <span className="font-sans text-muted"> · {entry.reading.recordedBy.name}</span>
                    )}
                  </p>
                ) : (
                  <p className="flex items-start gap-1">
                    <PencilLine aria-hidden className="mt-1 size-4 shrink-0" />
                    <span>
                      <span className="font-semibold">
                        {formatTime(entry.at)} {ADJUSTMENT_KIND_LABELS[entry.adjustment.kind].toLowerCase()}
                      </span>
                      : {entry.adjustment.description}
                      {entry.adjustment.amountKg != null && (
                        <span className="num"> ({entry.adjustment.amountKg} kg)</span>
                      )}
                    </span>
                  </p>
                )}
              </VoidedRecord>
              {canVoid && !voided && (
                <VisitVoidAction
                  visitId={visitId}
                  kind={entry.kind}
                  recordId={id}
                  what={what}
                  alsoVoids={
                    entry.kind === "adjustment" && entry.adjustment.movementId
                      ? "Its line in the refrigerant register is voided with it, with the same reason."
                      : undefined
                  }
                />
              )}
            </li>
          );
        })}
      </ol>
      {hidden > 0 && (
        <Button
          variant="secondary"
          disabled={earlier.isPending}
          onClick={() => void showEarlier().catch(() => undefined)}
        >
          {earlier.isPending
            ? "Loading earlier entries…"
            : `Show earlier entries (${Math.min(hidden, ENTRIES_PAGE)} of ${hidden} more)`}
        </Button>
      )}
      {earlier.isError && (
        <p role="alert" className="text-sm">
          The earlier entries could not be loaded: {earlier.error.message}
        </p>
      )}
    </div>
  );
}
