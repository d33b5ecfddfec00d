import { useId, useState } from "react";
import {
  PropertyRangeError,
  pressureToDisplay,
  saturationPressure,
  saturationTemperature,
} from "@shared/engine/index.ts";
import { NumberInput, parseDecimal } from "@/components/ui/field/number-input.tsx";
import { Segmented } from "@/components/ui/field/segmented.tsx";
import {
  GAUGE_LABEL,
  PRESSURE_DECIMALS,
  TEMPERATURE_LABEL,
  formatNumber,
  gaugeFromDisplay,
  temperatureFromDisplay,
  temperatureToDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";

type Direction = "pressure-to-temperature" | "temperature-to-pressure";

interface ConverterProps {
  refrigerantId: string;
  isBlend: boolean;
  units: DisplayUnits;
  atmosphericKPa: number;
}

interface Answer {
  label: string;
  hint: string;
  value: string;
  unit: string;
}

type Outcome = { kind: "empty" } | { kind: "error"; message: string } | { kind: "answers"; answers: Answer[] };

function describeError(error: unknown): string {
  if (error instanceof PropertyRangeError) return error.message;
  throw error;
}

/** The typed text in the new units, same quantity; text that is not a number is left as typed. */
function convertEntry(
  text: string,
  direction: Direction,
  from: DisplayUnits,
  to: DisplayUnits,
  atmosphericKPa: number,
): string {
  const parsed = parseDecimal(text);
  if (parsed === undefined || parsed === "invalid") return text;
  if (direction === "pressure-to-temperature") {
    const gaugeKPa = gaugeFromDisplay(parsed, from.pressure, atmosphericKPa);
    return formatNumber(
      pressureToDisplay(gaugeKPa + atmosphericKPa, to.pressure, "gauge", atmosphericKPa),
      PRESSURE_DECIMALS[to.pressure],
    );
  }
  return formatNumber(temperatureToDisplay(temperatureFromDisplay(parsed, from.temperature), to.temperature), 1);
}

/**
 * Pressure → saturation temperature and back, as you type. Blends show both points,
 * each labelled with what it is for: dew for superheat, bubble for subcooling.
 */
export function SaturationConverter({ refrigerantId, isBlend, units, atmosphericKPa }: ConverterProps) {
  const [direction, setDirection] = useState<Direction>("pressure-to-temperature");
  // The typed value belongs to the units it was typed in: switching units converts it (430 kPa
  // stays 430 kPa, shown as 62.4 psig), never re-reads the same digits in the new unit.
  const [entry, setEntry] = useState({ text: "", units });
  if (entry.units.pressure !== units.pressure || entry.units.temperature !== units.temperature) {
    setEntry({ text: convertEntry(entry.text, direction, entry.units, units, atmosphericKPa), units });
  }
  const text = entry.text;
  const setText = (next: string) => setEntry({ text: next, units });
  const inputId = useId();
  const outputId = useId();

  const points = isBlend
    ? ([
        { point: "dew", label: "Dew point", hint: "use for superheat (suction side)" },
        { point: "bubble", label: "Bubble point", hint: "use for subcooling (liquid side)" },
      ] as const)
    : ([{ point: "dew", label: "Saturation", hint: "bubble and dew are the same" }] as const);

  const parsed = parseDecimal(text);
  let outcome: Outcome;
  if (parsed === undefined) outcome = { kind: "empty" };
  else if (parsed === "invalid") outcome = { kind: "error", message: "Type a number, e.g. 520 or -12.5" };
  else {
    try {
      if (direction === "pressure-to-temperature") {
        const kPaAbs = gaugeFromDisplay(parsed, units.pressure, atmosphericKPa) + atmosphericKPa;
        outcome = {
          kind: "answers",
          answers: points.map(({ point, label, hint }) => ({
            label,
            hint,
            value: formatNumber(
              temperatureToDisplay(saturationTemperature(refrigerantId, kPaAbs, point), units.temperature),
              1,
            ),
            unit: TEMPERATURE_LABEL[units.temperature],
          })),
        };
      } else {
        const celsius = temperatureFromDisplay(parsed, units.temperature);
        outcome = {
          kind: "answers",
          answers: points.map(({ point, label, hint }) => ({
            label,
            hint:
              point === "dew" && isBlend
                ? "pressure where vapour starts to condense"
                : point === "bubble"
                  ? "pressure where liquid starts to boil"
                  : hint,
            value: formatNumber(
              pressureToDisplay(
                saturationPressure(refrigerantId, celsius, point),
                units.pressure,
                "gauge",
                atmosphericKPa,
              ),
              PRESSURE_DECIMALS[units.pressure],
            ),
            unit: GAUGE_LABEL[units.pressure],
          })),
        };
      }
    } catch (error) {
      outcome = { kind: "error", message: describeError(error) };
    }
  }

  const inputUnit =
    direction === "pressure-to-temperature" ? GAUGE_LABEL[units.pressure] : TEMPERATURE_LABEL[units.temperature];
  return (
    <section aria-labelledby={`${inputId}-heading`} className="rounded-card border-2 border-rule bg-surface p-4">
      <h2 id={`${inputId}-heading`} className="text-lg font-semibold">
        Quick converter
      </h2>
      <Segmented<Direction>
        className="mt-2"
        label="Convert from"
        value={direction}
        onChange={(next) => {
          setDirection(next);
          setText("");
        }}
        options={[
          { value: "pressure-to-temperature", label: "Pressure → temperature" },
          { value: "temperature-to-pressure", label: "Temperature → pressure" },
        ]}
      />
      <label htmlFor={inputId} className="mt-3 block font-medium">
        {direction === "pressure-to-temperature" ? "Gauge pressure" : "Saturation temperature"}
      </label>
      <NumberInput
        id={inputId}
        value={text}
        onChange={(event) => setText(event.target.value)}
        unit={inputUnit}
        invalid={outcome.kind === "error"}
        aria-describedby={outputId}
        placeholder={direction === "pressure-to-temperature" ? "e.g. 520" : "e.g. 5"}
        className="mt-1"
      />
      <output id={outputId} htmlFor={inputId} aria-live="polite" className="mt-3 block">
        {outcome.kind === "empty" && <span className="text-muted">Type a value to convert.</span>}
        {outcome.kind === "error" && (
          <span role="alert" className="font-medium text-fault">
            ⚠ {outcome.message}
          </span>
        )}
        {outcome.kind === "answers" && (
          <dl className="grid gap-2 sm:grid-cols-2">
            {outcome.answers.map((answer) => (
              <div key={answer.label} className="rounded-card bg-sunken p-3">
                <dt className="font-medium">
                  {answer.label} <span className="text-sm font-normal text-muted">— {answer.hint}</span>
                </dt>
                <dd className="num mt-1 text-3xl font-semibold" data-testid={`converter-${answer.label}`}>
                  {answer.value} <span className="text-lg font-normal text-muted">{answer.unit}</span>
                </dd>
              </div>
            ))}
          </dl>
        )}
      </output>
    </section>
  );
}
