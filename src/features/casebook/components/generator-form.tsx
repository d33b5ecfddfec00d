import { zodResolver } from "@hookform/resolvers/zod";
import { useForm, useWatch } from "react-hook-form";
import { useNavigate } from "react-router-dom";
import { chargeStateText } from "@shared/content/charge-states.ts";
import { GENERATOR_REFRIGERANTS } from "@shared/engine/index.ts";
import { applicationText } from "@shared/content/applications.ts";
import { GenerateCaseSchema, GENERATOR_DEVICES, GENERATOR_FAULTS } from "@shared/schemas/casebook.ts";
import { APPLICATIONS, type Application } from "@shared/schemas/diagnosis.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField } from "@/components/ui/field/field.tsx";
import { paths } from "@/config/paths.ts";
import { useGenerateCase } from "@/lib/api/casebook.ts";
import { METERING_LABELS } from "../utils/case-readings.ts";

/** Pick an application, refrigerant, metering device and fault; the server's engine makes a new case from a fresh seed. */
export function GeneratorForm() {
  const navigate = useNavigate();
  const generate = useGenerateCase();
  const form = useForm({
    resolver: zodResolver(GenerateCaseSchema),
    defaultValues: {
      refrigerant: "R410A",
      meteringDevice: "txv",
      fault: "undercharged",
      application: "comfort-cooling",
    },
  });
  const { errors } = form.formState;
  const application = useWatch({ control: form.control, name: "application" }) ?? "comfort-cooling";
  const devices = GENERATOR_DEVICES[application];

  const submit = form.handleSubmit((options) =>
    generate.mutate(options, { onSuccess: (made) => void navigate(paths.casebook.case.getHref(made.id)) }),
  );

  return (
    <form
      onSubmit={submit}
      aria-labelledby="generator-heading"
      className="space-y-3 rounded-card border-2 border-rule bg-surface p-4"
    >
      <h2 id="generator-heading" className="text-xl font-semibold">
        Make a practice case
      </h2>
      <p className="text-muted">
        The engine draws a new, physically consistent case for the fault you choose, with the scatter of real probes and
        gauges. The fault is named only here — work it out as if you did not know.
      </p>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <SelectField
          label="Application"
          error={errors.application?.message}
          {...form.register("application", {
            onChange: (event: { target: { value: Application } }) => {
              const next = GENERATOR_DEVICES[event.target.value];
              // Keep the device valid for the new application (a chiller has no fixed orifice).
              if (!next.includes(form.getValues("meteringDevice"))) form.setValue("meteringDevice", next[0]!);
            },
          })}
        >
          {APPLICATIONS.map((value) => (
            <option key={value} value={value}>
              {applicationText[value].label}
            </option>
          ))}
        </SelectField>
        <SelectField label="Refrigerant" error={errors.refrigerant?.message} {...form.register("refrigerant")}>
          {GENERATOR_REFRIGERANTS.map((id) => (
            <option key={id} value={id}>
              {id}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Metering device"
          error={errors.meteringDevice?.message}
          {...form.register("meteringDevice")}
        >
          {devices.map((device) => (
            <option key={device} value={device}>
              {METERING_LABELS[device]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Fault" error={errors.fault?.message} {...form.register("fault")}>
          {GENERATOR_FAULTS.map((state) => (
            <option key={state} value={state}>
              {chargeStateText[state].title}
            </option>
          ))}
        </SelectField>
      </div>
      {generate.isError && <FormAlert>{generate.error.message}</FormAlert>}
      <Button type="submit" variant="secondary" disabled={generate.isPending}>
        {generate.isPending ? "Making the case…" : "Make a case"}
      </Button>
    </form>
  );
}
