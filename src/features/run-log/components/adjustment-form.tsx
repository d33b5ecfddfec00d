import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { ADJUSTMENT_KIND_LABELS, ADJUSTMENT_KINDS, AdjustmentCreateSchema, type AdjustmentCreate } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField, TextField } from "@/components/ui/field/field.tsx";
import { useCreateAdjustment } from "@/lib/api/visits.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";

/** Logs a change to the unit ("metering opened half a turn", "added 0.4 kg") on the timeline. */
export function AdjustmentForm({ visitId, circuit, onSaved }: { visitId: string; circuit: number; onSaved?: () => void }) {
  const createAdjustment = useCreateAdjustment();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<AdjustmentCreate>({
    resolver: zodResolver(AdjustmentCreateSchema),
    defaultValues: { kind: "metering", description: "", circuit, amountKg: null },
  });
  const kind = useWatch({ control: form.control, name: "kind" });
  const errors = form.formState.errors;

  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await createAdjustment.mutateAsync({ ...values, circuit, visitId });
      form.reset({ kind: values.kind, description: "", circuit, amountKg: null });
      onSaved?.();
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["kind", "description", "amountKg"]));
    }
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label="Log an adjustment">
      {formError && <FormAlert>{formError}</FormAlert>}
      <div className="grid gap-3 sm:grid-cols-[12rem_1fr]">
        <SelectField label="What changed" error={errors.kind?.message} {...form.register("kind")}>
          {ADJUSTMENT_KINDS.map((value) => (
            <option key={value} value={value}>
              {ADJUSTMENT_KIND_LABELS[value]}
            </option>
          ))}
        </SelectField>
        <TextField label="Description" placeholder="e.g. metering opened half a turn" error={errors.description?.message} {...form.register("description")} />
      </div>
      {kind.startsWith("charge-") && (
        <TextField
          label="Amount (kg)"
          inputMode="decimal"
          className="num max-w-40 text-xl"
          error={errors.amountKg?.message}
          {...form.register("amountKg", { setValueAs: (value: string) => (value === "" || value == null ? null : Number(String(value).replace(",", "."))) })}
        />
      )}
      <Button type="submit" variant="secondary" disabled={createAdjustment.isPending}>
        {createAdjustment.isPending ? "Saving…" : "Log adjustment"}
      </Button>
    </form>
  );
}
