import { formatTime } from "@shared/format/date-time.ts";
import { Save } from "lucide-react";
import { useState } from "react";
import { standingPressureOutcome } from "@shared/engine/index.ts";
import { StandingPressureBodySchema } from "@shared/schemas/procedure-records.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, TextField } from "@/components/ui/field/field.tsx";
import { NumberField } from "@/components/ui/field/number-field.tsx";
import { Segmented } from "@/components/ui/field/segmented.tsx";
import { ApiError } from "@/lib/api/api-client.ts";
import { useCreateStandingPressureCheck, useStandingPressureChecks } from "@/lib/api/procedures.ts";
import { procedureRecordsPath } from "@/lib/api/procedure-paths.ts";
import {
  GAUGE_LABEL,
  gaugeFromDisplay,
  TEMPERATURE_LABEL,
  temperatureFromDisplay,
  type DisplayUnits,
} from "@/lib/units/display-units.ts";
import { useEntryClientId } from "@/lib/drafts/use-entry-client-id.ts";
import { useKeepWhenOffline } from "@/features/offline/use-outbox.ts";
import { fieldMessages } from "@shared/schemas/field-messages.ts";
import { useFieldErrors } from "../hooks/use-field-errors.ts";
import { toConverted } from "../utils/parse-number.ts";
import { ProcedureLayout } from "./procedure-layout.tsx";
import {
  StandingPressureFigures,
  StandingPressureView,
  STANDING_PRESSURE_WORDS,
  ZEOTROPE_NOTE,
} from "./standing-pressure-view.tsx";
import { VerdictPanel } from "./verdict-badge.tsx";

interface StandingPressurePanelProps {
  visitId: string;
  /** The unit's refrigerant: the server judges with the same one, so the preview matches what is stored. */
  refrigerant: string;
  isBlend: boolean;
  circuits: number[];
  units: DisplayUnits;
  /** The site's atmosphere, kPa absolute, as the server uses it. */
  atmosphericKPa: number;
  canWrite: boolean;
  readOnlyNote?: string;
}

/**
 * The off-cycle standing-pressure check for non-condensables: the stopped unit's gauge pressure
 * against the saturation pressure of the equalised condenser temperature. The verdict is
 * previewed in the browser with the engine the server runs, and stored as the server judges it.
 */
export function StandingPressurePanel({
  visitId,
  refrigerant,
  isBlend,
  circuits,
  units,
  atmosphericKPa,
  canWrite,
  readOnlyNote,
}: StandingPressurePanelProps) {
  const checks = useStandingPressureChecks(visitId);
  const create = useCreateStandingPressureCheck();
  // One id per entry, kept across retries: a save whose answer was lost is stored once (README decision 026).
  const entryId = useEntryClientId();
  const keepWhenOffline = useKeepWhenOffline();
  const [standing, setStanding] = useState("");
  const [temperature, setTemperature] = useState("");
  const [circuit, setCircuit] = useState(String(circuits[0] ?? 1));
  const [note, setNote] = useState("");
  const [formError, setFormError] = useState<string | null>(null);
  // A message goes as soon as its field is changed.
  const [errors, setErrors] = useFieldErrors({
    standingGaugeKPa: standing,
    equalisedTempC: temperature,
    circuit,
    note,
  });

  const body = {
    standingGaugeKPa: toConverted(standing, (value) => gaugeFromDisplay(value, units.pressure, atmosphericKPa)),
    equalisedTempC: toConverted(temperature, (value) => temperatureFromDisplay(value, units.temperature)),
    // A single-circuit unit's check needs no circuit named.
    circuit: circuits.length > 1 ? Number(circuit) : undefined,
    note: note.trim() || undefined,
  };
  const parsed = StandingPressureBodySchema.safeParse(body);
  // The preview waits for both readings; a reading the schema refuses shows its message on save.
  const preview = parsed.success
    ? standingPressureOutcome({
        refrigerant,
        standingGaugeKPa: parsed.data.standingGaugeKPa,
        equalisedTempC: parsed.data.equalisedTempC,
        atmosphericPressureKPa: atmosphericKPa,
      })
    : null;

  const save = async () => {
    setFormError(null);
    if (!parsed.success) {
      setErrors(fieldMessages(parsed.error));
      setFormError("Check the fields marked below");
      return;
    }
    if (preview && "problem" in preview) {
      setErrors({ [preview.problem.field]: preview.problem.message });
      setFormError("Check the fields marked below");
      return;
    }
    setErrors({});
    try {
      // Taken now, by the device's clock; without a connection it waits in the outbox.
      const record = { ...parsed.data, clientId: entryId.take(), takenAt: new Date().toISOString() };
      await keepWhenOffline(() => create.mutateAsync({ visitId, ...record }), {
        kind: "standing-pressure-check",
        visitId,
        path: procedureRecordsPath("standing-pressure-checks", visitId),
        body: record,
      });
      entryId.release();
      setStanding("");
      setTemperature("");
      setNote("");
    } catch (error) {
      if (error instanceof ApiError) setErrors(error.fields);
      setFormError(error instanceof Error ? error.message : "The check was not saved. Try again.");
    }
  };

  const previewProblem = preview && "problem" in preview ? preview.problem : null;

  return (
    <ProcedureLayout
      caution="pressure"
      visitId={visitId}
      readOnlyNote={readOnlyNote}
      saved={{
        headingId: "standing-saved-heading",
        title: "Standing-pressure checks on this visit",
        kind: "standing-pressure",
        canVoid: canWrite,
        records: (checks.data?.standingPressureChecks ?? []).map((check) => ({
          id: check.id,
          voided: check.voided,
          what: `the standing-pressure check of ${formatTime(check.takenAt)}`,
          element: <StandingPressureView check={check} units={units} />,
        })),
      }}
      loadError={
        checks.isError ? `The standing-pressure checks could not be loaded: ${checks.error.message}` : undefined
      }
      form={
        canWrite
          ? {
              label: "New standing-pressure check",
              title: "New standing-pressure check",
              onSubmit: () => void save(),
              children: (
                <>
                  <div className="space-y-1 text-sm">
                    <p className="font-medium">How to read it</p>
                    <ol className="list-decimal space-y-1 pl-6">
                      <li>Stop the unit and leave the compressor off.</li>
                      <li>
                        Run the condenser fan on its own until the air leaving the coil is the same temperature as the
                        air entering it.
                      </li>
                      <li>
                        Measure the condenser's air temperature in the shade (the outdoor air for an air-cooled unit),
                        then read the standing pressure on the gauge.
                      </li>
                    </ol>
                    <p className="text-muted">
                      Judged against {refrigerant} at the site's atmosphere. Air or nitrogen in the condenser stands
                      above the saturation pressure of that temperature.
                    </p>
                  </div>
                  {circuits.length > 1 && (
                    <Segmented<string>
                      label="Circuit"
                      value={circuit}
                      onChange={setCircuit}
                      options={circuits.map((number) => ({ value: String(number), label: `Circuit ${number}` }))}
                    />
                  )}
                  <div className="grid grid-cols-2 gap-3">
                    <NumberField
                      label="Standing pressure"
                      unit={GAUGE_LABEL[units.pressure]}
                      value={standing}
                      onValueChange={setStanding}
                      error={
                        errors.standingGaugeKPa ??
                        (previewProblem?.field === "standingGaugeKPa" ? previewProblem.message : undefined)
                      }
                      hint="Gauge, unit stopped"
                    />
                    <NumberField
                      label="Equalised temperature"
                      unit={TEMPERATURE_LABEL[units.temperature]}
                      value={temperature}
                      onValueChange={setTemperature}
                      error={
                        errors.equalisedTempC ??
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
                    value={note}
                    onChange={(event) => setNote(event.target.value)}
                    error={errors.note}
                    placeholder="e.g. fan run 10 min, air off = air on"
                  />
                  {errors.circuit && <p className="text-sm font-medium text-fault">⚠ {errors.circuit}</p>}
                  {formError && <FormAlert>{formError}</FormAlert>}
                  <Button type="submit" size="lg" disabled={create.isPending}>
                    <Save aria-hidden className="size-5" />{" "}
                    {create.isPending ? "Saving…" : "Save standing-pressure check"}
                  </Button>
                </>
              ),
            }
          : null
      }
    />
  );
}
