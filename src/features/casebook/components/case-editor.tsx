import { zodResolver } from "@hookform/resolvers/zod";
import { useMemo, useState, type ReactNode } from "react";
import { Controller, useForm } from "react-hook-form";
import { z } from "zod";
import { fieldMessages, FORM_MESSAGE_KEY } from "@shared/schemas/field-messages.ts";
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
import { useFormValues } from "@/hooks/use-form-values.ts";
import { useRefrigerantTable } from "@/lib/api/refrigerant-tables.ts";
import { applyServerErrors, messageAt } from "@/lib/form-errors.ts";
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

/** What the form holds, named as the body's paths so the schema's and the server's messages land under the fields. */
interface TypedCase {
  title: string;
  difficulty: CaseDifficulty;
  story: CaseStory;
  /** The readings as typed, in the user's units. */
  input: Record<ReadingField, string> & {
    refrigerant: string;
    meteringDevice: MeteringDevice;
    liquidTempLocation: LiquidTempLocation;
  };
  reasoning: string;
  safetyTopics: SafetyNote["topic"][];
}

/** Where the server's field messages may land: every field is under one of these. */
const FIELD_NAMES = ["title", "difficulty", "story", "input", "reasoning", "safetyTopics"] as const;

function typedCase(item: Case | undefined, units: DisplayUnits, atmosphericKPa: number): TypedCase {
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
    input: {
      ...readings,
      refrigerant: item?.input.refrigerant ?? "R410A",
      meteringDevice: item?.input.meteringDevice ?? "txv",
      liquidTempLocation: item?.input.liquidTempLocation ?? "liquid-line",
    },
    reasoning: item?.reasoning ?? "",
    safetyTopics: item?.safetyTopics ?? [],
  };
}

/** The typed readings as the engine's SI-metric input, or the fields that are not numbers. */
function toInput(
  typed: TypedCase["input"],
  units: DisplayUnits,
  atmosphericKPa: number,
  chargeReference: ChargeReference | undefined,
): { input: Partial<DiagnosisInput>; errors: Record<string, string> } {
  const input: Record<string, unknown> = { refrigerant: typed.refrigerant, meteringDevice: typed.meteringDevice };
  if (typed.liquidTempLocation !== "liquid-line") input.liquidTempLocation = typed.liquidTempLocation;
  const errors: Record<string, string> = {};
  for (const { field, label, quantity, required } of CASE_READINGS) {
    const parsed = parseQuantity(typed[field], quantity, units, atmosphericKPa);
    if (parsed === "invalid") errors[`input.${field}`] = `${label} must be a number`;
    else if (parsed !== undefined) input[field] = Number(parsed.toFixed(3));
    else if (required) errors[`input.${field}`] = `${label} is needed`;
  }
  if (atmosphericKPa !== 101.325) input.atmosphericPressureKPa = atmosphericKPa;
  if (chargeReference) input.chargeReference = chargeReference;
  return { input: input as Partial<DiagnosisInput>, errors };
}

/**
 * What was typed, read as the shared schema's case: the readings converted to SI-metric, with
 * this form's own words for a reading it cannot read or a required one left out, and the
 * schema's messages for the rest, all at once.
 */
function caseSchema(units: DisplayUnits, atmosphericKPa: number, chargeReference: ChargeReference | undefined) {
  return z.custom<TypedCase>().transform((typed, context) => {
    const { input, errors } = toInput(typed.input, units, atmosphericKPa, chargeReference);
    const found = { ...errors };
    const parsed = CaseDraftSchema.safeParse({ ...typed, input });
    if (!parsed.success)
      for (const [field, message] of Object.entries(fieldMessages(parsed.error))) found[field] ??= message;
    for (const [field, message] of Object.entries(found))
      context.addIssue({ code: "custom", message, path: field === FORM_MESSAGE_KEY ? [] : field.split(".") });
    return parsed.success && Object.keys(found).length === 0 ? parsed.data : z.NEVER;
  });
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
  // Kept as it came (a case from a reading of a circuit with one); the editor does not change it.
  const chargeReference = item?.input.chargeReference;
  const form = useForm({
    resolver: zodResolver(caseSchema(units, atmosphericKPa, chargeReference)),
    defaultValues: typedCase(item, units, atmosphericKPa),
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const typed = useFormValues(form.control);
  const refrigerants = REFRIGERANT_IDS;
  const converted = useMemo(
    () => toInput(typed.input, units, atmosphericKPa, chargeReference),
    [typed.input, units, atmosphericKPa, chargeReference],
  );
  // The preview computes with the chosen refrigerant's table, loaded when it is picked.
  const tableLoaded = useRefrigerantTable(typed.input.refrigerant).isSuccess;

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
        steps: workedSolution(input, result, typed.reasoning.trim() || null),
      };
    } catch (error) {
      if (error instanceof DiagnosisInputError)
        return { problems: Object.values(error.fieldErrors).flat().concat(error.formErrors) };
      throw error;
    }
  }, [converted, typed.reasoning, tableLoaded]);

  const submit = form.handleSubmit(
    async (draft) => {
      setFormError(null);
      try {
        await onSave(draft);
      } catch (error) {
        // The server's message stays above the button, its field messages go under the fields.
        setFormError(applyServerErrors(error, form.setError, FIELD_NAMES) ?? (error as Error).message);
      }
    },
    () => setFormError("Some fields need attention"),
  );

  return (
    <form onSubmit={submit} noValidate className="grid gap-5 lg:grid-cols-[1fr_26rem]">
      <div className="space-y-5">
        <section className="space-y-3 rounded-card border-2 border-rule bg-surface p-4" aria-labelledby="editor-story">
          <h2 id="editor-story" className="text-xl font-semibold">
            Story
          </h2>
          <TextField label="Title" error={messageAt(errors, "title")} {...form.register("title")} />
          <SelectField label="Difficulty" {...form.register("difficulty")}>
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
              error={messageAt(errors, `story.${field}`)}
              {...form.register(`story.${field}`)}
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
              error={messageAt(errors, "input.refrigerant")}
              {...form.register("input.refrigerant")}
            >
              {refrigerants.map((id) => (
                <option key={id} value={id}>
                  {id}
                </option>
              ))}
            </SelectField>
            <SelectField label="Metering device" {...form.register("input.meteringDevice")}>
              {METERING_DEVICES.map((device) => (
                <option key={device} value={device}>
                  {METERING_LABELS[device]}
                </option>
              ))}
            </SelectField>
            <SelectField label="Liquid temperature taken on" {...form.register("input.liquidTempLocation")}>
              <option value="liquid-line">Liquid line (condenser outlet)</option>
              <option value="discharge-line">Discharge line (a mistake to teach)</option>
            </SelectField>
          </div>
          <div className="grid gap-3 sm:grid-cols-2">
            {CASE_READINGS.map(({ field, label, quantity, required }) => {
              const error = messageAt(errors, `input.${field}`);
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
                    invalid={Boolean(error)}
                    {...form.register(`input.${field}`)}
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
            error={messageAt(errors, "reasoning")}
            {...form.register("reasoning")}
          />
          <fieldset className="space-y-1">
            <legend className="font-medium">Hazards of this job (the refrigerant's class is added by itself)</legend>
            {/* Kept in the order they were ticked, as they are stored and shown. */}
            <Controller
              control={form.control}
              name="safetyTopics"
              render={({ field }) => (
                <>
                  {CASE_SAFETY_TOPICS.map((topic) => (
                    <label key={topic} className="flex min-h-touch items-center gap-3">
                      <input
                        type="checkbox"
                        className="size-5"
                        checked={field.value.includes(topic)}
                        onChange={(event) =>
                          field.onChange(
                            event.target.checked
                              ? [...field.value, topic]
                              : field.value.filter((other) => other !== topic),
                          )
                        }
                      />
                      {cautions[topic].title}
                    </label>
                  ))}
                </>
              )}
            />
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
