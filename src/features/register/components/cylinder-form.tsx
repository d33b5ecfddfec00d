import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { REFRIGERANT_CATALOGUE } from "@shared/property-tables/refrigerant-catalogue.ts";
import {
  CYLINDER_KIND_LABELS,
  CYLINDER_KINDS,
  CylinderCreateSchema,
  type CylinderCreate,
} from "@shared/schemas/register.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField, TextField } from "@/components/ui/field/field.tsx";
import { useCreateCylinder } from "@/lib/api/register.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";
import { NumberField, typedNumber } from "@/components/ui/field/number-field.tsx";

type FormValues = Omit<CylinderCreate, "waterCapacityKg" | "tareKg" | "initialContentsKg"> & {
  waterCapacityKg: unknown;
  tareKg: unknown;
  initialContentsKg: unknown;
};

const asNumber = { setValueAs: typedNumber };

/** Adds a cylinder: the label and figures stamped on it, and what it holds today. */
export function CylinderForm({ onSaved }: { onSaved?: () => void }) {
  const createCylinder = useCreateCylinder();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<FormValues>({
    resolver: zodResolver(CylinderCreateSchema) as never,
    defaultValues: {
      label: "",
      serial: "",
      kind: "recovery",
      refrigerant: "R407C",
      waterCapacityKg: "",
      tareKg: "",
      initialContentsKg: 0,
    },
  });
  const errors = form.formState.errors;
  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await createCylinder.mutateAsync(values as CylinderCreate);
      form.reset();
      onSaved?.();
    } catch (error) {
      setFormError(
        applyServerErrors(error, form.setError, [
          "label",
          "serial",
          "kind",
          "refrigerant",
          "waterCapacityKg",
          "tareKg",
          "initialContentsKg",
        ]),
      );
    }
  });
  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label="Add a cylinder">
      {formError && <FormAlert>{formError}</FormAlert>}
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label="Label"
          placeholder="e.g. BM-REC-08"
          error={errors.label?.message}
          {...form.register("label")}
        />
        <TextField label="Serial (optional)" error={errors.serial?.message} {...form.register("serial")} />
        <SelectField label="Kind" error={errors.kind?.message} {...form.register("kind")}>
          {CYLINDER_KINDS.map((kind) => (
            <option key={kind} value={kind}>
              {CYLINDER_KIND_LABELS[kind]}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Refrigerant"
          error={errors.refrigerant?.message}
          hint="One refrigerant per cylinder."
          {...form.register("refrigerant")}
        >
          {REFRIGERANT_CATALOGUE.map((info) => (
            <option key={info.id} value={info.id}>
              {info.id}
            </option>
          ))}
        </SelectField>
        <NumberField
          unit="kg"
          label="Water capacity (WC)"
          registration={form.register("waterCapacityKg", asNumber)}
          error={errors.waterCapacityKg?.message}
          hint="Stamped on the collar, in kg of water."
        />
        <NumberField
          unit="kg"
          label="Tare (TW)"
          registration={form.register("tareKg", asNumber)}
          error={errors.tareKg?.message}
          hint="The empty cylinder's stamped weight."
        />
        <NumberField
          unit="kg"
          label="Contents today"
          registration={form.register("initialContentsKg", asNumber)}
          error={errors.initialContentsKg?.message}
          hint="Gross weight on the scale minus the tare; 0 for an empty recovery cylinder."
        />
      </div>
      <Button type="submit" disabled={createCylinder.isPending}>
        {createCylinder.isPending ? "Saving…" : "Add the cylinder"}
      </Button>
    </form>
  );
}
