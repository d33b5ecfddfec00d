import { zodResolver } from "@hookform/resolvers/zod";
import { Controller, useForm, type Path } from "react-hook-form";
import { z } from "zod";
import { standingPressureOutcome } from "@shared/engine/index.ts";
import { StandingPressureBodySchema } from "@shared/schemas/procedure-records.ts";
import { FormAlert, TextField } from "@/components/ui/field/field.tsx";
import { NumberField } from "@/components/ui/field/number-field.tsx";
import { useCreateStandingPressureCheck, useStandingPressureChecks } from "@/lib/api/procedures.ts";
import { procedureRecordsPath } from "@/lib/api/procedure-paths.ts";
import {
  GAUGE_LABEL,
  gaugeFromDisplay,
  TEMPERATURE_LABEL,
  temperatureFromDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { useFormValues } from "@/hooks/use-form-values.ts";
import { useProcedureSave } from "../hooks/use-procedure-save.ts";
import { toConverted } from "../utils/parse-number.ts";
import { CircuitChoice, ProcedureLayout, type ProcedurePanelProps } from "./procedure-layout.tsx";
import {
  StandingPressureFigures,
  StandingPressureView,
  STANDING_PRESSURE_WORDS,
  ZEOTROPE_NOTE,
} from "./standing-pressure-view.tsx";
import { VerdictPanel } from "./verdict-badge.tsx";

interface StandingPressurePanelProps extends ProcedurePanelProps {
  /** The unit's refrigerant: the server judges with the same one, so the preview matches what is stored. */
  refrigerant: string;
  isBlend: boolean;
  circuits: number[];
  units: DisplayUnits;
  /** The site's atmosphere, kPa absolute, as the server uses it. */
  atmosphericKPa: number;
}

/** What the form holds, named as the body's fields. */
interface TypedStandingPressure {
  standingGaugeKPa: string;
  equalisedTempC: string;
  circuit: string;
  note: string;
}

/**
 * The off-cycle standing-pressure check for non-condensables: the stopped unit's gauge pressure
 * against the saturation pressure of the equalised condenser temperature. The verdict is
 * previewed in the browser with the engine the server runs, and stored as the server judges it.
 */
export function StandingPressurePanel({
  refrigerant,
  isBlend,
  circuits,
  units,
  atmosphericKPa,
  ...panel
}: StandingPressurePanelProps) {
  const { visitId } = panel;
  const checks = useStandingPressureChecks(visitId);
  const create = useCreateStandingPressureCheck();
  /** The body POST …/standing-pressure-checks takes: what was typed, in the units the server keeps. */
  const toBody = (typed: TypedStandingPressure) => ({
    standingGaugeKPa: toConverted(typed.standingGaugeKPa, (value) =>
      gaugeFromDisplay(value, units.pressure, atmosphericKPa),
    ),
    equalisedTempC: toConverted(typed.equalisedTempC, (value) => temperatureFromDisplay(value, units.temperature)),
    // A single-circuit unit's check needs no circuit named.
    circuit: circuits.length > 1 ? Number(typed.circuit) : undefined,
    note: typed.note.trim() || undefined,
  });
  const outcomeOf = (body: z.output<typeof StandingPressureBodySchema>) =>
    standingPressureOutcome({
      refrigerant,
      standingGaugeKPa: body.standingGaugeKPa,
      equalisedTempC: body.equalisedTempC,
      atmosphericPressureKPa: atmosphericKPa,
    });

  const form = useForm<TypedStandingPressure, unknown, z.output<typeof StandingPressureBodySchema>>({
    resolver: zodResolver(z.preprocess(toBody, StandingPressureBodySchema)),
    defaultValues: { standingGaugeKPa: "", equalisedTempC: "", circuit: String(circuits[0] ?? 1), note: "" },
  });
  const { errors } = form.formState;
  const save = useProcedureSave({
    form,
    visitId,
    mutation: create,
    stamp: "takenAt",
    entry: () => ({ kind: "standing-pressure-check", path: procedureRecordsPath("standing-pressure-checks", visitId) }),
    // The circuit stays for the next check.
    cleared: (typed) => ({ ...typed, standingGaugeKPa: "", equalisedTempC: "", note: "" }),
    notSaved: "The check was not saved. Try again.",
    // Readings the engine cannot judge (e.g. beyond the refrigerant's table) are refused here, as the server would.
    check: (body) => {
      const outcome = outcomeOf(body);
      return "problem" in outcome
        ? { field: outcome.problem.field as Path<TypedStandingPressure>, message: outcome.problem.message }
        : null;
    },
  });

  const typed = useFormValues(form.control);
  const parsed = StandingPressureBodySchema.safeParse(toBody(typed));
  // The preview waits for both readings; a reading the schema refuses shows its message on save.
  const preview = parsed.success ? outcomeOf(parsed.data) : null;
  const previewProblem = preview && "problem" in preview ? preview.problem : null;

  return (
    <ProcedureLayout
      {...panel}
      caution="pressure"
      kind="standing-pressure"
      saved={{
        title: "Standing-pressure checks on this visit",
        records: checks.data?.standingPressureChecks,
        name: "the standing-pressure check",
        view: (check) => <StandingPressureView check={check} units={units} />,
      }}
      loadError={
        checks.isError ? `The standing-pressure checks could not be loaded: ${checks.error.message}` : undefined
      }
      form={{
        label: "New standing-pressure check",
        save,
        saveLabel: "Save standing-pressure check",
        children: (
          <>
            <div className="space-y-1 text-sm">
              <p className="font-medium">How to read it</p>
              <ol className="list-decimal space-y-1 pl-6">
                <li>Stop the unit and leave the compressor off.</li>
                <li>
                  Run the condenser fan on its own until the air leaving the coil is the same temperature as the air
                  entering it.
                </li>
                <li>
                  Measure the condenser's air temperature in the shade (the outdoor air for an air-cooled unit), then
                  read the standing pressure on the gauge.
                </li>
              </ol>
              <p className="text-muted">
                Judged against {refrigerant} at the site's atmosphere. Air or nitrogen in the condenser stands above the
                saturation pressure of that temperature.
              </p>
            </div>
            {circuits.length > 1 && (
              <Controller
                control={form.control}
                name="circuit"
                render={({ field }) => (
                  <CircuitChoice circuits={circuits} value={field.value} onChange={field.onChange} />
                )}
              />
            )}
            <div className="grid grid-cols-2 gap-3">
              <NumberField
                label="Standing pressure"
                unit={GAUGE_LABEL[units.pressure]}
                registration={form.register("standingGaugeKPa")}
                error={
                  errors.standingGaugeKPa?.message ??
                  (previewProblem?.field === "standingGaugeKPa" ? previewProblem.message : undefined)
                }
                hint="Gauge, unit stopped"
              />
              <NumberField
                label="Equalised temperature"
                unit={TEMPERATURE_LABEL[units.temperature]}
                registration={form.register("equalisedTempC")}
                error={
                  errors.equalisedTempC?.message ??
                  (previewProblem?.field === "equalisedTempC" ? previewProblem.message : undefined)
                }
                hint="Condenser air, in the shade"
              />
            </div>
            {isBlend && <p className="text-sm text-muted">{ZEOTROPE_NOTE}</p>}
            {preview && "result" in preview && (
              <div className="space-y-2" data-testid="standing-preview">
                <VerdictPanel
                  title="Preview"
                  verdict={preview.result.verdict}
                  word={STANDING_PRESSURE_WORDS[preview.result.verdict]}
                  reason={preview.result.reason}
                  source={preview.result.source}
                />
                <StandingPressureFigures result={preview.result} units={units} atmosphericKPa={atmosphericKPa} />
              </div>
            )}
            {previewProblem?.field === "refrigerant" && <FormAlert>{previewProblem.message}</FormAlert>}
            <TextField
              label="Note"
              error={errors.note?.message}
              placeholder="e.g. fan run 10 min, air off = air on"
              {...form.register("note")}
            />
            {errors.circuit && <p className="text-sm font-medium text-fault">⚠ {errors.circuit.message}</p>}
          </>
        ),
      }}
    />
  );
}
