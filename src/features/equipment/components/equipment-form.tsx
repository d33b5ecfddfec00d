import { zodResolver } from "@hookform/resolvers/zod";
import { Plus, Trash2 } from "lucide-react";
import { useMemo, useState } from "react";
import { useFieldArray, useForm, useWatch, type Path } from "react-hook-form";
import { REFRIGERANT_CATALOGUE } from "@shared/property-tables/refrigerant-catalogue.ts";
import { describeSafetyClass, safetyClasses } from "@shared/content/safety-classes.ts";
import { applicationText } from "@shared/content/applications.ts";
import { APPLICATIONS, METERING_DEVICES } from "@shared/schemas/diagnosis.ts";
import {
  DEFAULT_APPLICATION_BY_KIND,
  EQUIPMENT_KINDS,
  EquipmentInputSchema,
  MAX_CIRCUITS,
  type Equipment,
  type EquipmentInput,
  type EquipmentValues,
} from "@shared/schemas/equipment.ts";
import { CautionPanel } from "@/components/ui/caution-panel/caution-panel.tsx";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField, TextField } from "@/components/ui/field/field.tsx";
import { SafetyBadge } from "@/components/ui/safety-badge/safety-badge.tsx";
import { useCreateEquipment, useSites } from "@/lib/api/equipment.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";
import { capitalise, METERING_DEVICE_LABELS } from "../utils/nameplate-text.ts";
import { NewSitePanel } from "./new-site-panel.tsx";
import { NumberField, typedNumber } from "@/components/ui/field/number-field.tsx";

const numeric = { setValueAs: typedNumber };

/** A phase count is chosen, not typed: "" means not on the nameplate. */
const phaseValue = (value: unknown) => (value === "" || value == null ? undefined : Number(value));

/** After the messages render, focus the first field with one, in screen order. */
function focusFirstProblem(form: EventTarget | null | undefined) {
  if (!(form instanceof HTMLFormElement)) return;
  requestAnimationFrame(() => form.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus());
}

const blankCircuit = (number: number): EquipmentInput["circuits"][number] => ({
  number,
  factoryChargeKg: undefined as unknown as number,
  meteringDevice: "txv",
  targetSuperheatK: undefined,
  targetSubcoolingK: undefined,
  liquidLineLengthM: undefined,
});

const TOP_FIELDS = [
  "siteId",
  "name",
  "kind",
  "application",
  "location",
  "maker",
  "model",
  "serial",
  "refrigerant",
  "circuits",
  "compressorRlaA",
  "compressorLraA",
  "fanFlaA",
  "supplyVoltageV",
  "phases",
  "ratedHighSideKPa",
  "ratedLowSideKPa",
] as const satisfies readonly Path<EquipmentInput>[];
const CIRCUIT_FIELDS = [
  "factoryChargeKg",
  "meteringDevice",
  "targetSuperheatK",
  "targetSubcoolingK",
  "liquidLineLengthM",
] as const;

/** Every path a server message can land on, circuits included. */
function fieldPaths(circuitCount: number): Path<EquipmentInput>[] {
  const circuitPaths = Array.from({ length: circuitCount }, (_, index) =>
    CIRCUIT_FIELDS.map((field) => `circuits.${index}.${field}` as Path<EquipmentInput>),
  ).flat();
  return [...TOP_FIELDS, ...circuitPaths];
}

function Section({ title, children, description }: { title: string; description?: string; children: React.ReactNode }) {
  return (
    <fieldset className="space-y-4 rounded-card border-2 border-rule bg-surface p-4">
      <legend className="px-1 text-lg font-semibold">{title}</legend>
      {description && <p className="text-sm text-muted">{description}</p>}
      {children}
    </fieldset>
  );
}

/**
 * A unit's nameplate, checked field by field with the same schema the server applies. What the
 * technician typed stays in place whatever goes wrong; server messages land under their fields.
 */
export function EquipmentForm({ onCreated }: { onCreated: (equipment: Equipment) => void }) {
  const sites = useSites();
  const create = useCreateEquipment();
  const refrigerants = useMemo(
    () => [...REFRIGERANT_CATALOGUE].sort((a, b) => a.id.localeCompare(b.id, "en", { numeric: true })),
    [],
  );
  const [formError, setFormError] = useState<string | null>(null);
  const [addingSite, setAddingSite] = useState(false);

  const form = useForm<EquipmentInput, unknown, EquipmentValues>({
    resolver: zodResolver(EquipmentInputSchema),
    mode: "onTouched",
    // Fields register as they mount (the site list arrives later), so react-hook-form's own
    // focus could land mid-form; focusFirstProblem goes to the first one on screen instead.
    shouldFocusError: false,
    defaultValues: {
      siteId: "",
      name: "",
      kind: "" as EquipmentInput["kind"],
      application: "comfort-cooling",
      location: "",
      maker: "",
      model: "",
      serial: "",
      refrigerant: "",
      circuits: [blankCircuit(1)],
    },
  });
  const { errors } = form.formState;
  const circuits = useFieldArray({ control: form.control, name: "circuits" });
  const refrigerantId = useWatch({ control: form.control, name: "refrigerant" });
  const application = useWatch({ control: form.control, name: "application" });
  const kindField = form.register("kind");
  const chosen = refrigerants.find((info) => info.id === refrigerantId);
  const caution = chosen ? safetyClasses[chosen.safety.class].caution : null;
  const noSites = sites.isSuccess && sites.data.length === 0;

  const onSubmit = form.handleSubmit(
    async (values, event) => {
      setFormError(null);
      try {
        onCreated(await create.mutateAsync(values));
      } catch (error) {
        setFormError(applyServerErrors(error, form.setError, fieldPaths(values.circuits.length)));
        focusFirstProblem(event?.target);
      }
    },
    (_errors, event) => focusFirstProblem(event?.target),
  );

  function removeCircuit(index: number) {
    circuits.remove(index);
    // Circuits stay numbered 1…n, so readings can always name them.
    form.getValues("circuits").forEach((_, position) => form.setValue(`circuits.${position}.number`, position + 1));
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6">
      {formError && <FormAlert>{formError}</FormAlert>}
      {Object.keys(errors).length > 0 && !formError && (
        <FormAlert>Some fields need attention — each one says what is wrong underneath it.</FormAlert>
      )}

      <Section title="Where it is">
        {sites.isPending && <p>Loading sites…</p>}
        {sites.isError && <FormAlert>{sites.error.message}</FormAlert>}
        {sites.isSuccess && !noSites && (
          <div className="flex flex-wrap items-end gap-2">
            <div className="min-w-56 flex-1">
              <SelectField label="Site" error={errors.siteId?.message} {...form.register("siteId")}>
                <option value="">Choose the site…</option>
                {sites.data.map((site) => (
                  <option key={site.id} value={site.id}>
                    {site.name} · {site.customerName}
                  </option>
                ))}
              </SelectField>
            </div>
            {!addingSite && (
              <Button variant="secondary" onClick={() => setAddingSite(true)}>
                <Plus aria-hidden className="size-5" /> New site
              </Button>
            )}
          </div>
        )}
        {noSites && (
          <p className="text-sm">
            Your company has no sites yet. Add the first one here; the unit will be filed under it.
          </p>
        )}
        {(addingSite || noSites) && (
          <NewSitePanel
            onCancel={noSites ? undefined : () => setAddingSite(false)}
            onCreated={(site) => {
              setAddingSite(false);
              form.setValue("siteId", site.id, { shouldValidate: true });
            }}
          />
        )}
        {noSites && errors.siteId && <p className="text-sm font-medium text-fault">⚠ {errors.siteId.message}</p>}
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField
            label="Unit name"
            hint="What the crew calls it, e.g. “RTU-1”."
            error={errors.name?.message}
            {...form.register("name")}
          />
          <SelectField
            label="Kind"
            error={errors.kind?.message}
            {...kindField}
            onChange={(event) => {
              void kindField.onChange(event);
              // The kind suggests the application until the technician chooses one.
              const kind = event.target.value as keyof typeof DEFAULT_APPLICATION_BY_KIND;
              if (!form.getFieldState("application").isDirty && kind in DEFAULT_APPLICATION_BY_KIND) {
                form.setValue("application", DEFAULT_APPLICATION_BY_KIND[kind]);
              }
            }}
          >
            <option value="">Choose the kind…</option>
            {EQUIPMENT_KINDS.map((kind) => (
              <option key={kind} value={kind}>
                {capitalise(kind)}
              </option>
            ))}
          </SelectField>
        </div>
        <SelectField
          label="Application"
          hint={`${applicationText[application ?? "comfort-cooling"].hint}. Sets the bands its readings are judged against.`}
          error={errors.application?.message}
          {...form.register("application")}
        >
          {APPLICATIONS.map((value) => (
            <option key={value} value={value}>
              {applicationText[value].label}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Location on site (optional)"
          hint="e.g. “Roof, above the waiting room”."
          error={errors.location?.message}
          {...form.register("location")}
        />
      </Section>

      <Section title="Nameplate">
        <div className="grid gap-4 sm:grid-cols-3">
          <TextField label="Maker (optional)" error={errors.maker?.message} {...form.register("maker")} />
          <TextField label="Model (optional)" error={errors.model?.message} {...form.register("model")} />
          <TextField label="Serial (optional)" error={errors.serial?.message} {...form.register("serial")} />
        </div>
      </Section>

      <Section title="Refrigerant and circuits">
        <SelectField label="Refrigerant" error={errors.refrigerant?.message} {...form.register("refrigerant")}>
          <option value="">Choose the refrigerant…</option>
          {refrigerants.map((info) => (
            <option key={info.id} value={info.id}>
              {info.id} — {info.safety.class} · {info.name}
            </option>
          ))}
        </SelectField>
        {chosen && (
          <p className="flex flex-wrap items-center gap-2 text-sm" aria-live="polite">
            <SafetyBadge safetyClass={chosen.safety.class} />
            <span>{describeSafetyClass(chosen.safety.class)}</span>
          </p>
        )}
        {caution && <CautionPanel topic={caution} compact />}

        <div className="space-y-4">
          {circuits.fields.map((field, index) => {
            const circuitErrors = errors.circuits?.[index];
            return (
              <fieldset key={field.id} className="space-y-4 rounded-card border-2 border-dashed border-rule p-3">
                <legend className="px-1 font-semibold">Circuit {index + 1}</legend>
                <div className="grid gap-4 sm:grid-cols-2">
                  <NumberField
                    label="Factory charge"
                    unit="kg"
                    error={circuitErrors?.factoryChargeKg?.message}
                    registration={form.register(`circuits.${index}.factoryChargeKg`, numeric)}
                  />
                  <SelectField
                    label="Metering device"
                    error={circuitErrors?.meteringDevice?.message}
                    {...form.register(`circuits.${index}.meteringDevice`)}
                  >
                    {METERING_DEVICES.map((device) => (
                      <option key={device} value={device}>
                        {METERING_DEVICE_LABELS[device]}
                      </option>
                    ))}
                  </SelectField>
                  <NumberField
                    label="Maker's target superheat (optional)"
                    unit="K"
                    error={circuitErrors?.targetSuperheatK?.message}
                    registration={form.register(`circuits.${index}.targetSuperheatK`, numeric)}
                  />
                  <NumberField
                    label="Maker's target subcooling (optional)"
                    unit="K"
                    error={circuitErrors?.targetSubcoolingK?.message}
                    registration={form.register(`circuits.${index}.targetSubcoolingK`, numeric)}
                  />
                  <NumberField
                    label="Liquid line length (optional)"
                    unit="m"
                    hint="Between indoor and outdoor units; blank for a packaged unit."
                    error={circuitErrors?.liquidLineLengthM?.message}
                    registration={form.register(`circuits.${index}.liquidLineLengthM`, numeric)}
                  />
                </div>
                {circuits.fields.length > 1 && (
                  <Button variant="quiet" onClick={() => removeCircuit(index)}>
                    <Trash2 aria-hidden className="size-5" /> Remove circuit {index + 1}
                  </Button>
                )}
              </fieldset>
            );
          })}
          {errors.circuits?.root?.message && (
            <p className="text-sm font-medium text-fault">⚠ {errors.circuits.root.message}</p>
          )}
          {errors.circuits?.message && <p className="text-sm font-medium text-fault">⚠ {errors.circuits.message}</p>}
          {circuits.fields.length < MAX_CIRCUITS && (
            <Button variant="secondary" onClick={() => circuits.append(blankCircuit(circuits.fields.length + 1))}>
              <Plus aria-hidden className="size-5" /> Add circuit {circuits.fields.length + 1}
            </Button>
          )}
        </div>
      </Section>

      <Section title="Electrical" description="From the nameplate; leave blank what it does not state.">
        <div className="grid gap-4 sm:grid-cols-3">
          <NumberField
            label="Compressor RLA"
            unit="A"
            error={errors.compressorRlaA?.message}
            registration={form.register("compressorRlaA", numeric)}
          />
          <NumberField
            label="Compressor LRA"
            unit="A"
            error={errors.compressorLraA?.message}
            registration={form.register("compressorLraA", numeric)}
          />
          <NumberField
            label="Fan FLA"
            unit="A"
            error={errors.fanFlaA?.message}
            registration={form.register("fanFlaA", numeric)}
          />
          <NumberField
            label="Supply voltage"
            unit="V"
            error={errors.supplyVoltageV?.message}
            registration={form.register("supplyVoltageV", numeric)}
          />
          <SelectField
            label="Phases"
            error={errors.phases?.message}
            {...form.register("phases", { setValueAs: phaseValue })}
          >
            <option value="">Not stated</option>
            <option value="1">Single phase</option>
            <option value="3">Three phase</option>
          </SelectField>
        </div>
      </Section>

      <Section
        title="Rated pressures"
        description="Maximum allowable pressures from the nameplate, gauge. Pressure tests stay below these."
      >
        <div className="grid gap-4 sm:grid-cols-2">
          <NumberField
            label="High side"
            unit="kPa g"
            error={errors.ratedHighSideKPa?.message}
            registration={form.register("ratedHighSideKPa", numeric)}
          />
          <NumberField
            label="Low side"
            unit="kPa g"
            error={errors.ratedLowSideKPa?.message}
            registration={form.register("ratedLowSideKPa", numeric)}
          />
        </div>
      </Section>

      <Button type="submit" size="lg" className="w-full sm:w-auto" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? "Saving unit…" : "Save unit"}
      </Button>
    </form>
  );
}
