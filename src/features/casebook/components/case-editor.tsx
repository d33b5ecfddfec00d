import { useMemo, useState, type FormEvent, type ReactNode } from "react";
import { fieldMessages } from "@shared/schemas/field-messages.ts";
import { chargeStateText } from "@shared/content/charge-states.ts";
import { cautions } from "@shared/content/cautions.ts";
import { REFRIGERANT_IDS } from "@shared/property-tables/refrigerant-catalogue.ts";
import {
  authoredAnswers,
  chargeToAdd,
  diagnose,
  DiagnosisInputError,
  parseDiagnosisInput,
  workedSolution,
} from "@shared/engine/index.ts";
import {
  CASE_DIFFICULTIES,
  CASE_SAFETY_TOPICS,
  CaseDraftSchema,
  DIFFICULTY_LABELS,
  type Case,
  type CaseDifficulty,
  type CaseDraft,
  type CaseStory,
  type SafetyNote,
} from "@shared/schemas/casebook.ts";
import {
  METERING_DEVICES,
  type ChargeReference,
  type DiagnosisInput,
  type LiquidTempLocation,
  type MeteringDevice,
} from "@shared/schemas/diagnosis.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField, TextField } from "@/components/ui/field/field.tsx";
import { NumberInput } from "@/components/ui/field/number-input.tsx";
import { ChargeStateBadge } from "@/components/ui/state/charge-state-badge.tsx";
import { useRefrigerantTable } from "@/lib/api/refrigerant-tables.ts";
import type { DisplayUnits } from "@/lib/units/display-units.ts";
import { CASE_READINGS, METERING_LABELS } from "../utils/case-readings.ts";
import { formatQuantity, parseQuantity, unitLabel, withUnit } from "@/lib/units/quantities.ts";
import { signedKg } from "../utils/signed-kg.ts";
import { WorkedSteps } from "./worked-steps.tsx";

type ReadingField = (typeof CASE_READINGS)[number]["field"];
const STORY_FIELDS: { field: keyof CaseStory; label: string; hint: string }[] = [
  { field: "site", label: "Site", hint: "Invented, or a real site with the customer's name left out" },
  { field: "equipment", label: "Equipment", hint: "Kind of unit, refrigerant, metering device, nameplate targets" },
  { field: "complaint", label: "Complaint", hint: "What the customer or the technician noticed" },
  { field: "conditions", label: "Conditions", hint: "Weather, run time, anything unusual on the day" },
];

interface EditorState {
  title: string;
  difficulty: CaseDifficulty;
  story: CaseStory;
  refrigerant: string;
  meteringDevice: MeteringDevice;
  liquidTempLocation: LiquidTempLocation;
  readings: Record<ReadingField, string>;
  reasoning: string;
  safetyTopics: SafetyNote["topic"][];
  /** Kept as it came (a case from a reading of a circuit with one); the editor does not change it. */
  chargeReference?: ChargeReference;
}

function initialState(item: Case | undefined, units: DisplayUnits, atmosphericKPa: number): EditorState {
  const readings = Object.fromEntries(
    CASE_READINGS.map(({ field, quantity }) => {
      const value = item?.input[field];
      return [field, typeof value === "number" ? formatQuantity(value, quantity, units, atmosphericKPa) : ""];
    }),
  ) as Record<ReadingField, string>;
  return {
    title: item?.title ?? "",
    difficulty: item?.difficulty ?? "starter",
    story: item?.story ?? { site: "", equipment: "", complaint: "", conditions: "" },
    refrigerant: item?.input.refrigerant ?? "R410A",
    meteringDevice: item?.input.meteringDevice ?? "txv",
    liquidTempLocation: item?.input.liquidTempLocation ?? "liquid-line",
    readings,
    reasoning: item?.reasoning ?? "",
    safetyTopics: item?.safetyTopics ?? [],
    ...(item?.input.chargeReference ? { chargeReference: item.input.chargeReference } : {}),
  };
}

/** The typed readings as the engine's SI-metric input, or the fields that are not numbers. */
function toInput(
  state: EditorState,
  units: DisplayUnits,
  atmosphericKPa: number,
): { input: Partial<DiagnosisInput>; errors: Record<string, string> } {
  const input: Record<string, unknown> = { refrigerant: state.refrigerant, meteringDevice: state.meteringDevice };
  if (state.liquidTempLocation !== "liquid-line") input.liquidTempLocation = state.liquidTempLocation;
  const errors: Record<string, string> = {};
  for (const { field, label, quantity, required } of CASE_READINGS) {
    const parsed = parseQuantity(state.readings[field], quantity, units, atmosphericKPa);
    if (parsed === "invalid") errors[`input.${field}`] = `${label} must be a number`;
    else if (parsed !== undefined) input[field] = Number(parsed.toFixed(3));
    else if (required) errors[`input.${field}`] = `${label} is needed`;
  }
  if (atmosphericKPa !== 101.325) input.atmosphericPressureKPa = atmosphericKPa;
  if (state.chargeReference) input.chargeReference = state.chargeReference;
  return { input: input as Partial<DiagnosisInput>, errors };
}

/**
 * The author's form: story, readings in the user's units, reasoning and safety topics, with a
 * live preview of what the engine makes of the readings — the answers apprentices will be
 * scored against. Validated with the same schema the server uses.
 */
export function CaseEditor({
  item,
  units,
  atmosphericKPa,
  pending,
  onSave,
  notice,
}: {
  item?: Case;
  units: DisplayUnits;
  atmosphericKPa: number;
  pending: boolean;
  onSave: (draft: CaseDraft) => Promise<unknown>;
  /** Shown beside the save button, e.g. that a newer version was saved meanwhile. */
  notice?: ReactNode;
}) {
  const [state, setState] = useState(() => initialState(item, units, atmosphericKPa));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const refrigerants = REFRIGERANT_IDS;
  const converted = useMemo(() => toInput(state, units, atmosphericKPa), [state, units, atmosphericKPa]);
  // The preview computes with the chosen refrigerant's table, loaded when it is picked.
  const tableLoaded = useRefrigerantTable(state.refrigerant).isSuccess;

  const preview = useMemo(() => {
    if (Object.keys(converted.errors).length > 0 || !tableLoaded) return null;
    try {
      // The preview's readings pass the schema once here; diagnose() trusts them.
      const input = parseDiagnosisInput(converted.input);
      const result = diagnose(input);
      const expected = authoredAnswers(result);
      return {
        result,
        expected,
        toAdd: expected.chargeDeviation ? chargeToAdd(expected.chargeDeviation) : null,
        steps: workedSolution(input, result, state.reasoning.trim() || null),
      };
    } catch (error) {
      if (error instanceof DiagnosisInputError)
        return { problems: Object.values(error.fieldErrors).flat().concat(error.formErrors) };
      throw error;
    }
  }, [converted, state.reasoning, tableLoaded]);

  const setReading = (field: ReadingField) => (text: string) =>
    setState((current) => ({ ...current, readings: { ...current.readings, [field]: text } }));

  async function submit(event: FormEvent) {
    event.preventDefault();
    const parsed = CaseDraftSchema.safeParse({
      title: state.title,
      difficulty: state.difficulty,
      story: state.story,
      input: converted.input,
      reasoning: state.reasoning,
      safetyTopics: state.safetyTopics,
    });
    const found: Record<string, string> = { ...converted.errors };
    if (!parsed.success)
      for (const [field, message] of Object.entries(fieldMessages(parsed.error))) found[field] ??= message;
    setErrors(found);
    if (Object.keys(found).length > 0 || !parsed.success) {
      setFormError("Some fields need attention");
      return;
    }
    setFormError(null);
    try {
      await onSave(parsed.data);
    } catch (error) {
      const fields = (error as { fields?: Record<string, string> }).fields ?? {};
      setErrors(fields);
      setFormError((error as Error).message);
    }
  }

  return (
    <form onSubmit={submit} noValidate className="grid gap-5 lg:grid-cols-[1fr_26rem]">
      <div className="space-y-5">
        <section className="space-y-3 rounded-card border-2 border-rule bg-surface p-4" aria-labelledby="editor-story">
          <h2 id="editor-story" className="text-xl font-semibold">
            Story
          </h2>
          <TextField
            label="Title"
            value={state.title}
            error={errors.title}
            onChange={(event) => setState({ ...state, title: event.target.value })}
          />
          <SelectField
            label="Difficulty"
            value={state.difficulty}
            onChange={(event) => setState({ ...state, difficulty: event.target.value as CaseDifficulty })}
          >
            {CASE_DIFFICULTIES.map((value) => (
              <option key={value} value={value}>
                {DIFFICULTY_LABELS[value]}
              </option>
            ))}
          </SelectField>
          {STORY_FIELDS.map(({ field, label, hint }) => (
            <TextField
              key={field}
              label={label}
              hint={hint}
              value={state.story[field]}
              error={errors[`story.${field}`]}
              onChange={(event) => setState({ ...state, story: { ...state.story, [field]: event.target.value } })}
            />
          ))}
        </section>

        <section
          className="space-y-3 rounded-card border-2 border-rule bg-surface p-4"
          aria-labelledby="editor-readings"
        >
          <h2 id="editor-readings" className="text-xl font-semibold">
            Readings
          </h2>
          <div className="grid gap-3 sm:grid-cols-2">
            <SelectField
              label="Refrigerant"
              value={state.refrigerant}
              error={errors["input.refrigerant"]}
              onChange={(event) => setState({ ...state, refrigerant: event.target.value })}
            >
              {refrigerants.map((id) => (
                <option key={id} value={id}>
                  {id}
                </option>
              ))}
            </SelectField>
            <SelectField
              label="Metering device"
              value={state.meteringDevice}
              onChange={(event) => setState({ ...state, meteringDevice: event.target.value as MeteringDevice })}
            >
              {METERING_DEVICES.map((device) => (
                <option key={device} value={device}>
                  {METERING_LABELS[device]}
                </option>
              ))}
            </SelectField>
            <SelectField
              label="Liquid temperature taken on"
              value={state.liquidTempLocation}
              onChange={(event) => setState({ ...state, liquidTempLocation: event.target.value as LiquidTempLocation })}
            >
              <option value="liquid-line">Liquid line (condenser outlet)</option>
              <option value="discharge-line">Discharge line (a mistake to teach)</option>
            </SelectField>
          </div>
          <div className="grid gap-3 sm:grid-cols-2">
            {CASE_READINGS.map(({ field, label, quantity, required }) => {
              const error = errors[`input.${field}`];
              const id = `case-reading-${field}`;
              return (
                <div key={field} className="space-y-1">
                  <label htmlFor={id} className="block font-medium">
                    {label}
                    {required ? "" : " (optional)"}
                  </label>
                  <NumberInput
                    id={id}
                    unit={unitLabel(quantity, units)}
                    value={state.readings[field]}
                    invalid={Boolean(error)}
                    onChange={(event) => setReading(field)(event.target.value)}
                  />
                  {error && <p className="text-sm font-medium text-fault">⚠ {error}</p>}
                </div>
              );
            })}
          </div>
        </section>

        <section
          className="space-y-3 rounded-card border-2 border-rule bg-surface p-4"
          aria-labelledby="editor-reasoning"
        >
          <h2 id="editor-reasoning" className="text-xl font-semibold">
            Reasoning and safety
          </h2>
          <TextField
            label="Reasoning behind the verdict"
            hint="One or two sentences apprentices see after their attempt"
            value={state.reasoning}
            error={errors.reasoning}
            onChange={(event) => setState({ ...state, reasoning: event.target.value })}
          />
          <fieldset className="space-y-1">
            <legend className="font-medium">Hazards of this job (the refrigerant's class is added by itself)</legend>
            {CASE_SAFETY_TOPICS.map((topic) => (
              <label key={topic} className="flex min-h-touch items-center gap-3">
                <input
                  type="checkbox"
                  className="size-5"
                  checked={state.safetyTopics.includes(topic)}
                  onChange={(event) =>
                    setState({
                      ...state,
                      safetyTopics: event.target.checked
                        ? [...state.safetyTopics, topic]
                        : state.safetyTopics.filter((other) => other !== topic),
                    })
                  }
                />
                {cautions[topic].title}
              </label>
            ))}
          </fieldset>
        </section>
        {formError && <FormAlert>{formError}</FormAlert>}
        {notice}
        <Button type="submit" size="lg" disabled={pending}>
          {pending ? "Saving…" : item ? "Save changes" : "Save as draft"}
        </Button>
      </div>

      <aside
        aria-labelledby="preview-heading"
        className="space-y-3 self-start rounded-card border-2 border-ink bg-surface p-4 lg:sticky lg:top-4"
      >
        <h2 id="preview-heading" className="text-xl font-semibold">
          Preview: the answers
        </h2>
        <p className="text-sm text-muted">
          Worked out by the diagnosis engine from the readings; apprentices are scored against these.
        </p>
        {!preview && <p>Enter the four refrigerant readings to see the answers.</p>}
        {preview && "problems" in preview && (
          <ul className="list-disc space-y-1 pl-6 font-medium text-fault">
            {preview.problems!.map((problem) => (
              <li key={problem}>{problem}</li>
            ))}
          </ul>
        )}
        {preview && "expected" in preview && (
          <>
            <ChargeStateBadge state={preview.expected!.chargeState} />
            <p className="text-sm">{chargeStateText[preview.expected!.chargeState].nextStep}</p>
            <dl className="num grid grid-cols-[1fr_auto] gap-x-3 gap-y-1">
              <dt>Evaporating (dew)</dt>
              <dd>{withUnit(preview.expected!.evaporatingTempC, "temperature", units, 0)}</dd>
              <dt>Condensing (bubble)</dt>
              <dd>{withUnit(preview.expected!.condensingTempC, "temperature", units, 0)}</dd>
              <dt>Superheat</dt>
              <dd>{withUnit(preview.expected!.superheatK, "difference", units, 0)}</dd>
              <dt>Subcooling</dt>
              <dd>{withUnit(preview.expected!.subcoolingK, "difference", units, 0)}</dd>
              {preview.toAdd && (
                <>
                  <dt>Charge to add</dt>
                  <dd data-testid="preview-charge-to-add">{signedKg(preview.toAdd.kg)}</dd>
                </>
              )}
            </dl>
            {/* Says whether the case asks the charge to add, the same rule the server applies on save. */}
            <p className="text-sm text-muted">
              {preview.toAdd
                ? `Apprentices are also asked the charge to add, right from ${signedKg(preview.toAdd.lowKg)} to ${signedKg(preview.toAdd.highKg)} (${preview.expected!.chargeDeviation!.basis === "unit-reference" ? "against the circuit's own reference point" : "generic coefficients, a wide range"}).`
                : `No charge-to-add question: ${preview.result!.chargeDeviationNote ?? "the engine gives no estimate"}.`}
            </p>
            <details>
              <summary className="min-h-touch cursor-pointer py-2 font-medium">
                The working apprentices will see
              </summary>
              <WorkedSteps steps={preview.steps!} units={units} />
            </details>
          </>
        )}
      </aside>
    </form>
  );
}
