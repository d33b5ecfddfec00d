import { zodResolver } from "@hookform/resolvers/zod";
import { useId } from "react";
import { useForm, type UseFormRegisterReturn } from "react-hook-form";
import { z } from "zod";
import { fieldMessages, FORM_MESSAGE_KEY } from "@shared/schemas/field-messages.ts";
import { chargeStateText } from "@shared/content/charge-states.ts";
import {
  AttemptAnswersSchema,
  CHARGE_ANSWER_FIELD,
  REASONING_MAX_LENGTH,
  type AttemptAnswers,
  type CycleAnswerField,
} from "@shared/schemas/casebook.ts";
import { CHARGE_STATES } from "@shared/schemas/diagnosis.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField, TextField } from "@/components/ui/field/field.tsx";
import { NumberInput, parseDecimal } from "@/components/ui/field/number-input.tsx";
import type { DisplayUnits } from "@/lib/units/display-units.ts";
import type { Quantity } from "@shared/schemas/reading-fields.ts";
import { parseQuantity, unitLabel } from "@/lib/units/quantities.ts";

const NUMBER_FIELDS: {
  field: "evaporatingTempC" | "condensingTempC" | "superheatK" | "subcoolingK";
  label: string;
  hint: string;
  quantity: Quantity;
}[] = [
  {
    field: "evaporatingTempC",
    label: "Evaporating saturation temperature",
    hint: "From the suction pressure",
    quantity: "temperature",
  },
  {
    field: "condensingTempC",
    label: "Condensing saturation temperature",
    hint: "From the liquid pressure",
    quantity: "temperature",
  },
  { field: "superheatK", label: "Superheat", hint: "Leave blank if it cannot be worked out", quantity: "difference" },
  { field: "subcoolingK", label: "Subcooling", hint: "Leave blank if it cannot be worked out", quantity: "difference" },
];

/** Measured-cycle questions (issue 18), shown only for cases that ask them; read off the pressure–enthalpy diagram. */
const CYCLE_FIELDS: Record<CycleAnswerField, { label: string; hint: string; quantity: "energy" | "difference" }> = {
  refrigeratingEffectKJPerKg: {
    label: "Refrigerating effect (h₁ − h₄)",
    hint: "From the diagram: suction enthalpy minus the liquid's",
    quantity: "energy",
  },
  dischargeSuperheatK: {
    label: "Discharge superheat",
    hint: "Discharge line minus the dew point at the discharge pressure",
    quantity: "difference",
  },
};

/** The charge-to-add question (issue 14), shown only for cases that ask it. */
const CHARGE_FIELD = {
  label: "Charge to add",
  hint: "Kilograms to add; negative to recover. Leave blank if these readings cannot give an estimate",
};

type Draft = Record<(typeof NUMBER_FIELDS)[number]["field"] | CycleAnswerField | typeof CHARGE_ANSWER_FIELD, string> & {
  chargeState: string;
  reasoning: string;
};
const EMPTY: Draft = {
  evaporatingTempC: "",
  condensingTempC: "",
  superheatK: "",
  subcoolingK: "",
  refrigeratingEffectKJPerKg: "",
  dischargeSuperheatK: "",
  chargeToAddKg: "",
  chargeState: "",
  reasoning: "",
};

function NumberAnswer({
  label,
  hint,
  unit,
  registration,
  error,
}: {
  label: string;
  hint: string;
  unit: string;
  registration: UseFormRegisterReturn;
  error?: string;
}) {
  const id = useId();
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block font-medium">
        {label}
      </label>
      <NumberInput
        id={id}
        unit={unit}
        invalid={Boolean(error)}
        aria-describedby={`${id}-hint${error ? ` ${id}-error` : ""}`}
        {...registration}
      />
      <p id={`${id}-hint`} className="text-sm text-muted">
        {hint}
      </p>
      {error && (
        <p id={`${id}-error`} className="text-sm font-medium text-fault">
          ⚠ {error}
        </p>
      )}
    </div>
  );
}

/**
 * What was typed, read as the shared schema's answers: each number converted to SI-metric, with
 * this form's own words for a number it cannot read or a saturation temperature left out, and
 * the schema's messages for the rest, all at once.
 */
function answersSchema(
  units: DisplayUnits,
  atmosphericKPa: number,
  cycleQuestions: readonly CycleAnswerField[],
  chargeQuestion: boolean,
) {
  return z.custom<Draft>().transform((draft, context) => {
    const found: Record<string, string> = {};
    const numbers: Record<string, number | null> = {};
    for (const { field, label, quantity } of NUMBER_FIELDS) {
      const parsed = parseQuantity(draft[field], quantity, units, atmosphericKPa);
      if (parsed === "invalid") found[field] = `${label} must be a number, e.g. 4.5`;
      numbers[field] = parsed === "invalid" || parsed === undefined ? null : parsed;
    }
    for (const field of cycleQuestions) {
      const { label, quantity } = CYCLE_FIELDS[field];
      const parsed =
        quantity === "energy"
          ? parseDecimal(draft[field])
          : parseQuantity(draft[field], quantity, units, atmosphericKPa);
      if (parsed === "invalid") found[field] = `${label} must be a number, e.g. 165`;
      numbers[field] = parsed === "invalid" || parsed === undefined ? null : parsed;
    }
    if (chargeQuestion) {
      const parsed = parseDecimal(draft[CHARGE_ANSWER_FIELD]);
      if (parsed === "invalid")
        found[CHARGE_ANSWER_FIELD] =
          `${CHARGE_FIELD.label} must be a number of kilograms, e.g. 0.6, or -0.4 to recover`;
      numbers[CHARGE_ANSWER_FIELD] = parsed === "invalid" || parsed === undefined ? null : parsed;
    }
    if (!draft.evaporatingTempC.trim()) found.evaporatingTempC ??= "Work out the evaporating temperature";
    if (!draft.condensingTempC.trim()) found.condensingTempC ??= "Work out the condensing temperature";
    const parsed = AttemptAnswersSchema.safeParse({
      ...numbers,
      chargeState: draft.chargeState || undefined,
      reasoning: draft.reasoning,
    });
    if (!parsed.success) {
      for (const [field, message] of Object.entries(fieldMessages(parsed.error)))
        found[field] ??= field === "chargeState" ? "Pick the charge state" : message;
    }
    for (const [field, message] of Object.entries(found))
      context.addIssue({ code: "custom", message, path: field === FORM_MESSAGE_KEY ? [] : [field] });
    return parsed.success && Object.keys(found).length === 0 ? parsed.data : z.NEVER;
  });
}

/**
 * The apprentice's answers in their display units. Each is converted to SI-metric before it
 * is checked with the shared schema and sent; the server does the scoring.
 */
export function AttemptForm({
  units,
  atmosphericKPa,
  pending,
  serverError,
  onSubmit,
  cycleQuestions = [],
  chargeQuestion = false,
}: {
  units: DisplayUnits;
  atmosphericKPa: number;
  pending: boolean;
  serverError: string | null;
  onSubmit: (answers: AttemptAnswers) => void;
  /** The case's measured-cycle questions, if any. */
  cycleQuestions?: readonly CycleAnswerField[];
  /** Whether the case asks the charge to add. */
  chargeQuestion?: boolean;
}) {
  const form = useForm({
    resolver: zodResolver(answersSchema(units, atmosphericKPa, cycleQuestions, chargeQuestion)),
    defaultValues: EMPTY,
  });
  const { errors } = form.formState;
  const submit = form.handleSubmit(onSubmit);

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-labelledby="attempt-heading"
      className="space-y-4 rounded-card border-2 border-rule bg-surface p-4"
    >
      <h2 id="attempt-heading" className="text-xl font-semibold">
        Your working
      </h2>
      <p className="text-muted">
        Answers count as right within ±0.5 K ({units.temperature === "F" ? "±0.9 °F" : "half a kelvin"})
        {cycleQuestions.includes("refrigeratingEffectKJPerKg") ? ", the refrigerating effect within ±5 kJ/kg" : ""}.
        {chargeQuestion && (
          <>
            {" "}
            The charge to add is right when it lies within the range of the engine's estimate; the range is shown after
            you answer.
          </>
        )}
      </p>
      <div className="grid gap-4 sm:grid-cols-2">
        {NUMBER_FIELDS.map(({ field, label, hint, quantity }) => (
          <NumberAnswer
            key={field}
            label={label}
            hint={hint}
            unit={unitLabel(quantity, units)}
            registration={form.register(field)}
            error={errors[field]?.message}
          />
        ))}
        {cycleQuestions.map((field) => (
          <NumberAnswer
            key={field}
            label={CYCLE_FIELDS[field].label}
            hint={CYCLE_FIELDS[field].hint}
            unit={CYCLE_FIELDS[field].quantity === "energy" ? "kJ/kg" : unitLabel("difference", units)}
            registration={form.register(field)}
            error={errors[field]?.message}
          />
        ))}
        {chargeQuestion && (
          <NumberAnswer
            label={CHARGE_FIELD.label}
            hint={CHARGE_FIELD.hint}
            unit="kg"
            registration={form.register(CHARGE_ANSWER_FIELD)}
            error={errors[CHARGE_ANSWER_FIELD]?.message}
          />
        )}
      </div>
      <SelectField label="Charge state" error={errors.chargeState?.message} {...form.register("chargeState")}>
        <option value="">Choose…</option>
        {CHARGE_STATES.map((state) => (
          <option key={state} value={state}>
            {chargeStateText[state].title}
          </option>
        ))}
      </SelectField>
      <TextField
        label="Your reasoning, in one line"
        hint="Which reading points where, e.g. “low subcooling on a TXV with high superheat”"
        maxLength={REASONING_MAX_LENGTH}
        error={errors.reasoning?.message}
        {...form.register("reasoning")}
      />
      {serverError && <FormAlert>{serverError}</FormAlert>}
      <Button type="submit" size="lg" disabled={pending}>
        {pending ? "Checking…" : "Check my answers"}
      </Button>
    </form>
  );
}
