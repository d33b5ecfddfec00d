import { formatTime } from "@shared/format/date-time.ts";
import { Plus, Save, Trash2 } from "lucide-react";
import { useState } from "react";
import { runningCurrentNotice } from "@shared/engine/index.ts";
import {
  ELECTRICAL_TARGET_LABELS,
  ELECTRICAL_TARGETS,
  ElectricalCheckBodySchema,
  type ElectricalTarget,
} from "@shared/schemas/procedure-records.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, TextField } from "@/components/ui/field/field.tsx";
import { Segmented } from "@/components/ui/field/segmented.tsx";
import { ApiError } from "@/lib/api/api-client.ts";
import { useCreateElectricalCheck, useElectricalChecks } from "@/lib/api/procedures.ts";
import { procedureRecordsPath } from "@/lib/api/procedure-paths.ts";
import { useEntryClientId } from "@/lib/drafts/use-entry-client-id.ts";
import { useKeepWhenOffline } from "@/features/offline/use-outbox.ts";
import { fieldMessages } from "@shared/schemas/field-messages.ts";
import { errorFor } from "../utils/field-errors.ts";
import { toNumber } from "../utils/parse-number.ts";
import { ElectricalCheckView } from "./electrical-check-view.tsx";
import { NumberField } from "@/components/ui/field/number-field.tsx";
import { ProcedureLayout } from "./procedure-layout.tsx";
import { LiveNoticeLine } from "./live-notice.tsx";

interface ElectricalPanelProps {
  visitId: string;
  circuits: number[];
  canWrite: boolean;
  readOnlyNote?: string;
}

type InsulationRow = { point: string; megohms: string; testVoltageV: string };
const PHASE_PAIRS = ["L1–L2", "L2–L3", "L3–L1"];
const WINDING_PAIRS = ["T1–T2", "T2–T3", "T3–T1"];
/** A single-phase compressor's terminal pairs, in the order the body names them. */
const TERMINAL_PAIRS = [
  { key: "commonRun", label: "C–R (run)" },
  { key: "commonStart", label: "C–S (start)" },
  { key: "runStart", label: "R–S" },
] as const;
/** Insulation testers for low-voltage plant are usually set to 500 V d.c. (AS/NZS 3000 verification, from memory). */
const DEFAULT_TEST_VOLTAGE = "500";

const emptyInsulation = (): InsulationRow => ({ point: "", megohms: "", testVoltageV: DEFAULT_TEST_VOLTAGE });
/** Only filled values go to the schema; three empty phase boxes mean "not measured". */
const filled = (values: string[]) =>
  values.some((value) => value.trim() !== "") ? values.map((value) => toNumber(value) ?? Number.NaN) : undefined;
const filledTerminals = (values: string[]) => {
  const numbers = filled(values);
  return numbers ? { commonRun: numbers[0]!, commonStart: numbers[1]!, runStart: numbers[2]! } : undefined;
};

/**
 * Electrical checks on a compressor, a fan motor or the supply: phase voltages and imbalance,
 * insulation to earth with the test voltage, winding balance, running current against the
 * nameplate. Judged by the server's engine when saved.
 */
export function ElectricalPanel({ visitId, circuits, canWrite, readOnlyNote }: ElectricalPanelProps) {
  const checks = useElectricalChecks(visitId);
  const create = useCreateElectricalCheck();
  // One id per entry, kept across retries: a save whose answer was lost is stored once (README decision 026).
  const entryId = useEntryClientId();
  const keepWhenOffline = useKeepWhenOffline();
  const defaults = checks.data?.defaults;
  const threePhase = (defaults?.phases ?? 3) === 3;
  const phaseCount = threePhase ? 3 : 1;

  const [target, setTarget] = useState<ElectricalTarget>("compressor");
  const [circuit, setCircuit] = useState(String(circuits[0] ?? 1));
  const [volts, setVolts] = useState<string[]>(["", "", ""]);
  const [nameplateV, setNameplateV] = useState("");
  const [insulation, setInsulation] = useState<InsulationRow[]>([emptyInsulation()]);
  const [ohms, setOhms] = useState<string[]>(["", "", ""]);
  const [terminals, setTerminals] = useState<string[]>(["", "", ""]);
  const [amps, setAmps] = useState<string[]>(["", "", ""]);
  const [ratedA, setRatedA] = useState("");
  const [note, setNote] = useState("");
  // Messages from the server for what it alone knows (e.g. no RLA on record); a field's own is dropped when it is edited.
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  // Once a save was tried every field is checked; before that only the ones typed in.
  const [attempted, setAttempted] = useState(false);
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);

  const ratedDefault = target === "compressor" ? defaults?.compressorRlaA : target === "fan" ? defaults?.fanFlaA : null;
  const singlePhaseCompressor = target === "compressor" && !threePhase;
  const edited = (path: string) =>
    setServerErrors((fields) =>
      Object.fromEntries(Object.entries(fields).filter(([key]) => key !== path && key !== "_")),
    );
  const setAt = (
    setter: (update: (values: string[]) => string[]) => void,
    index: number,
    value: string,
    path?: string,
  ) => {
    setter((values) => values.map((old, at) => (at === index ? value : old)));
    if (path) edited(`${path}.${index}`);
  };

  const insulationRows = insulation.filter((row) => row.megohms.trim() !== "");
  const body = {
    target,
    circuit: target === "supply" ? null : Number(circuit),
    supplyVolts: filled(volts.slice(0, phaseCount)),
    nameplateV: toNumber(nameplateV),
    insulation:
      insulationRows.length > 0
        ? insulationRows.map((row) => ({
            point: row.point.trim() || undefined,
            megohms: toNumber(row.megohms) ?? Number.NaN,
            testVoltageV: toNumber(row.testVoltageV) ?? Number.NaN,
          }))
        : undefined,
    windingOhms:
      target === "supply" || !threePhase ? undefined : (filled(ohms) as [number, number, number] | undefined),
    singlePhaseWindingOhms: singlePhaseCompressor ? filledTerminals(terminals) : undefined,
    runningAmps: target === "supply" ? undefined : filled(amps.slice(0, phaseCount)),
    ratedA: toNumber(ratedA),
    note: note.trim() || undefined,
  };
  // The same schema the server uses, on every keystroke: a corrected field loses its message at once.
  const parsed = ElectricalCheckBodySchema.safeParse(body);
  const schemaErrors = parsed.success ? {} : fieldMessages(parsed.error);
  const typedText = (path: string): string => {
    const [group, index, field] = path.split(".");
    const at = Number(index);
    if (group === "supplyVolts" && index !== undefined) return volts[at] ?? "";
    if (group === "windingOhms" && index !== undefined) return ohms[at] ?? "";
    if (group === "singlePhaseWindingOhms" && index !== undefined)
      return terminals[TERMINAL_PAIRS.findIndex((pair) => pair.key === index)] ?? "";
    if (group === "runningAmps" && index !== undefined) return amps[at] ?? "";
    if (group === "insulation" && field) return insulation[at]?.[field as keyof InsulationRow] ?? "";
    if (group === "nameplateV") return nameplateV;
    if (group === "ratedA") return ratedA;
    if (group === "note") return note;
    return "";
  };
  const errors: Record<string, string> = {
    ...(attempted
      ? schemaErrors
      : Object.fromEntries(Object.entries(schemaErrors).filter(([path]) => typedText(path).trim() !== ""))),
    ...serverErrors,
  };

  // The engine's own running-current verdict (and a plausibility check) while the amps are typed.
  const ratedForNotice = toNumber(ratedA) ?? ratedDefault ?? undefined;
  const currentNotices =
    target === "supply" || ratedForNotice === undefined
      ? []
      : amps.slice(0, phaseCount).map((text, index) => {
          const value = toNumber(text);
          if (value === undefined || errors[`runningAmps.${index}`] || errors.ratedA) return null;
          const notice = runningCurrentNotice({
            amps: value,
            ratedA: ratedForNotice,
            kind: target === "fan" ? "fan-fla" : "compressor-rla",
          });
          return notice && { notice, label: threePhase ? `L${index + 1}` : undefined };
        });

  const save = async () => {
    setFormError(null);
    setSaved(false);
    setAttempted(true);
    setServerErrors({});
    if (!parsed.success) {
      setFormError("Check the fields marked below");
      return;
    }
    try {
      // Taken now, by the device's clock; without a connection it waits in the outbox.
      const record = { ...parsed.data, clientId: entryId.take(), takenAt: new Date().toISOString() };
      const sent = await keepWhenOffline(() => create.mutateAsync({ visitId, ...record }), {
        kind: "electrical-check",
        visitId,
        path: procedureRecordsPath("electrical-checks", visitId),
        body: record,
      });
      entryId.release();
      setSaved(sent.outcome === "stored");
      setAttempted(false);
      setVolts(["", "", ""]);
      setInsulation([emptyInsulation()]);
      setOhms(["", "", ""]);
      setTerminals(["", "", ""]);
      setAmps(["", "", ""]);
      setNote("");
    } catch (error) {
      if (error instanceof ApiError) setServerErrors(error.fields);
      setFormError(error instanceof Error ? error.message : "The check was not saved. Try again.");
    }
  };

  return (
    <ProcedureLayout
      caution="electrical"
      visitId={visitId}
      readOnlyNote={readOnlyNote}
      saved={{
        headingId: "electrical-saved-heading",
        title: "Checks on this visit",
        kind: "electrical-check",
        canVoid: canWrite,
        records: (checks.data?.electricalChecks ?? []).map((check) => ({
          id: check.id,
          voided: check.voided,
          what: `the electrical check of ${formatTime(check.takenAt)}`,
          element: <ElectricalCheckView check={check} />,
        })),
      }}
      loadError={checks.isError ? `The electrical checks could not be loaded: ${checks.error.message}` : undefined}
      form={
        canWrite
          ? {
              label: "New electrical check",
              title: "New electrical check",
              onSubmit: () => void save(),
              children: (
                <>
                  <div className="flex flex-wrap gap-3">
                    <Segmented<ElectricalTarget>
                      label="What was checked"
                      value={target}
                      onChange={(value) => {
                        setTarget(value);
                        setServerErrors({});
                        setAttempted(false);
                      }}
                      options={ELECTRICAL_TARGETS.map((value) => ({ value, label: ELECTRICAL_TARGET_LABELS[value] }))}
                    />
                    {target !== "supply" && circuits.length > 1 && (
                      <Segmented<string>
                        label="Circuit"
                        value={circuit}
                        onChange={setCircuit}
                        options={circuits.map((number) => ({ value: String(number), label: `Circuit ${number}` }))}
                      />
                    )}
                  </div>
                  {errors.target && <p className="text-sm font-medium text-fault">⚠ {errors.target}</p>}

                  <fieldset className="space-y-2">
                    <legend className="font-semibold">
                      Supply voltage {threePhase ? "(line to line, running)" : "(running)"}
                    </legend>
                    <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
                      {volts.slice(0, phaseCount).map((value, index) => (
                        <NumberField
                          key={index}
                          label={threePhase ? PHASE_PAIRS[index]! : "Measured"}
                          unit="V"
                          value={value}
                          onValueChange={(text) => setAt(setVolts, index, text, "supplyVolts")}
                          error={errors[`supplyVolts.${index}`]}
                        />
                      ))}
                      <NumberField
                        label="Nameplate"
                        unit="V"
                        value={nameplateV}
                        onValueChange={(text) => {
                          setNameplateV(text);
                          edited("nameplateV");
                        }}
                        error={errors.nameplateV}
                        hint={defaults?.nameplateV ? `${defaults.nameplateV} V on the unit if left blank` : undefined}
                      />
                    </div>
                    {(errors.supplyVolts || errors._) && (
                      <p className="text-sm font-medium text-fault">⚠ {errors.supplyVolts ?? errors._}</p>
                    )}
                  </fieldset>

                  <fieldset className="space-y-2">
                    <legend className="font-semibold">Insulation resistance to earth</legend>
                    <p className="text-sm text-muted">
                      Never on a compressor under vacuum. Enter the tester voltage you used.
                    </p>
                    {insulation.map((row, index) => (
                      <div key={index} className="grid grid-cols-2 items-end gap-3 sm:grid-cols-[1fr_10rem_10rem_auto]">
                        <TextField
                          label="Point tested"
                          placeholder={target === "supply" ? "e.g. L1 to earth" : "e.g. C to earth"}
                          value={row.point}
                          onChange={(event) =>
                            setInsulation((rows) =>
                              rows.map((old, at) => (at === index ? { ...old, point: event.target.value } : old)),
                            )
                          }
                          className="col-span-2 sm:col-span-1"
                        />
                        <NumberField
                          label="Reading"
                          unit="MΩ"
                          value={row.megohms}
                          onValueChange={(text) => {
                            setInsulation((rows) =>
                              rows.map((old, at) => (at === index ? { ...old, megohms: text } : old)),
                            );
                            edited(`insulation.${index}.megohms`);
                          }}
                          error={errors[`insulation.${index}.megohms`]}
                        />
                        <NumberField
                          label="Test voltage"
                          unit="V d.c."
                          value={row.testVoltageV}
                          onValueChange={(text) => {
                            setInsulation((rows) =>
                              rows.map((old, at) => (at === index ? { ...old, testVoltageV: text } : old)),
                            );
                            edited(`insulation.${index}.testVoltageV`);
                          }}
                          error={errors[`insulation.${index}.testVoltageV`]}
                        />
                        {insulation.length > 1 && (
                          <Button
                            variant="quiet"
                            aria-label={`Remove insulation reading ${index + 1}`}
                            onClick={() => setInsulation((rows) => rows.filter((_row, at) => at !== index))}
                          >
                            <Trash2 aria-hidden className="size-5" />
                          </Button>
                        )}
                      </div>
                    ))}
                    {insulation.length < 6 && (
                      <Button variant="secondary" onClick={() => setInsulation((rows) => [...rows, emptyInsulation()])}>
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
                            {ohms.map((value, index) => (
                              <NumberField
                                key={index}
                                label={WINDING_PAIRS[index]!}
                                unit="Ω"
                                value={value}
                                onValueChange={(text) => setAt(setOhms, index, text, "windingOhms")}
                                error={errors[`windingOhms.${index}`]}
                              />
                            ))}
                          </div>
                          {errors.windingOhms && (
                            <p className="text-sm font-medium text-fault">⚠ {errors.windingOhms}</p>
                          )}
                        </fieldset>
                      )}
                      {singlePhaseCompressor && (
                        <fieldset className="space-y-2">
                          <legend className="font-semibold">Compressor windings (terminal to terminal)</legend>
                          <p className="text-sm text-muted">
                            Power off and isolated. R–S should equal C–R + C–S; the start winding reads higher than the
                            run.
                          </p>
                          <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
                            {TERMINAL_PAIRS.map((pair, index) => (
                              <NumberField
                                key={pair.key}
                                label={pair.label}
                                unit="Ω"
                                value={terminals[index]!}
                                onValueChange={(text) => {
                                  setAt(setTerminals, index, text);
                                  edited(`singlePhaseWindingOhms.${pair.key}`);
                                }}
                                error={errors[`singlePhaseWindingOhms.${pair.key}`]}
                              />
                            ))}
                          </div>
                          {errors.singlePhaseWindingOhms && (
                            <p className="text-sm font-medium text-fault">⚠ {errors.singlePhaseWindingOhms}</p>
                          )}
                        </fieldset>
                      )}
                      <fieldset className="space-y-2">
                        <legend className="font-semibold">Running current</legend>
                        <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
                          {amps.slice(0, phaseCount).map((value, index) => (
                            <NumberField
                              key={index}
                              label={threePhase ? `L${index + 1}` : "Measured"}
                              unit="A"
                              value={value}
                              onValueChange={(text) => setAt(setAmps, index, text, "runningAmps")}
                              error={errors[`runningAmps.${index}`]}
                            />
                          ))}
                          <NumberField
                            label={target === "fan" ? "Nameplate FLA" : "Nameplate RLA"}
                            unit="A"
                            value={ratedA}
                            onValueChange={(text) => {
                              setRatedA(text);
                              edited("ratedA");
                            }}
                            error={errors.ratedA}
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
                    value={note}
                    onChange={(event) => {
                      setNote(event.target.value);
                      edited("note");
                    }}
                    error={errorFor(errors, "note")}
                    placeholder="e.g. contactor pitted, replaced"
                  />
                  {formError && <FormAlert>{formError}</FormAlert>}
                  <div className="flex flex-wrap items-center gap-3">
                    <Button type="submit" size="lg" disabled={create.isPending}>
                      <Save aria-hidden className="size-5" /> {create.isPending ? "Saving…" : "Save electrical check"}
                    </Button>
                    {saved && (
                      <span role="status" className="text-sm text-muted">
                        ✓ Saved and judged — see the check above
                      </span>
                    )}
                  </div>
                </>
              ),
            }
          : null
      }
    />
  );
}
