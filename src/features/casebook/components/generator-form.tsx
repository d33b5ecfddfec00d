import { useState, type FormEvent } from "react";
import { useNavigate } from "react-router-dom";
import { chargeStateText } from "@shared/content/charge-states.ts";
import { GENERATOR_REFRIGERANTS } from "@shared/engine/index.ts";
import { applicationText } from "@shared/content/applications.ts";
import { GENERATOR_DEVICES, GENERATOR_FAULTS, type GeneratorFault } from "@shared/schemas/casebook.ts";
import { APPLICATIONS, type Application, type MeteringDevice } from "@shared/schemas/diagnosis.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField } from "@/components/ui/field/field.tsx";
import { paths } from "@/config/paths.ts";
import { useGenerateCase } from "@/lib/api/casebook.ts";
import { METERING_LABELS } from "../utils/case-readings.ts";

/** Pick an application, refrigerant, metering device and fault; the server's engine makes a new case from a fresh seed. */
export function GeneratorForm() {
  const navigate = useNavigate();
  const generate = useGenerateCase();
  const [refrigerant, setRefrigerant] = useState<string>("R410A");
  const [meteringDevice, setMeteringDevice] = useState<MeteringDevice>("txv");
  const [fault, setFault] = useState<GeneratorFault>("undercharged");
  const [application, setApplication] = useState<Application>("comfort-cooling");
  const devices = GENERATOR_DEVICES[application];

  function chooseApplication(next: Application) {
    setApplication(next);
    // Keep the device valid for the new application (a chiller has no fixed orifice).
    if (!GENERATOR_DEVICES[next].includes(meteringDevice)) setMeteringDevice(GENERATOR_DEVICES[next][0]!);
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    generate.mutate(
      { refrigerant, meteringDevice, fault, application },
      { onSuccess: (made) => navigate(paths.casebook.case.getHref(made.id)) },
    );
  }

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
          value={application}
          onChange={(event) => chooseApplication(event.target.value as Application)}
        >
          {APPLICATIONS.map((value) => (
            <option key={value} value={value}>
              {applicationText[value].label}
            </option>
          ))}
        </SelectField>
        <SelectField label="Refrigerant" value={refrigerant} onChange={(event) => setRefrigerant(event.target.value)}>
          {GENERATOR_REFRIGERANTS.map((id) => (
            <option key={id} value={id}>
              {id}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Metering device"
          value={meteringDevice}
          onChange={(event) => setMeteringDevice(event.target.value as MeteringDevice)}
        >
          {devices.map((device) => (
            <option key={device} value={device}>
              {METERING_LABELS[device]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Fault" value={fault} onChange={(event) => setFault(event.target.value as GeneratorFault)}>
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
