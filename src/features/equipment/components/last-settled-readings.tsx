import { Hourglass } from "lucide-react";
import type { EquipmentDetail } from "@shared/schemas/equipment-detail.ts";
import { ChargeStateBadge } from "@/components/ui/state/charge-state-badge.tsx";
import {
  DIFFERENCE_LABEL,
  TEMPERATURE_DECIMALS,
  TEMPERATURE_LABEL,
  differenceToDisplay,
  formatNumber,
  temperatureToDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

type Settled = EquipmentDetail["lastSettled"][number];

function Value({ label, value }: { label: string; value: string | null }) {
  return (
    <div>
      <dt className="text-sm text-muted">{label}</dt>
      <dd className="num text-xl font-semibold">
        {value ?? <span className="text-base font-normal text-muted">not measured</span>}
      </dd>
    </div>
  );
}

/**
 * Each circuit's last reading taken once the unit had settled (judged by the same trend rule as
 * the run log), so the page answers "how was it running when we left it".
 */
export function LastSettledReadings({
  lastSettled,
  units,
}: {
  lastSettled: EquipmentDetail["lastSettled"];
  units: DisplayUnits;
}) {
  const temperature = (celsius: number | null) =>
    celsius == null
      ? null
      : `${formatNumber(temperatureToDisplay(celsius, units.temperature), TEMPERATURE_DECIMALS)} ${TEMPERATURE_LABEL[units.temperature]}`;
  const difference = (kelvin: number | null) =>
    kelvin == null
      ? null
      : `${formatNumber(differenceToDisplay(kelvin, units.temperature), 1)} ${DIFFERENCE_LABEL[units.temperature]}`;

  return (
    <ul className="grid gap-3 sm:grid-cols-2">
      {lastSettled.map((entry: Settled) => (
        <li key={entry.circuit} className="space-y-3 rounded-card border-2 border-rule bg-surface p-4">
          <h3 className="flex flex-wrap items-baseline justify-between gap-2 font-semibold">
            <span>Circuit {entry.circuit}</span>
            {entry.takenAt && (
              <span className="num text-sm font-normal text-muted">{formatDateTime(entry.takenAt)}</span>
            )}
          </h3>
          {entry.result ? (
            <>
              <ChargeStateBadge state={entry.result.chargeState} />
              <dl className="grid grid-cols-2 gap-3">
                <Value label="Evaporating (dew)" value={temperature(entry.result.evaporatingTempC)} />
                <Value label="Condensing (bubble)" value={temperature(entry.result.condensingTempC)} />
                <Value label="Superheat" value={difference(entry.result.superheatK)} />
                <Value label="Subcooling" value={difference(entry.result.subcoolingK)} />
              </dl>
            </>
          ) : (
            <p className="flex items-center gap-2 text-muted">
              <Hourglass aria-hidden className="size-5 shrink-0" />
              No settled reading yet
            </p>
          )}
        </li>
      ))}
    </ul>
  );
}
