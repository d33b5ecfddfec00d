import { lazy, Suspense, useId, useMemo, useState } from "react";
import type { MeasuredCycle, MeasuredCycleExtras } from "@shared/engine/index.ts";
import type { DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { NumberInput, parseDecimal } from "@/components/ui/field/number-input.tsx";
import {
  DIFFERENCE_LABEL,
  differenceToDisplay,
  formatNumber,
  TEMPERATURE_LABEL,
  temperatureFromDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { useMeasuredCycle } from "../hooks/use-measured-cycle.ts";
import { phDiagramData } from "../utils/ph-diagram-data.ts";
import { CycleStatesTable } from "./cycle-states-table.tsx";

/** recharts and the chart code load only when the diagram is shown. */
const PhDiagram = lazy(() => import("./ph-diagram.tsx"));

const NO_EXTRAS: MeasuredCycleExtras = {};
/** Wide enough to show the diagram open from the start; phones keep it folded. */
const OPEN_FROM = "(min-width: 768px)";

interface MeasuredCyclePanelProps {
  /** The reading to draw (validated diagnosis input, kPa gauge). */
  input: DiagnosisInput | null;
  /** The reading before it, drawn faintly to compare. */
  previousInput: DiagnosisInput | null;
  units: DisplayUnits;
  /**
   * "run-log": a fold, closed on a phone; "report": always shown (fixed width for print when
   * given); "quiz": a casebook question — the diagram and the states' pressures and
   * temperatures only, so the enthalpies are read off the chart.
   */
  mode: "run-log" | "report" | "quiz";
  width?: number;
  extras?: MeasuredCycleExtras;
}

function Figures({ cycle, units }: { cycle: MeasuredCycle; units: DisplayUnits }) {
  const k = DIFFERENCE_LABEL[units.temperature];
  const figure = (value: number | null, digits: number, unit: string) =>
    value === null ? "—" : `${formatNumber(value, digits)} ${unit}`.trim();
  const rows: [string, string][] = [
    ["Refrigerating effect (1 − 4)", figure(cycle.refrigeratingEffectKJPerKg, 1, "kJ/kg")],
    ["Compression work (2 − 1)", figure(cycle.compressionWorkKJPerKg, 1, "kJ/kg")],
    [
      "Discharge superheat",
      cycle.dischargeSuperheatK === null
        ? "—"
        : figure(differenceToDisplay(cycle.dischargeSuperheatK, units.temperature), 1, k),
    ],
    [
      "Isentropic efficiency (apparent)",
      cycle.isentropicEfficiency === null ? "—" : `${formatNumber(cycle.isentropicEfficiency * 100, 0)} %`,
    ],
    ["COP of the measured cycle", figure(cycle.cop, 2, "")],
  ];
  if (cycle.capacityKW !== null) rows.push(["Capacity (refrigerant side)", figure(cycle.capacityKW, 2, "kW")]);
  if (cycle.airSide)
    rows.push([
      `Air-side capacity (${cycle.airSide.totalKW === null ? "sensible" : "total"})`,
      figure(cycle.airSide.totalKW ?? cycle.airSide.sensibleKW, 2, "kW"),
    ]);
  return (
    <dl className="num grid grid-cols-1 gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
      {rows.map(([label, value]) => (
        <div key={label} className="flex justify-between gap-3 border-b border-rule py-1">
          <dt className="font-sans text-muted">{label}</dt>
          <dd className="font-semibold">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

const EXTRA_FIELDS = [
  { key: "measuredPowerKW", label: "Compressor power (metered)", unit: "kW" },
  { key: "voltageV", label: "Supply voltage", unit: "V" },
  { key: "phases", label: "Phases (1 or 3)", unit: "" },
  { key: "powerFactor", label: "Power factor", unit: "" },
  { key: "airflowLitresPerS", label: "Evaporator airflow", unit: "L/s" },
  { key: "supplyAirWetBulb", label: "Supply air wet bulb", unit: "temperature" },
] as const;
type ExtraKey = (typeof EXTRA_FIELDS)[number]["key"];

/** What the technician may add for capacity, COP from power and the air side: kept on this screen only, never saved. */
function toExtras(draft: Partial<Record<ExtraKey, string>>, units: DisplayUnits): MeasuredCycleExtras {
  const number = (key: ExtraKey) => {
    const parsed = parseDecimal(draft[key] ?? "");
    return typeof parsed === "number" && Number.isFinite(parsed) ? parsed : undefined;
  };
  const extras: MeasuredCycleExtras = {};
  const power = number("measuredPowerKW");
  if (power !== undefined && power > 0) extras.measuredPowerKW = power;
  const voltage = number("voltageV");
  if (voltage !== undefined && voltage > 0) extras.voltageV = voltage;
  const phases = number("phases");
  if (phases === 1 || phases === 3) extras.phases = phases;
  const powerFactor = number("powerFactor");
  if (powerFactor !== undefined && powerFactor > 0 && powerFactor <= 1) extras.powerFactor = powerFactor;
  const airflow = number("airflowLitresPerS");
  if (airflow !== undefined && airflow > 0) extras.airflowM3PerS = airflow / 1000;
  const wetBulb = number("supplyAirWetBulb");
  if (wetBulb !== undefined) extras.supplyAirWetBulbC = temperatureFromDisplay(wetBulb, units.temperature);
  return extras;
}

function ExtraInputs({
  draft,
  onChange,
  units,
}: {
  draft: Partial<Record<ExtraKey, string>>;
  onChange: (key: ExtraKey, value: string) => void;
  units: DisplayUnits;
}) {
  const id = useId();
  return (
    <details className="text-sm">
      <summary className="min-h-touch cursor-pointer py-2 font-medium">
        Add electrical and airflow readings (capacity, air side)
      </summary>
      <p className="text-muted">
        Used for the figures above only; not saved with the reading. A metered kW is used before V × A × power factor.
      </p>
      <div className="mt-2 grid gap-3 sm:grid-cols-3">
        {EXTRA_FIELDS.map((field) => (
          <div key={field.key} className="space-y-1">
            <label htmlFor={`${id}-${field.key}`} className="block font-medium">
              {field.label}
            </label>
            <NumberInput
              id={`${id}-${field.key}`}
              unit={field.unit === "temperature" ? TEMPERATURE_LABEL[units.temperature] : field.unit}
              value={draft[field.key] ?? ""}
              onChange={(event) => onChange(field.key, event.target.value)}
            />
          </div>
        ))}
      </div>
    </details>
  );
}

function CycleContent({
  input,
  previousInput,
  units,
  width,
  extras,
  mode,
}: Omit<MeasuredCyclePanelProps, "mode"> & { mode: MeasuredCyclePanelProps["mode"] }) {
  const [draft, setDraft] = useState<Partial<Record<ExtraKey, string>>>({});
  const typed = useMemo(
    () => (mode === "run-log" ? { ...toExtras(draft, units), ...extras } : (extras ?? NO_EXTRAS)),
    [draft, units, extras, mode],
  );
  const state = useMeasuredCycle(input, previousInput, typed, true);
  const data = useMemo(
    () =>
      state.kind === "ready" && input
        ? phDiagramData(input.refrigerant, state.cycle, state.previous, units.pressure)
        : null,
    [state, input, units.pressure],
  );
  if (!input)
    return (
      <p className="text-muted">
        Suction and liquid pressures with their line temperatures give the first cycle; a discharge line temperature
        completes it.
      </p>
    );
  if (state.kind === "failed")
    return (
      <p role="alert" className="font-medium text-fault">
        ⚠ The {input.refrigerant} properties could not be loaded: {state.message}
      </p>
    );
  if (state.kind !== "ready" || !data)
    return (
      <p aria-busy="true" className="text-muted">
        Loading the {input.refrigerant} properties…
      </p>
    );
  const { cycle } = state;
  // The printed report leaves out what the technician could still add (electrical, airflow).
  const notes =
    mode === "report"
      ? cycle.notes.filter((note) => !["electricalPower", "capacity", "airSide"].includes(note.figure))
      : cycle.notes;
  const quiz = mode === "quiz";
  return (
    <div className="space-y-3">
      {!quiz && <Figures cycle={cycle} units={units} />}
      {mode === "run-log" && (
        <ExtraInputs
          draft={draft}
          units={units}
          onChange={(key, value) => setDraft((current) => ({ ...current, [key]: value }))}
        />
      )}
      <Suspense
        fallback={
          <p aria-busy="true" className="text-muted">
            Drawing the diagram…
          </p>
        }
      >
        <PhDiagram
          data={data}
          pressureUnit={units.pressure}
          temperatureUnit={units.temperature}
          refrigerant={input.refrigerant}
          width={width}
          height={width ? 320 : 380}
        />
      </Suspense>
      <CycleStatesTable
        states={cycle.states}
        units={units}
        hideEnthalpies={quiz}
        caption={`States of the ${input.refrigerant} cycle${state.previous ? " (the previous reading is the faint dashed cycle)" : ""}`}
      />
      {!quiz && notes.length > 0 && (
        <details className="text-sm">
          <summary className="min-h-touch cursor-pointer py-2 font-medium">
            How these figures were found ({notes.length} notes)
          </summary>
          <ul className="list-disc space-y-1 pl-5">
            {notes.map((note, index) => (
              <li key={index}>{note.message}</li>
            ))}
          </ul>
        </details>
      )}
    </div>
  );
}

/**
 * What the compressor and coils are really doing: the reading's own cycle on a
 * pressure–enthalpy diagram (the engine's measuredCycle), with its figures and a table of the
 * states. The refrigerant's single-phase table and the chart load only when the panel is open.
 */
export function MeasuredCyclePanel(props: MeasuredCyclePanelProps) {
  const [open, setOpen] = useState(
    () =>
      props.mode !== "run-log" || (typeof window !== "undefined" && window.matchMedia?.(OPEN_FROM).matches === true),
  );
  if (props.mode !== "run-log") {
    return (
      <section aria-label="Measured cycle" className="keep-together space-y-2">
        <h3 className="font-semibold">
          {props.mode === "quiz" ? "The cycle on the pressure–enthalpy diagram" : "Measured cycle (pressure–enthalpy)"}
        </h3>
        <PanelBoundary>
          <CycleContent {...props} />
        </PanelBoundary>
      </section>
    );
  }
  return (
    <details
      open={open}
      onToggle={(event) => setOpen((event.currentTarget as HTMLDetailsElement).open)}
      className="rounded-card border-2 border-rule bg-surface p-4"
      data-testid="measured-cycle"
    >
      <summary className="min-h-touch cursor-pointer py-2 text-lg font-semibold">
        Measured cycle (pressure–enthalpy)
      </summary>
      {open && (
        <PanelBoundary>
          <CycleContent {...props} />
        </PanelBoundary>
      )}
    </details>
  );
}
