import type { StandingPressureCheck } from "@shared/schemas/procedure-records.ts";
import type { StandingPressureResult } from "@shared/schemas/procedures.ts";
import {
  DIFFERENCE_LABEL,
  differenceToDisplay,
  formatNumber,
  GAUGE_LABEL,
  gaugeToDisplay,
  PRESSURE_DECIMALS,
  TEMPERATURE_LABEL,
  temperatureToDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { VerdictBadge, VerdictLine } from "./verdict-badge.tsx";
import { formatDateTime } from "@shared/format/date-time.ts";

/** The words a standing-pressure verdict is read as: the question the check answers is "air in it?". */
export const STANDING_PRESSURE_WORDS = { pass: "No air shown", warn: "Suspect", fail: "Non-condensables" } as const;

/** What a technician must know about a blend before trusting a pass. */
export const ZEOTROPE_NOTE =
  "Zeotropic blend: the standing pressure can sit anywhere between the dew and bubble pressures, so only a pressure above the bubble pressure shows air; a little air inside the glide can neither be shown nor ruled out.";

/** The judged figures of a standing-pressure check in the user's units: expected pressure and the excess. */
export function StandingPressureFigures({
  result,
  units,
  atmosphericKPa,
}: {
  result: StandingPressureResult;
  units: DisplayUnits;
  atmosphericKPa: number;
}) {
  const gauge = (kPa: number) =>
    `${formatNumber(gaugeToDisplay(kPa, units.pressure, atmosphericKPa), PRESSURE_DECIMALS[units.pressure])} ${GAUGE_LABEL[units.pressure]}`;
  const excess = differenceToDisplay(result.excessK, units.temperature);
  return (
    <dl className="num grid grid-cols-2 gap-x-4 gap-y-1 text-sm">
      <dt className="font-sans text-muted">{result.zeotrope ? "Expected (bubble)" : "Expected"}</dt>
      <dd data-testid="standing-expected">{gauge(result.expectedGaugeKPa)}</dd>
      {result.zeotrope && (
        <>
          <dt className="font-sans text-muted">Dew pressure</dt>
          <dd>{gauge(result.dewGaugeKPa)}</dd>
        </>
      )}
      <dt className="font-sans text-muted">Above the condenser</dt>
      <dd data-testid="standing-excess">
        {excess > 0 ? "+" : excess < 0 ? "−" : ""}
        {formatNumber(Math.abs(excess), 1)} {DIFFERENCE_LABEL[units.temperature]}
      </dd>
    </dl>
  );
}

/** One saved standing-pressure check: what was read, what was expected, the verdict with its reason and source. */
export function StandingPressureView({ check, units }: { check: StandingPressureCheck; units: DisplayUnits }) {
  const { input, result } = check;
  // The record keeps the atmosphere it was judged against; its gauge figures convert against that one.
  const atmosphere = input.atmosphericPressureKPa;
  const gauge = `${formatNumber(gaugeToDisplay(input.standingGaugeKPa, units.pressure, atmosphere), PRESSURE_DECIMALS[units.pressure])} ${GAUGE_LABEL[units.pressure]}`;
  const temperature = `${formatNumber(temperatureToDisplay(input.equalisedTempC, units.temperature), 1)} ${TEMPERATURE_LABEL[units.temperature]}`;
  return (
    <article
      aria-label="Standing-pressure check"
      className="space-y-2 rounded-card border-2 border-rule bg-surface p-3"
    >
      <header className="flex flex-wrap items-center gap-2">
        <h3 className="font-semibold">
          Standing pressure — {input.refrigerant}
          {input.circuit !== null && `, circuit ${input.circuit}`}
        </h3>
        <VerdictBadge verdict={result.verdict} word={STANDING_PRESSURE_WORDS[result.verdict]} />
        <span className="num text-sm text-muted">{formatDateTime(check.takenAt)}</span>
        {check.recordedBy && <span className="text-sm text-muted">· {check.recordedBy.name}</span>}
      </header>
      <p className="num text-sm">
        <span className="font-sans text-muted">Read:</span> {gauge} at {temperature}
      </p>
      <StandingPressureFigures result={result} units={units} atmosphericKPa={atmosphere} />
      <ul>
        <VerdictLine
          label="Non-condensables"
          verdict={result.verdict}
          word={STANDING_PRESSURE_WORDS[result.verdict]}
          reason={result.reason}
          source={result.source}
        />
      </ul>
      {result.zeotrope && <p className="text-sm text-muted">{ZEOTROPE_NOTE}</p>}
      {input.note && <p className="text-sm">Note: {input.note}</p>}
    </article>
  );
}
