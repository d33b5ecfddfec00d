import { CircleCheck, Hourglass } from "lucide-react";
import type { DiagnosisResult, TrendResult } from "@shared/schemas/diagnosis.ts";
import { ChargeStateBadge } from "@/components/ui/state/charge-state-badge.tsx";
import { DIFFERENCE_LABEL, formatNumber, type DisplayUnits } from "@/lib/units/display-units.ts";

interface LiveLineProps {
  /** The finding for the values as typed now; null while they are incomplete or invalid. */
  result: DiagnosisResult | null;
  trend: TrendResult | null;
  units: DisplayUnits;
  /** Scrolls to the full finding. */
  onOpen: () => void;
}

/**
 * The verdict in one line, kept in the sticky save bar so it stays in view while the fields
 * further down are typed: state, superheat and subcooling against their targets, settled or not.
 * It speaks only for the values on screen; while they are incomplete it says it waits.
 */
export function LiveLine({ result, trend, units, onOpen }: LiveLineProps) {
  const k = DIFFERENCE_LABEL[units.temperature];
  const scale = units.temperature === "F" ? 1.8 : 1;
  const value = (kelvin: number | null | undefined) => (kelvin == null ? "—" : formatNumber(kelvin * scale, 1));
  return (
    <button
      type="button"
      onClick={onOpen}
      className="flex min-h-touch w-full flex-wrap items-center gap-x-3 gap-y-1 text-left"
      data-testid="live-line"
      aria-label="Show the full finding"
    >
      {result ? (
        <>
          <ChargeStateBadge state={result.chargeState} short />
          <span className="num text-sm">
            SH {value(result.superheatK)}
            {result.targets.superheat && (
              <span className="text-muted"> /{value(result.targets.superheat.targetK)}</span>
            )}{" "}
            {k} · SC {value(result.subcoolingK)}
            {result.targets.subcooling && (
              <span className="text-muted"> /{value(result.targets.subcooling.targetK)}</span>
            )}{" "}
            {k}
          </span>
        </>
      ) : (
        <span className="text-sm font-medium">Waiting for the readings — no finding for these values yet</span>
      )}
      {trend && (
        <span className="inline-flex items-center gap-1 text-sm">
          {trend.settled ? (
            <CircleCheck aria-hidden className="size-4 text-good" />
          ) : (
            <Hourglass aria-hidden className="size-4 text-caution" />
          )}
          {trend.settled ? "settled" : "settling"}
        </span>
      )}
    </button>
  );
}
