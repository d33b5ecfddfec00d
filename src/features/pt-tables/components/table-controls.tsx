import { useId } from "react";
import { NumberInput } from "@/components/ui/field/number-input.tsx";
import { Segmented } from "@/components/ui/field/segmented.tsx";
import { TEMPERATURE_LABEL, type TemperatureDisplayUnit } from "@/lib/units/display-units.ts";

export const STEP_OPTIONS_K = [0.5, 1, 2, 5, 10] as const;

export interface TableRange {
  /** As typed, in the display temperature unit. */
  fromText: string;
  toText: string;
  stepK: number;
  scale: "gauge" | "absolute";
}

interface TableControlsProps {
  range: TableRange;
  onChange: (range: TableRange) => void;
  temperatureUnit: TemperatureDisplayUnit;
  error: string | null;
}

export function TableControls({ range, onChange, temperatureUnit, error }: TableControlsProps) {
  const id = useId();
  const unit = TEMPERATURE_LABEL[temperatureUnit];
  return (
    <fieldset className="no-print flex flex-wrap items-end gap-3">
      <legend className="sr-only">Table range and step</legend>
      <div>
        <label htmlFor={`${id}-from`} className="block text-sm font-medium">
          From
        </label>
        {/* Tables start below zero (−40 °C): the field carries its own ± for keypads without a minus. */}
        <NumberInput
          id={`${id}-from`}
          unit={unit}
          value={range.fromText}
          onChange={(event) => onChange({ ...range, fromText: event.target.value })}
          invalid={Boolean(error)}
          aria-describedby={error ? `${id}-error` : undefined}
          className="mt-1 w-44"
        />
      </div>
      <div>
        <label htmlFor={`${id}-to`} className="block text-sm font-medium">
          To
        </label>
        {/* Tables start below zero (−40 °C): the field carries its own ± for keypads without a minus. */}
        <NumberInput
          id={`${id}-to`}
          unit={unit}
          value={range.toText}
          onChange={(event) => onChange({ ...range, toText: event.target.value })}
          invalid={Boolean(error)}
          aria-describedby={error ? `${id}-error` : undefined}
          className="mt-1 w-44"
        />
      </div>
      <div>
        <label htmlFor={`${id}-step`} className="block text-sm font-medium">
          Step (K)
        </label>
        <select
          id={`${id}-step`}
          value={range.stepK}
          onChange={(event) => onChange({ ...range, stepK: Number(event.target.value) })}
          className="num min-h-touch rounded-card border-2 border-rule bg-surface px-3 text-lg"
        >
          {STEP_OPTIONS_K.map((step) => (
            <option key={step} value={step}>
              {step}
            </option>
          ))}
        </select>
      </div>
      <Segmented<"gauge" | "absolute">
        label="Pressure scale"
        value={range.scale}
        onChange={(scale) => onChange({ ...range, scale })}
        options={[
          { value: "gauge", label: "Gauge" },
          { value: "absolute", label: "Absolute" },
        ]}
      />
      {error && (
        <p id={`${id}-error`} role="alert" className="basis-full font-medium text-fault">
          ⚠ {error}
        </p>
      )}
    </fieldset>
  );
}
