import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { ReclaimCreateSchema, type Cylinder, type ReclaimCreate } from "@shared/schemas/register.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, TextField } from "@/components/ui/field/field.tsx";
import { useSendCylinderForReclaim } from "@/lib/api/register.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";
import { NumberField, typedNumber } from "@/components/ui/field/number-field.tsx";

type FormValues = Omit<ReclaimCreate, "kg"> & { kg: unknown };

/** Hands a recovery cylinder's contents to a reclaimer: a register entry with no visit. */
export function ReclaimForm({ cylinder }: { cylinder: Cylinder }) {
  const send = useSendCylinderForReclaim();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<FormValues>({
    resolver: zodResolver(ReclaimCreateSchema) as never,
    defaultValues: { kg: cylinder.contentsKg, note: "" },
  });
  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await send.mutateAsync({ ...(values as ReclaimCreate), cylinderId: cylinder.id });
      form.reset({ kg: 0, note: "" });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["kg", "note"]));
    }
  });
  return (
    <form onSubmit={submit} noValidate className="space-y-2" aria-label={`Send ${cylinder.label} for reclaim`}>
      {formError && <FormAlert>{formError}</FormAlert>}
      <div className="grid gap-2 sm:grid-cols-2">
        <NumberField
          unit="kg"
          label="Mass sent for reclaim"
          registration={form.register("kg", { setValueAs: typedNumber })}
          error={form.formState.errors.kg?.message}
        />
        <TextField
          label="Reclaimer or docket (optional)"
          error={form.formState.errors.note?.message}
          {...form.register("note")}
        />
      </div>
      <Button type="submit" variant="secondary" disabled={send.isPending}>
        Send for reclaim
      </Button>
    </form>
  );
}
