import { PRESSURE_TEST_SECTION_LABELS, type PressureTest } from "@shared/schemas/procedure-records.ts";
import {
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

/** One saved nitrogen test: the test pressure against the rating, then the temperature-corrected hold. */
export function PressureTestView({
  test,
  units,
  atmosphericKPa,
}: {
  test: PressureTest;
  units: DisplayUnits;
  atmosphericKPa: number;
}) {
  const { input, result } = test;
  const decimals = PRESSURE_DECIMALS[units.pressure];
  const gauge = (kPa: number) =>
    `${formatNumber(gaugeToDisplay(kPa, units.pressure, atmosphericKPa), decimals)} ${GAUGE_LABEL[units.pressure]}`;
  // A drop is a difference: the gauge conversion without its offset.
  const drop = (kPa: number) =>
    `${formatNumber(gaugeToDisplay(kPa, units.pressure, atmosphericKPa), Math.max(decimals, 1))} ${units.pressure}`;
  const temperature = (celsius: number) =>
    `${formatNumber(temperatureToDisplay(celsius, units.temperature), 1)} ${TEMPERATURE_LABEL[units.temperature]}`;
  return (
    <article aria-label="Pressure test" className="rounded-card border-2 border-rule bg-surface p-3">
      <header className="flex flex-wrap items-center gap-2">
        <h3 className="font-semibold">Nitrogen test — {PRESSURE_TEST_SECTION_LABELS[input.section]}</h3>
        <VerdictBadge
          verdict={result.overall.verdict}
          word={result.overall.verdict === "pass" ? "Held" : result.overall.verdict === "fail" ? "Fail" : undefined}
        />
        <span className="num text-sm text-muted">{formatDateTime(test.takenAt)}</span>
        {test.recordedBy && <span className="text-sm text-muted">· {test.recordedBy.name}</span>}
      </header>
      <dl className="num mt-2 grid grid-cols-2 gap-x-4 gap-y-1 text-sm sm:grid-cols-4">
        <dt className="font-sans text-muted">Start</dt>
        <dd>
          {gauge(input.startGaugeKPa)} at {temperature(input.startTempC)}
        </dd>
        <dt className="font-sans text-muted">End ({formatNumber(input.holdMinutes, 0)} min)</dt>
        <dd>
          {gauge(input.endGaugeKPa)} at {temperature(input.endTempC)}
        </dd>
        <dt className="font-sans text-muted">Expected end</dt>
        <dd data-testid="expected-end">{gauge(result.hold.expectedEndGaugeKPa)}</dd>
        <dt className="font-sans text-muted">Corrected drop</dt>
        <dd data-testid="corrected-drop">
          {drop(result.hold.correctedDropKPa)} (allowed {drop(input.allowedDropKPa)})
        </dd>
      </dl>
      <ul className="mt-2">
        <VerdictLine
          label="Test pressure"
          figure={`${gauge(input.testGaugeKPa)} against rated ${gauge(input.ratedKPa)}`}
          verdict={result.testPressure.verdict}
          reason={result.testPressure.reason}
          source={result.testPressure.source}
        />
        <VerdictLine
          label="Hold, corrected for temperature"
          verdict={result.hold.verdict}
          word={result.hold.pass ? "Held" : "Lost pressure"}
          reason={result.hold.reason}
          source={result.hold.source}
        />
      </ul>
      {input.note && <p className="mt-1 text-sm">Note: {input.note}</p>}
    </article>
  );
}
