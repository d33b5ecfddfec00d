import { zodResolver } from "@hookform/resolvers/zod";
import { Play } from "lucide-react";
import { useId, useState } from "react";
import { useForm, type UseFormRegisterReturn } from "react-hook-form";
import { VisitCreateSchema, type Visit } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField } from "@/components/ui/field/field.tsx";
import { useEquipmentList } from "@/lib/api/equipment.ts";
import { useCreateVisit } from "@/lib/api/visits.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";
import { cn } from "@/lib/cn.ts";

function EquipmentPicker({
  error,
  registration,
}: {
  error?: string;
  registration: UseFormRegisterReturn<"equipmentId">;
}) {
  const equipment = useEquipmentList();
  if (equipment.isPending) return <p>Loading equipment…</p>;
  if (equipment.isError) return <FormAlert>{equipment.error.message}</FormAlert>;
  return (
    <SelectField label="Equipment" error={error} {...registration}>
      <option value="">Choose the unit…</option>
      {equipment.data.map((unit) => (
        <option key={unit.id} value={unit.id}>
          {unit.name} · {unit.siteName} ({unit.refrigerant})
        </option>
      ))}
    </SelectField>
  );
}

/**
 * Opens a visit: which unit (fixed when started from its page) and why the crew is there.
 * The same schema as POST /api/visits checks it before it is sent.
 */
export function StartVisitForm({
  equipmentId,
  onStarted,
  className,
}: {
  equipmentId?: string;
  onStarted: (visit: Visit) => void;
  className?: string;
}) {
  const create = useCreateVisit();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm({
    resolver: zodResolver(VisitCreateSchema),
    defaultValues: { equipmentId: equipmentId ?? "", reason: "" },
  });
  const { errors } = form.formState;
  const reasonId = useId();

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      onStarted(await create.mutateAsync(values));
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["equipmentId", "reason"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className={cn("space-y-3", className)}>
      {formError && <FormAlert>{formError}</FormAlert>}
      {equipmentId ? (
        <input type="hidden" {...form.register("equipmentId")} />
      ) : (
        <EquipmentPicker error={errors.equipmentId?.message} registration={form.register("equipmentId")} />
      )}
      {equipmentId && errors.equipmentId && (
        <p className="text-sm font-medium text-fault">⚠ {errors.equipmentId.message}</p>
      )}
      <div className="space-y-1">
        <label htmlFor={reasonId} className="block font-medium">
          Reason for the visit <span className="font-normal text-muted">(can wait until you submit for review)</span>
        </label>
        <textarea
          id={reasonId}
          rows={2}
          placeholder="e.g. “Not cooling; tenant reports warm air from the supply grilles”"
          aria-invalid={errors.reason ? true : undefined}
          aria-describedby={errors.reason ? `${reasonId}-error` : undefined}
          className="block min-h-touch w-full rounded-card border-2 border-rule bg-surface px-3 py-2 text-base focus-visible:border-ink aria-[invalid=true]:border-fault"
          {...form.register("reason")}
        />
        {errors.reason && (
          <p id={`${reasonId}-error`} className="text-sm font-medium text-fault">
            ⚠ {errors.reason.message}
          </p>
        )}
      </div>
      <Button type="submit" size="lg" disabled={form.formState.isSubmitting}>
        <Play aria-hidden className="size-5" />
        {form.formState.isSubmitting ? "Starting…" : "Start the visit"}
      </Button>
    </form>
  );
}
