import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { fieldMessages } from "@shared/schemas/field-messages.ts";
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

const asText = (value: number | null) => (value === null ? "" : String(value));
/** "" clears the override; unreadable text goes through as text so the schema names the field. */
const asValue = (text: string) => {
  const parsed = parseDecimal(text);
  return parsed === undefined ? null : parsed === "invalid" ? text : parsed;
};

function SettingsForm({
  current,
  onReload,
  reloading,
}: {
  current: ProcedureSettingsResponse;
  onReload: () => Promise<unknown>;
  reloading: boolean;
}) {
  const [target, setTarget] = useState(asText(current.settings.evacuationTargetMicrons));
  const [drop, setDrop] = useState(asText(current.settings.pressureTestAllowedDropKPa));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState(false);
  const [stale, setStale] = useState<{ message: string; typed: [string, string][] } | null>(null);
  const update = useUpdateOrganisationSettings();
  // A corrected field drops its old message at once; the others keep theirs until the next save.
  const edit = (field: keyof typeof LABELS, set: (text: string) => void) => (text: string) => {
    set(text);
    setSaved(false);
    setErrors(({ [field]: _corrected, ...rest }) => rest);
  };

  const submit = async () => {
    setSaved(false);
    setStale(null);
    // Only what changed is sent (PATCH), so a colleague's change to the other limit is kept.
    const typed = { evacuationTargetMicrons: target, pressureTestAllowedDropKPa: drop };
    const changed = Object.fromEntries(
      Object.entries(typed)
        .filter(([field, text]) => text !== asText(current.settings[field as keyof typeof typed]))
        .map(([field, text]) => [field, asValue(text)]),
    );
    if (Object.keys(changed).length === 0) return setSaved(true);
    const parsed = ProcedureSettingsUpdateSchema.safeParse(changed);
    if (!parsed.success) {
      setErrors(fieldMessages(parsed.error));
      return;
    }
    setErrors({});
    try {
      await update.mutateAsync({ ...parsed.data, version: current.version });
      setSaved(true);
    } catch (error) {
      if (error instanceof ApiError && error.isStale) {
        setStale({
          message: error.message,
          typed: Object.keys(changed).map((field) => [
            LABELS[field as keyof typeof LABELS],
            typed[field as keyof typeof typed],
          ]),
        });
        return;
      }
      setErrors(
        error instanceof ApiError ? { ...error.fields, _: error.message } : { _: "The settings were not saved" },
      );
    }
  };

  // Loads the saved limits into the form; what the person typed stays listed in the notice.
  const reload = async () => {
    const latest = (await onReload()) as { data?: ProcedureSettingsResponse } | undefined;
    if (latest?.data) {
      setTarget(asText(latest.data.settings.evacuationTargetMicrons));
      setDrop(asText(latest.data.settings.pressureTestAllowedDropKPa));
    }
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
      {errors._ && <FormAlert>{errors._}</FormAlert>}
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
        value={target}
        onValueChange={edit("evacuationTargetMicrons", setTarget)}
        error={errors.evacuationTargetMicrons}
        hint={`${MIN_TARGET_MICRONS}–${MAX_TARGET_MICRONS} µm. Leave empty for ${current.defaults.evacuationTargetMicrons} microns, the trade norm`}
      />
      <NumberField
        label="Allowed pressure drop in a nitrogen test (after temperature correction)"
        unit="kPa"
        value={drop}
        onValueChange={edit("pressureTestAllowedDropKPa", setDrop)}
        error={errors.pressureTestAllowedDropKPa}
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
