import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { judgeCylinderFill } from "@shared/engine/index.ts";
import type { CircuitNameplate } from "@shared/schemas/equipment.ts";
import {
  CYLINDER_KIND_LABELS,
  MOVEMENT_CYLINDER_RULES,
  MOVEMENT_KIND_LABELS,
  MOVEMENT_KINDS,
  MovementCreateSchema,
  type Cylinder,
  type MovementCreate,
} from "@shared/schemas/register.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField, TextField } from "@/components/ui/field/field.tsx";
import { movementsPath, useCreateMovement } from "@/lib/api/register.ts";
import { useEntryClientId } from "@/lib/drafts/use-entry-client-id.ts";
import { useKeepWhenOffline } from "@/features/offline/use-outbox.ts";
import { formatTime } from "@shared/format/date-time.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";
import { formatKg } from "../utils/format-register.ts";
import { NumberField, typedNumber } from "@/components/ui/field/number-field.tsx";
import { VerdictLine } from "./verdict-line.tsx";

type FormValues = Omit<MovementCreate, "kg"> & { kg: unknown };

const HINTS: Record<(typeof MOVEMENT_KINDS)[number], string> = {
  recovered: "Weigh the recovery cylinder before and after; the difference is what came out of the system.",
  reused: "Recovered refrigerant charged back into the same system, from the recovery cylinder or the unit's receiver.",
  "added-new": "Weighed out of a new (virgin) cylinder into the system.",
  "added-reclaimed": "Weighed out of a cylinder of reclaimed (reprocessed) refrigerant into the system.",
  "sent-for-reclaim": "Recovered refrigerant handed on from a recovery cylinder to a reclaimer.",
};

/**
 * Logs one register movement on the visit: what happened, how many kg, which cylinder (only
 * cylinders of the unit's refrigerant and of a kind that fits), which circuit. Before saving it
 * shows what the cylinder will hold afterwards and, for a recovery, the 80 % fill check.
 */
export function MovementForm({
  visitId,
  refrigerant,
  circuits,
  defaultCircuit,
  cylinders,
}: {
  visitId: string;
  refrigerant: string;
  circuits: readonly CircuitNameplate[];
  defaultCircuit: number;
  cylinders: readonly Cylinder[];
}) {
  const createMovement = useCreateMovement();
  // One id per movement, kept across retries: a save whose answer was lost is stored once (README decision 026).
  const entryId = useEntryClientId();
  const keepWhenOffline = useKeepWhenOffline();
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const form = useForm<FormValues>({
    resolver: zodResolver(MovementCreateSchema) as never,
    defaultValues: { kind: "recovered", circuit: defaultCircuit, kg: "", cylinderId: null, note: "" },
  });
  const errors = form.formState.errors;
  const [kind, cylinderId, typedKg] = useWatch({ control: form.control, name: ["kind", "cylinderId", "kg"] });
  const rule = MOVEMENT_CYLINDER_RULES[kind];
  const choices = cylinders.filter(
    (cylinder) => cylinder.refrigerant === refrigerant && rule.cylinderKinds.includes(cylinder.kind),
  );
  const chosen = choices.find((cylinder) => cylinder.id === cylinderId);
  // A cylinder picked for another kind of movement no longer fits: clear it rather than send it.
  useEffect(() => {
    if (cylinderId && !chosen) form.setValue("cylinderId", null);
  }, [cylinderId, chosen, form]);
  const massKg = typedNumber(typedKg);
  const validMass = typeof massKg === "number" && massKg > 0 ? massKg : null;

  let preview: React.ReactNode = null;
  if (chosen && validMass !== null) {
    const after = chosen.contentsKg + (rule.intoCylinder ? validMass : -validMass);
    const limit = chosen.kind === "recovery" ? chosen.fill.maxContentsKg : null;
    preview = (
      <div
        className="space-y-1 rounded-card border-2 border-rule bg-sunken p-3"
        aria-live="polite"
        data-testid="cylinder-preview"
      >
        <p>
          After this, {chosen.label} will hold <span className="num font-semibold">{formatKg(Math.max(0, after))}</span>
          {limit !== null && (
            <>
              {" "}
              of its <span className="num">{formatKg(limit)}</span> limit
            </>
          )}
          .
        </p>
        {rule.intoCylinder && limit !== null && after > limit ? (
          // The register refuses a movement past the limit, so say that, not a verdict on a fill that will not happen.
          <p className="font-medium text-fault" data-testid="overfill-refused">
            ⚠ Will be refused: that is past the 80 % fill limit (room for{" "}
            <span className="num">{formatKg(Math.max(0, limit - chosen.contentsKg))}</span>). Stop at the limit and
            switch to another recovery cylinder; log each cylinder&apos;s share.
          </p>
        ) : (
          rule.intoCylinder &&
          limit !== null && (
            <VerdictLine result={judgeCylinderFill({ contentsKg: after, maxContentsKg: limit })} showSource={false} />
          )
        )}
        {!rule.intoCylinder && after < 0 && (
          <p className="font-medium text-fault">
            ⚠ More than the register says is in the cylinder ({formatKg(chosen.contentsKg)}).
          </p>
        )}
      </div>
    );
  }

  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    setSaved(null);
    // The time it was made goes with it: if it waits on the device, it is stored with this time.
    const body = { ...(values as MovementCreate), clientId: entryId.take(), at: new Date().toISOString() };
    const what = `${MOVEMENT_KIND_LABELS[body.kind]}: ${formatKg(body.kg)}`;
    try {
      const sent = await keepWhenOffline(() => createMovement.mutateAsync({ ...body, visitId }), {
        kind: "refrigerant-movement",
        visitId,
        label: `${what}, circuit ${body.circuit}`,
        path: movementsPath(visitId),
        takenAt: body.at,
        body,
      });
      entryId.release();
      form.reset({ kind: values.kind, circuit: values.circuit, cylinderId: values.cylinderId, kg: "", note: "" });
      if (sent.outcome === "kept") {
        setSaved(
          `${what} kept on this device (${formatTime(body.at)}); it goes in the register when the signal returns.`,
        );
      } else {
        const { movement, cylinder } = sent.stored;
        setSaved(
          `${MOVEMENT_KIND_LABELS[movement.kind]}: ${formatKg(movement.kg)} logged${cylinder ? `; ${cylinder.label} now holds ${formatKg(cylinder.contentsKg)}` : ""}.`,
        );
      }
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["kind", "kg", "cylinderId", "circuit", "note"]));
    }
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label="Log a refrigerant movement">
      {formError && <FormAlert>{formError}</FormAlert>}
      {saved && <FormAlert tone="good">{saved}</FormAlert>}
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField label="What happened" hint={HINTS[kind]} error={errors.kind?.message} {...form.register("kind")}>
          {MOVEMENT_KINDS.filter((value) => value !== "sent-for-reclaim").map((value) => (
            <option key={value} value={value}>
              {MOVEMENT_KIND_LABELS[value]}
            </option>
          ))}
        </SelectField>
        {circuits.length > 1 ? (
          <SelectField
            label="Circuit"
            error={errors.circuit?.message}
            {...form.register("circuit", { valueAsNumber: true })}
          >
            {circuits.map((circuit) => (
              <option key={circuit.number} value={circuit.number}>
                Circuit {circuit.number} ({formatKg(circuit.factoryChargeKg)} nameplate)
              </option>
            ))}
          </SelectField>
        ) : (
          <input type="hidden" {...form.register("circuit", { valueAsNumber: true })} />
        )}
        <NumberField
          unit="kg"
          label="Mass"
          placeholder="0.00"
          error={errors.kg?.message}
          registration={form.register("kg", { setValueAs: typedNumber })}
          hint="Weighed on the refrigerant scale."
        />
        <SelectField
          label={rule.cylinderRequired ? "Cylinder" : "Cylinder (if one was used)"}
          error={errors.cylinderId?.message}
          hint={
            choices.length === 0
              ? `No ${rule.cylinderKinds.map((value) => CYLINDER_KIND_LABELS[value].toLowerCase()).join(" or ")} ${refrigerant} cylinder yet: add one on the Cylinders page.`
              : `Only ${refrigerant} cylinders of the right kind are listed.`
          }
          {...form.register("cylinderId", {
            setValueAs: (value: unknown) => (value === "" || value == null ? null : value),
          })}
        >
          <option value="">{rule.cylinderRequired ? "Choose a cylinder" : "No cylinder (unit's own receiver)"}</option>
          {choices.map((cylinder) => (
            <option key={cylinder.id} value={cylinder.id}>
              {cylinder.label} · {CYLINDER_KIND_LABELS[cylinder.kind]} · holds {formatKg(cylinder.contentsKg)}
            </option>
          ))}
        </SelectField>
      </div>
      {preview}
      <TextField
        label="Note (optional)"
        placeholder="e.g. recovered for compressor change"
        error={errors.note?.message}
        {...form.register("note")}
      />
      <Button type="submit" disabled={createMovement.isPending}>
        {createMovement.isPending ? "Saving…" : "Log movement"}
      </Button>
    </form>
  );
}
