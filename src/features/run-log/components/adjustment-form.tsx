import { zodResolver } from "@hookform/resolvers/zod";
import { useQuery } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import {
  CYLINDER_KIND_LABELS,
  MOVEMENT_CYLINDER_RULES,
  MOVEMENT_KIND_LABELS,
  type CylinderKind,
  type MovementKind,
} from "@shared/schemas/register.ts";
import {
  ADJUSTMENT_KIND_LABELS,
  ADJUSTMENT_KINDS,
  AdjustmentCreateSchema,
  isChargeAdjustment,
  type AdjustmentCreate,
} from "@shared/schemas/visits.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField, TextField } from "@/components/ui/field/field.tsx";
import { cylindersQueryOptions } from "@/lib/api/register.ts";
import { adjustmentsPath, useCreateAdjustment, useVisit } from "@/lib/api/visits.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";
import { formatNumber } from "@/lib/units/display-units.ts";
import { useEntryClientId } from "@/lib/drafts/use-entry-client-id.ts";
import { useKeepWhenOffline } from "@/features/offline/use-outbox.ts";
import { formatTime } from "@shared/format/date-time.ts";

/**
 * The register movement a charge adjustment becomes with the cylinder chosen (the server
 * derives the same): removed goes into a recovery cylinder; added comes from a new or
 * reclaimed cylinder, or back out of a recovery cylinder as reuse.
 */
const movementFor = (kind: "charge-added" | "charge-removed", cylinderKind: CylinderKind): MovementKind =>
  kind === "charge-removed"
    ? "recovered"
    : cylinderKind === "new"
      ? "added-new"
      : cylinderKind === "reclaimed"
        ? "added-reclaimed"
        : "reused";

const kgText = (kg: number) => `${formatNumber(kg, 2)} kg`;

/**
 * Logs a change to the unit ("metering opened half a turn", "added 0.4 kg") on the timeline.
 * Refrigerant added or removed also asks for the cylinder: the server records it in the
 * register as the same entry (one movement, one figure), or refuses both.
 */
export function AdjustmentForm({
  visitId,
  circuit,
  onSaved,
}: {
  visitId: string;
  circuit: number;
  onSaved?: () => void;
}) {
  const createAdjustment = useCreateAdjustment();
  // One id per entry, kept across retries: a save whose answer was lost is stored once (README decision 026).
  const entryId = useEntryClientId();
  const [formError, setFormError] = useState<string | null>(null);
  // Logged without a connection: kept on the device, sent when the signal returns.
  const [keptAt, setKeptAt] = useState<string | null>(null);
  const keepWhenOffline = useKeepWhenOffline();
  const form = useForm<AdjustmentCreate>({
    resolver: zodResolver(AdjustmentCreateSchema),
    defaultValues: { kind: "metering", description: "", circuit, amountKg: null, cylinderId: null },
  });
  const [kind, cylinderId, amountKg] = useWatch({ control: form.control, name: ["kind", "cylinderId", "amountKg"] });
  const errors = form.formState.errors;
  const charge = isChargeAdjustment(kind) ? kind : null;
  // The visit is already in the cache (the run log reads it); its unit's refrigerant picks the cylinders.
  const refrigerant = useVisit(visitId).data?.refrigerant;
  const cylinders = useQuery({ ...cylindersQueryOptions({ refrigerant }), enabled: Boolean(charge && refrigerant) });
  const choices = charge
    ? (cylinders.data ?? []).filter((cylinder) =>
        MOVEMENT_CYLINDER_RULES[movementFor(charge, cylinder.kind)].cylinderKinds.includes(cylinder.kind),
      )
    : [];
  const chosen = choices.find((cylinder) => cylinder.id === cylinderId);
  // A cylinder picked for the other direction no longer fits: clear it rather than send it.
  useEffect(() => {
    if (cylinderId && cylinders.data && !chosen) form.setValue("cylinderId", null);
  }, [cylinderId, chosen, cylinders.data, form]);
  const movement = charge && chosen ? movementFor(charge, chosen.kind) : null;
  const validMass = typeof amountKg === "number" && Number.isFinite(amountKg) && amountKg > 0 ? amountKg : null;
  const after =
    chosen && movement && validMass !== null
      ? chosen.contentsKg + (MOVEMENT_CYLINDER_RULES[movement].intoCylinder ? validMass : -validMass)
      : null;

  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    setKeptAt(null);
    const clientId = entryId.take();
    // The time it was made, sent with it: if it waits on the device, it is stored with this time.
    const body = {
      ...values,
      circuit,
      cylinderId: charge ? values.cylinderId : null,
      clientId,
      at: values.at ?? new Date().toISOString(),
    };
    try {
      const sent = await keepWhenOffline(() => createAdjustment.mutateAsync({ ...body, visitId }), {
        kind: "adjustment",
        visitId,
        label: `${ADJUSTMENT_KIND_LABELS[values.kind]}, circuit ${circuit}`,
        path: adjustmentsPath(visitId),
        takenAt: body.at,
        body,
      });
      if (sent.outcome === "kept") setKeptAt(body.at);
      entryId.release();
      form.reset({ kind: values.kind, description: "", circuit, amountKg: null, cylinderId: values.cylinderId });
      onSaved?.();
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["kind", "description", "amountKg", "cylinderId"]));
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
        <TextField
          label="Description"
          placeholder="e.g. metering opened half a turn"
          error={errors.description?.message}
          {...form.register("description")}
        />
      </div>
      {charge && (
        <div className="grid gap-3 sm:grid-cols-[12rem_1fr]">
          <TextField
            label="Amount (kg)"
            inputMode="decimal"
            className="num max-w-40 text-xl"
            error={errors.amountKg?.message}
            {...form.register("amountKg", {
              setValueAs: (value: string) =>
                value === "" || value == null ? null : Number(String(value).replace(",", ".")),
            })}
          />
          <SelectField
            label={charge === "charge-removed" ? "Into cylinder" : "From cylinder"}
            hint={
              movement
                ? `Goes in the register as: ${MOVEMENT_KIND_LABELS[movement].toLowerCase()}`
                : `The register needs the cylinder: only ${refrigerant ?? "this unit's refrigerant"} cylinders are listed`
            }
            error={errors.cylinderId?.message}
            {...form.register("cylinderId", { setValueAs: (value: string) => (value ? value : null) })}
          >
            <option value="">{cylinders.isPending ? "Loading cylinders…" : "Choose a cylinder"}</option>
            {choices.map((cylinder) => (
              <option key={cylinder.id} value={cylinder.id}>
                {cylinder.label} · {CYLINDER_KIND_LABELS[cylinder.kind]} · {kgText(cylinder.contentsKg)} in it
              </option>
            ))}
          </SelectField>
        </div>
      )}
      {charge && cylinders.isError && (
        <p role="alert" className="text-fault">
          ⚠ The cylinders did not load: {cylinders.error.message}
        </p>
      )}
      {charge && cylinders.data && choices.length === 0 && (
        <p role="status" className="font-medium text-caution">
          ⚠ No {refrigerant} cylinder fits: add it on the Cylinders page before logging refrigerant{" "}
          {charge === "charge-removed" ? "removed" : "added"}.
        </p>
      )}
      {chosen && after !== null && (
        <p className="text-sm" aria-live="polite" data-testid="adjustment-cylinder-after">
          After this, {chosen.label} will hold <span className="num font-semibold">{kgText(Math.max(0, after))}</span>
          {chosen.kind === "recovery" && chosen.fill.maxContentsKg !== null && (
            <> of its {kgText(chosen.fill.maxContentsKg)} fill limit</>
          )}
          .
        </p>
      )}
      <Button type="submit" variant="secondary" disabled={createAdjustment.isPending}>
        {createAdjustment.isPending ? "Saving…" : "Log adjustment"}
      </Button>
      {keptAt && (
        <p role="status" className="text-sm text-muted">
          Kept on this device ({formatTime(keptAt)}) — sent when online
        </p>
      )}
    </form>
  );
}
