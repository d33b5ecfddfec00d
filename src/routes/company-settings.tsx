import { zodResolver } from "@hookform/resolvers/zod";
import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import {
  MAX_ALLOWED_DROP_KPA,
  MAX_TARGET_MICRONS,
  MIN_TARGET_MICRONS,
  ProcedureSettingsUpdateSchema,
  type ProcedureSettingsResponse,
} from "@shared/schemas/procedure-records.ts";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { StaleWriteNotice } from "@/components/ui/stale-write/stale-write-notice.tsx";
import { NumberField } from "@/components/ui/field/number-field.tsx";
import { parseDecimal } from "@/components/ui/field/number-input.tsx";
import { ApiError } from "@/lib/api/api-client.ts";
import { organisationSettingsQueryOptions, useUpdateOrganisationSettings } from "@/lib/api/organisation.ts";
import { loadQuery } from "@/lib/api/screen-data.ts";

const LABELS = {
  evacuationTargetMicrons: "Evacuation target (µm)",
  pressureTestAllowedDropKPa: "Allowed pressure drop (kPa)",
} as const;

type Limit = keyof typeof LABELS;
type TypedLimits = Record<Limit, string>;

const asText = (value: number | null) => (value === null ? "" : String(value));
/** "" clears the override; unreadable text goes through as text so the schema names the field. */
const asValue = (text: string) => {
  const parsed = parseDecimal(text);
  return parsed === undefined ? null : parsed === "invalid" ? text : parsed;
};
const typedOf = (settings: ProcedureSettingsResponse["settings"]): TypedLimits => ({
  evacuationTargetMicrons: asText(settings.evacuationTargetMicrons),
  pressureTestAllowedDropKPa: asText(settings.pressureTestAllowedDropKPa),
});
/** Both limits as the PATCH body's schema reads them; only the changed ones are sent. */
const LimitsFormSchema = z.preprocess(
  (typed: TypedLimits) => ({
    evacuationTargetMicrons: asValue(typed.evacuationTargetMicrons),
    pressureTestAllowedDropKPa: asValue(typed.pressureTestAllowedDropKPa),
  }),
  ProcedureSettingsUpdateSchema,
);

function SettingsForm({
  current,
  onReload,
  reloading,
}: {
  current: ProcedureSettingsResponse;
  onReload: () => Promise<unknown>;
  reloading: boolean;
}) {
  const form = useForm({ resolver: zodResolver(LimitsFormSchema), defaultValues: typedOf(current.settings) });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const [stale, setStale] = useState<{ message: string; typed: [string, string][] } | null>(null);
  const update = useUpdateOrganisationSettings();
  // Only what changed is sent (PATCH), so a colleague's change to the other limit is kept.
  const changedLimits = (typed: TypedLimits) =>
    (Object.keys(LABELS) as Limit[]).filter((field) => typed[field] !== typedOf(current.settings)[field]);

  const save = async (body: z.output<typeof LimitsFormSchema>) => {
    const typed = form.getValues();
    const changed = changedLimits(typed);
    try {
      await update.mutateAsync({
        ...Object.fromEntries(changed.map((field) => [field, body[field]])),
        version: current.version,
      });
      setSaved(true);
    } catch (error) {
      if (error instanceof ApiError && error.isStale) {
        setStale({ message: error.message, typed: changed.map((field) => [LABELS[field], typed[field]]) });
        return;
      }
      if (error instanceof ApiError) {
        for (const [field, message] of Object.entries(error.fields))
          form.setError(field as Limit, { type: "server", message });
      }
      setFormError(error instanceof ApiError ? error.message : "The settings were not saved");
    }
  };

  const submit = () => {
    setSaved(false);
    setStale(null);
    setFormError(null);
    if (changedLimits(form.getValues()).length === 0) return setSaved(true);
    return form.handleSubmit(save)();
  };

  // Loads the saved limits into the form; what the person typed stays listed in the notice.
  const reload = async () => {
    const latest = (await onReload()) as { data?: ProcedureSettingsResponse } | undefined;
    if (latest?.data) form.reset(typedOf(latest.data.settings));
    setStale((shown) =>
      shown
        ? { ...shown, message: "These are the limits as saved now. Make your change again if it still applies." }
        : null,
    );
  };

  return (
    <form
      className="space-y-4 rounded-card border-2 border-rule bg-surface p-4"
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        void submit();
      }}
    >
      {formError && <FormAlert>{formError}</FormAlert>}
      {stale && (
        <StaleWriteNotice
          message={stale.message}
          typed={stale.typed}
          onReload={() => void reload()}
          reloading={reloading}
        />
      )}
      {saved && <FormAlert tone="good">Saved: new procedures on every visit use these limits</FormAlert>}
      <NumberField
        label="Evacuation target"
        unit="µm"
        registration={form.register("evacuationTargetMicrons", { onChange: () => setSaved(false) })}
        error={errors.evacuationTargetMicrons?.message}
        hint={`${MIN_TARGET_MICRONS}–${MAX_TARGET_MICRONS} µm. Leave empty for ${current.defaults.evacuationTargetMicrons} microns, the trade norm`}
      />
      <NumberField
        label="Allowed pressure drop in a nitrogen test (after temperature correction)"
        unit="kPa"
        registration={form.register("pressureTestAllowedDropKPa", { onChange: () => setSaved(false) })}
        error={errors.pressureTestAllowedDropKPa?.message}
        hint={`0–${MAX_ALLOWED_DROP_KPA} kPa. Leave empty for ${current.defaults.pressureTestAllowedDropKPa} kPa: gauge resolution plus thermometer error near 4 MPa`}
      />
      <Button type="submit" disabled={update.isPending}>
        {update.isPending ? "Saving…" : "Save limits"}
      </Button>
    </form>
  );
}

/** The company's limits before the screen renders. */
export const clientLoader = (queryClient: QueryClient) => () =>
  loadQuery(queryClient, organisationSettingsQueryOptions());

function Settings() {
  const settings = useSuspenseQuery(organisationSettingsQueryOptions());
  return <SettingsForm current={settings.data} onReload={() => settings.refetch()} reloading={settings.isFetching} />;
}

export default function CompanySettingsRoute() {
  return (
    <div className="max-w-2xl space-y-4">
      <header>
        <h1 className="text-2xl font-semibold">Company limits</h1>
        <p className="mt-1 text-muted">
          Where your local code or your customers ask for stricter limits than Satura's defaults, set them here. Local
          codes, the maker's instructions and licensed practice decide.
        </p>
      </header>
      <ScreenBoundary
        pending={<p aria-busy="true">Loading…</p>}
        failed={(error) => (
          <p role="alert" className="font-medium text-fault">
            ⚠ {error.message}
          </p>
        )}
      >
        <Settings />
      </ScreenBoundary>
    </div>
  );
}
