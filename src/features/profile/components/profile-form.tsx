import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import {
  ATMOSPHERIC_PRESSURE_MAX_KPA,
  ATMOSPHERIC_PRESSURE_MIN_KPA,
  PRESSURE_UNITS,
  STANDARD_ATMOSPHERE_KPA,
  TEMPERATURE_UNITS,
  UpdateProfileSchema,
  type Profile,
} from "@shared/schemas/profile.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField, TextField } from "@/components/ui/field/field.tsx";
import { StaleWriteNotice } from "@/components/ui/stale-write/stale-write-notice.tsx";
import { ApiError } from "@/lib/api/api-client.ts";
import { useProfile, useUpdateProfile } from "@/lib/api/profile.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";

const TEMPERATURE_LABELS: Record<(typeof TEMPERATURE_UNITS)[number], string> = {
  C: "°C (Celsius)",
  F: "°F (Fahrenheit)",
};
const PRESSURE_LABELS: Record<(typeof PRESSURE_UNITS)[number], string> = { kPa: "kPa", psi: "psi", bar: "bar" };

const formValues = (profile: Profile) => ({
  name: profile.user.name,
  preferences: profile.preferences,
  licenceNumber: profile.licenceNumber ?? "",
});

export function ProfileForm({ profile }: { profile: Profile }) {
  const update = useUpdateProfile();
  const latest = useProfile();
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const [stale, setStale] = useState<{ message: string; typed: [string, string][] } | null>(null);
  const form = useForm({ resolver: zodResolver(UpdateProfileSchema), defaultValues: formValues(profile) });
  const { errors } = form.formState;

  // The saved profile goes into the form; what was typed stays listed in the notice.
  const reload = async () => {
    const fetched = await latest.refetch();
    if (fetched.data) form.reset(formValues(fetched.data));
    setStale((shown) =>
      shown
        ? { ...shown, message: "This is your profile as saved now. Make your change again if it still applies." }
        : null,
    );
  };

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setSaved(false);
    setStale(null);
    try {
      const next = await update.mutateAsync({ ...values, version: profile.version });
      form.reset(formValues(next));
      setSaved(true);
    } catch (error) {
      if (error instanceof ApiError && error.isStale) {
        const { preferences } = values;
        setStale({
          message: error.message,
          typed: [
            ["Name", values.name],
            ["Licence number", values.licenceNumber ?? ""],
            [
              "Units",
              `${TEMPERATURE_LABELS[preferences.temperatureUnit]}, ${PRESSURE_LABELS[preferences.pressureUnit]}`,
            ],
            ["Atmospheric pressure", `${preferences.atmosphericPressureKPa} kPa`],
          ],
        });
        return;
      }
      setFormError(
        applyServerErrors(error, form.setError, [
          "name",
          "licenceNumber",
          "preferences.temperatureUnit",
          "preferences.pressureUnit",
          "preferences.atmosphericPressureKPa",
        ]),
      );
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="max-w-xl space-y-4">
      {saved && <FormAlert tone="good">Settings saved.</FormAlert>}
      {formError && <FormAlert>{formError}</FormAlert>}
      {stale && (
        <StaleWriteNotice
          message={stale.message}
          typed={stale.typed}
          onReload={() => void reload()}
          reloading={latest.isFetching}
        />
      )}
      <TextField
        label="Your name"
        autoComplete="name"
        hint="Shown on the visits you record and sign."
        error={errors.name?.message}
        {...form.register("name")}
      />
      <TextField
        label="Refrigerant handling licence number (optional)"
        hint="Your licence or certificate number for handling refrigerant; printed beside your entries in the register export."
        autoComplete="off"
        error={errors.licenceNumber?.message}
        {...form.register("licenceNumber")}
      />
      <fieldset className="space-y-4 rounded-card border-2 border-rule p-4">
        <legend className="px-1 font-semibold">Display units</legend>
        <p className="text-sm text-muted">
          Satura stores every reading in °C and kPa; this only changes what screens show.
        </p>
        <SelectField
          label="Temperature"
          error={errors.preferences?.temperatureUnit?.message}
          {...form.register("preferences.temperatureUnit")}
        >
          {TEMPERATURE_UNITS.map((unit) => (
            <option key={unit} value={unit}>
              {TEMPERATURE_LABELS[unit]}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Pressure"
          error={errors.preferences?.pressureUnit?.message}
          {...form.register("preferences.pressureUnit")}
        >
          {PRESSURE_UNITS.map((unit) => (
            <option key={unit} value={unit}>
              {PRESSURE_LABELS[unit]}
            </option>
          ))}
        </SelectField>
      </fieldset>
      <TextField
        label="Default atmospheric pressure (kPa absolute)"
        type="number"
        inputMode="decimal"
        step="0.001"
        min={ATMOSPHERIC_PRESSURE_MIN_KPA}
        max={ATMOSPHERIC_PRESSURE_MAX_KPA}
        className="num"
        hint={`For the P–T tables and the casebook. On a visit, gauges read against the site's atmosphere: from its altitude, or ${STANDARD_ATMOSPHERE_KPA} kPa (sea level) when it has none.`}
        error={errors.preferences?.atmosphericPressureKPa?.message}
        {...form.register("preferences.atmosphericPressureKPa", { valueAsNumber: true })}
      />
      <Button type="submit" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? "Saving…" : "Save settings"}
      </Button>
    </form>
  );
}
