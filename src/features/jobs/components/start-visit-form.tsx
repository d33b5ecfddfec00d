import { zodResolver } from "@hookform/resolvers/zod";
import { Play } from "lucide-react";
import { useId, useState } from "react";
import { useForm, type UseFormRegisterReturn } from "react-hook-form";
import type { Equipment } from "@shared/schemas/equipment.ts";
import { VisitCreateSchema, type Visit } from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField } from "@/components/ui/field/field.tsx";
import { SearchInput } from "@/components/ui/search-input/search-input.tsx";
import { useDebouncedValue } from "@/hooks/use-debounced-value.ts";
import { useEquipmentList } from "@/lib/api/equipment.ts";
import { useCreateVisit } from "@/lib/api/visits.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";
import { cn } from "@/lib/cn.ts";

/** Units listed under the search at once: a select this long is still quick to scan. */
const PICKER_PAGE = 20;

/**
 * The unit for the visit: a search the server answers (a moment after typing stops) narrows the
 * choice below it, so a company with thousands of units never loads them all. The chosen unit
 * stays a choice while another search runs, so what the form holds is always on screen.
 */
function EquipmentPicker({
  error,
  registration,
}: {
  error?: string;
  registration: UseFormRegisterReturn<"equipmentId">;
}) {
  const [query, setQuery] = useState("");
  const search = useDebouncedValue(query.trim());
  const equipment = useEquipmentList({ q: search || undefined, limit: PICKER_PAGE });
  const [chosen, setChosen] = useState<Equipment | null>(null);
  const searchId = useId();
  const found = equipment.data?.equipment ?? [];
  const choices = chosen && !found.some((unit) => unit.id === chosen.id) ? [chosen, ...found] : found;
  const searching = query.trim() !== search || equipment.isPlaceholderData;
  return (
    <div className="space-y-2">
      <div>
        <label htmlFor={searchId} className="font-medium">
          Find the unit
        </label>
        <SearchInput id={searchId} value={query} onChange={setQuery} placeholder="Name, site, customer, R32…" />
      </div>
      {equipment.isError && <FormAlert>{equipment.error.message}</FormAlert>}
      {equipment.isPending ? (
        <p role="status">Loading equipment…</p>
      ) : (
        <SelectField
          label="Equipment"
          error={error}
          hint={
            searching
              ? "Searching…"
              : found.length === 0
                ? `No unit matches “${search}”.`
                : equipment.data?.nextCursor
                  ? `The first ${found.length} units${search ? " found" : ""}: search to narrow the list.`
                  : undefined
          }
          {...registration}
          onChange={(event) => {
            setChosen(choices.find((unit) => unit.id === event.target.value) ?? null);
            void registration.onChange(event);
          }}
        >
          <option value="">Choose the unit…</option>
          {choices.map((unit) => (
            <option key={unit.id} value={unit.id}>
              {unit.name} · {unit.siteName} ({unit.refrigerant})
            </option>
          ))}
        </SelectField>
      )}
    </div>
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
