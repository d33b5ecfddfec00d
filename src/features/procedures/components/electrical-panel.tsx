import { zodResolver } from "@hookform/resolvers/zod";
import { Plus, Trash2 } from "lucide-react";
import { Controller, useFieldArray, useForm } from "react-hook-form";
import { z } from "zod";
import { runningCurrentNotice } from "@shared/engine/index.ts";
import {
  ELECTRICAL_TARGET_LABELS,
  ELECTRICAL_TARGETS,
  ElectricalCheckBodySchema,
  type ElectricalTarget,
} from "@shared/schemas/procedure-records.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { TextField } from "@/components/ui/field/field.tsx";
import { Segmented } from "@/components/ui/field/segmented.tsx";
import { useCreateElectricalCheck, useElectricalChecks } from "@/lib/api/procedures.ts";
import { procedureRecordsPath } from "@/lib/api/procedure-paths.ts";
import { messageAt } from "@/lib/form-errors.ts";
import { useFormValues } from "@/hooks/use-form-values.ts";
import { useProcedureSave } from "../hooks/use-procedure-save.ts";
import { toNumber } from "../utils/parse-number.ts";
import { ElectricalCheckView } from "./electrical-check-view.tsx";
import { NumberField } from "@/components/ui/field/number-field.tsx";
import { CircuitChoice, ProcedureLayout, type ProcedurePanelProps } from "./procedure-layout.tsx";
import { LiveNoticeLine } from "./live-notice.tsx";

interface ElectricalPanelProps extends ProcedurePanelProps {
  circuits: number[];
}

type InsulationRow = { point: string; megohms: string; testVoltageV: string };
type TerminalKey = "commonRun" | "commonStart" | "runStart";
const PHASE_PAIRS = ["L1–L2", "L2–L3", "L3–L1"];
const WINDING_PAIRS = ["T1–T2", "T2–T3", "T3–T1"];
/** A single-phase compressor's terminal pairs, in the order the body names them. */
const TERMINAL_PAIRS: readonly { key: TerminalKey; label: string }[] = [
  { key: "commonRun", label: "C–R (run)" },
  { key: "commonStart", label: "C–S (start)" },
  { key: "runStart", label: "R–S" },
];
/** Insulation testers for low-voltage plant are usually set to 500 V d.c. (AS/NZS 3000 verification, from memory). */
const DEFAULT_TEST_VOLTAGE = "500";

const emptyInsulation = (): InsulationRow => ({ point: "", megohms: "", testVoltageV: DEFAULT_TEST_VOLTAGE });
/** Only filled values go to the schema; three empty phase boxes mean "not measured". */
const filled = (values: string[]) =>
  values.some((value) => value.trim() !== "") ? values.map((value) => toNumber(value) ?? Number.NaN) : undefined;

/** What the form holds, named as the body's fields so the schema's messages land under them. */
interface TypedElectricalCheck {
  target: ElectricalTarget;
  circuit: string;
  supplyVolts: string[];
  nameplateV: string;
  insulation: InsulationRow[];
  windingOhms: string[];
  singlePhaseWindingOhms: Record<TerminalKey, string>;
  runningAmps: string[];
  ratedA: string;
  note: string;
}

/** The readings cleared after a save; what was checked, the circuit and the nameplate figures stay. */
const READINGS_CLEARED = {
  supplyVolts: ["", "", ""],
  insulation: [emptyInsulation()],
  windingOhms: ["", "", ""],
  singlePhaseWindingOhms: { commonRun: "", commonStart: "", runStart: "" },
  runningAmps: ["", "", ""],
  note: "",
} satisfies Partial<TypedElectricalCheck>;

/**
 * Electrical checks on a compressor, a fan motor or the supply: phase voltages and imbalance,
 * insulation to earth with the test voltage, winding balance, running current against the
 * nameplate. Judged by the server's engine when saved.
 */
export function ElectricalPanel({ circuits, ...panel }: ElectricalPanelProps) {
  const { visitId } = panel;
  const checks = useElectricalChecks(visitId);
  const create = useCreateElectricalCheck();
  const defaults = checks.data?.defaults;
  const threePhase = (defaults?.phases ?? 3) === 3;
  const phaseCount = threePhase ? 3 : 1;

  /** The body POST …/electrical-checks takes, from what was typed for the thing checked. */
  const toBody = (typed: TypedElectricalCheck) => {
    const insulationRows = typed.insulation.filter((row) => row.megohms.trim() !== "");
    const terminals = filled(TERMINAL_PAIRS.map((pair) => typed.singlePhaseWindingOhms[pair.key]));
    return {
      target: typed.target,
      circuit: typed.target === "supply" ? null : Number(typed.circuit),
      supplyVolts: filled(typed.supplyVolts.slice(0, phaseCount)),
      nameplateV: toNumber(typed.nameplateV),
      insulation:
        insulationRows.length > 0
          ? insulationRows.map((row) => ({
              point: row.point.trim() || undefined,
              megohms: toNumber(row.megohms) ?? Number.NaN,
              testVoltageV: toNumber(row.testVoltageV) ?? Number.NaN,
            }))
          : undefined,
      windingOhms: typed.target === "supply" || !threePhase ? undefined : filled(typed.windingOhms),
      singlePhaseWindingOhms:
        typed.target === "compressor" && !threePhase && terminals
          ? { commonRun: terminals[0]!, commonStart: terminals[1]!, runStart: terminals[2]! }
          : undefined,
      runningAmps: typed.target === "supply" ? undefined : filled(typed.runningAmps.slice(0, phaseCount)),
      ratedA: toNumber(typed.ratedA),
      note: typed.note.trim() || undefined,
    };
  };

  const form = useForm<TypedElectricalCheck, unknown, z.output<typeof ElectricalCheckBodySchema>>({
    resolver: zodResolver(z.preprocess(toBody, ElectricalCheckBodySchema)),
    // The same schema the server uses, as each field is typed: a corrected field loses its message at once.
    mode: "onChange",
    defaultValues: {
      target: "compressor",
      circuit: String(circuits[0] ?? 1),
      nameplateV: "",
      ratedA: "",
      ...READINGS_CLEARED,
    },
  });
  const insulation = useFieldArray({ control: form.control, name: "insulation" });
  const { errors } = form.formState;
  const save = useProcedureSave({
    form,
    visitId,
    mutation: create,
    stamp: "takenAt",
    entry: () => ({ kind: "electrical-check", path: procedureRecordsPath("electrical-checks", visitId) }),
    cleared: (typed) => ({ ...typed, ...READINGS_CLEARED, insulation: [emptyInsulation()] }),
    notSaved: "The check was not saved. Try again.",
  });

  const typed = useFormValues(form.control);
  const target = typed.target;
  const ratedDefault = target === "compressor" ? defaults?.compressorRlaA : target === "fan" ? defaults?.fanFlaA : null;
  const singlePhaseCompressor = target === "compressor" && !threePhase;

  // The engine's own running-current verdict (and a plausibility check) while the amps are typed.
  const ratedForNotice = toNumber(typed.ratedA) ?? ratedDefault ?? undefined;
  const currentNotices =
    target === "supply" || ratedForNotice === undefined
      ? []
      : typed.runningAmps.slice(0, phaseCount).map((text, index) => {
          const value = toNumber(text);
          if (value === undefined || messageAt(errors, `runningAmps.${index}`) || errors.ratedA) return null;
          const notice = runningCurrentNotice({
            amps: value,
            ratedA: ratedForNotice,
            kind: target === "fan" ? "fan-fla" : "compressor-rla",
          });
          return notice && { notice, label: threePhase ? `L${index + 1}` : undefined };
        });

  return (
    <ProcedureLayout
      {...panel}
      caution="electrical"
      kind="electrical-check"
      saved={{
        title: "Checks on this visit",
        records: checks.data?.electricalChecks,
        name: "the electrical check",
        view: (check) => <ElectricalCheckView check={check} />,
      }}
      loadError={checks.isError ? `The electrical checks could not be loaded: ${checks.error.message}` : undefined}
      form={{
        label: "New electrical check",
        save,
        saveLabel: "Save electrical check",
        storedNote: "✓ Saved and judged — see the check above",
        children: (
          <>
            <div className="flex flex-wrap gap-3">
              <Controller
                control={form.control}
                name="target"
                render={({ field }) => (
                  <Segmented<ElectricalTarget>
                    label="What was checked"
                    value={field.value}
                    onChange={(value) => {
                      field.onChange(value);
                      // Another thing checked: the last save's messages were about the one before.
                      form.clearErrors();
                    }}
                    options={ELECTRICAL_TARGETS.map((value) => ({
                      value,
                      label: ELECTRICAL_TARGET_LABELS[value],
                    }))}
                  />
                )}
              />
              {target !== "supply" && circuits.length > 1 && (
                <Controller
                  control={form.control}
                  name="circuit"
                  render={({ field }) => (
                    <CircuitChoice circuits={circuits} value={field.value} onChange={field.onChange} />
                  )}
                />
              )}
            </div>
            {errors.target && <p className="text-sm font-medium text-fault">⚠ {errors.target.message}</p>}

            <fieldset className="space-y-2">
              <legend className="font-semibold">
                Supply voltage {threePhase ? "(line to line, running)" : "(running)"}
              </legend>
              <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
                {PHASE_PAIRS.slice(0, phaseCount).map((pair, index) => (
                  <NumberField
                    key={pair}
                    label={threePhase ? pair : "Measured"}
                    unit="V"
                    registration={form.register(`supplyVolts.${index}`)}
                    error={errors.supplyVolts?.[index]?.message}
                  />
                ))}
                <NumberField
                  label="Nameplate"
                  unit="V"
                  registration={form.register("nameplateV")}
                  error={errors.nameplateV?.message}
                  hint={defaults?.nameplateV ? `${defaults.nameplateV} V on the unit if left blank` : undefined}
                />
              </div>
              {(errors.supplyVolts?.message || messageAt(errors, "_")) && (
                <p className="text-sm font-medium text-fault">
                  ⚠ {errors.supplyVolts?.message ?? messageAt(errors, "_")}
                </p>
              )}
            </fieldset>

            <fieldset className="space-y-2">
              <legend className="font-semibold">Insulation resistance to earth</legend>
              <p className="text-sm text-muted">
                Never on a compressor under vacuum. Enter the tester voltage you used.
              </p>
              {insulation.fields.map((row, index) => (
                <div key={row.id} className="grid grid-cols-2 items-end gap-3 sm:grid-cols-[1fr_10rem_10rem_auto]">
                  <TextField
                    label="Point tested"
                    placeholder={target === "supply" ? "e.g. L1 to earth" : "e.g. C to earth"}
                    className="col-span-2 sm:col-span-1"
                    {...form.register(`insulation.${index}.point`)}
                  />
                  <NumberField
                    label="Reading"
                    unit="MΩ"
                    registration={form.register(`insulation.${index}.megohms`)}
                    error={errors.insulation?.[index]?.megohms?.message}
                  />
                  <NumberField
                    label="Test voltage"
                    unit="V d.c."
                    registration={form.register(`insulation.${index}.testVoltageV`)}
                    error={errors.insulation?.[index]?.testVoltageV?.message}
                  />
                  {insulation.fields.length > 1 && (
                    <Button
                      variant="quiet"
                      aria-label={`Remove insulation reading ${index + 1}`}
                      onClick={() => insulation.remove(index)}
                    >
                      <Trash2 aria-hidden className="size-5" />
                    </Button>
                  )}
                </div>
              ))}
              {insulation.fields.length < 6 && (
                <Button variant="secondary" onClick={() => insulation.append(emptyInsulation())}>
                  <Plus aria-hidden className="size-5" /> Another insulation reading
                </Button>
              )}
            </fieldset>

            {target !== "supply" && (
              <>
                {threePhase && (
                  <fieldset className="space-y-2">
                    <legend className="font-semibold">Winding resistance (lead to lead)</legend>
                    {/* Two across on a phone: three boxes of 24 px digits cut "12.45" to "12.4" at 390 px. */}
                    <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
                      {WINDING_PAIRS.map((pair, index) => (
                        <NumberField
                          key={pair}
                          label={pair}
                          unit="Ω"
                          registration={form.register(`windingOhms.${index}`)}
                          error={errors.windingOhms?.[index]?.message}
                        />
                      ))}
                    </div>
                    {errors.windingOhms?.message && (
                      <p className="text-sm font-medium text-fault">⚠ {errors.windingOhms.message}</p>
                    )}
                  </fieldset>
                )}
                {singlePhaseCompressor && (
                  <fieldset className="space-y-2">
                    <legend className="font-semibold">Compressor windings (terminal to terminal)</legend>
                    <p className="text-sm text-muted">
                      Power off and isolated. R–S should equal C–R + C–S; the start winding reads higher than the run.
                    </p>
                    <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
                      {TERMINAL_PAIRS.map((pair) => (
                        <NumberField
                          key={pair.key}
                          label={pair.label}
                          unit="Ω"
                          registration={form.register(`singlePhaseWindingOhms.${pair.key}`)}
                          error={errors.singlePhaseWindingOhms?.[pair.key]?.message}
                        />
                      ))}
                    </div>
                    {errors.singlePhaseWindingOhms?.message && (
                      <p className="text-sm font-medium text-fault">⚠ {errors.singlePhaseWindingOhms.message}</p>
                    )}
                  </fieldset>
                )}
                <fieldset className="space-y-2">
                  <legend className="font-semibold">Running current</legend>
                  <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
                    {PHASE_PAIRS.slice(0, phaseCount).map((pair, index) => (
                      <NumberField
                        key={pair}
                        label={threePhase ? `L${index + 1}` : "Measured"}
                        unit="A"
                        registration={form.register(`runningAmps.${index}`)}
                        error={errors.runningAmps?.[index]?.message}
                      />
                    ))}
                    <NumberField
                      label={target === "fan" ? "Nameplate FLA" : "Nameplate RLA"}
                      unit="A"
                      registration={form.register("ratedA")}
                      error={errors.ratedA?.message}
                      hint={ratedDefault ? `${ratedDefault} A on the unit if left blank` : undefined}
                    />
                  </div>
                  <div className="space-y-2" data-testid="running-current-notices">
                    {currentNotices.map((entry, index) => (
                      <LiveNoticeLine key={index} notice={entry?.notice ?? null} label={entry?.label} />
                    ))}
                  </div>
                </fieldset>
              </>
            )}

            <TextField
              label="Note"
              error={messageAt(errors, "note")}
              placeholder="e.g. contactor pitted, replaced"
              {...form.register("note")}
            />
          </>
        ),
      }}
    />
  );
}
