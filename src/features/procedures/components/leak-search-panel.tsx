import { formatTime } from "@shared/format/date-time.ts";
import { Plus, Save, Trash2 } from "lucide-react";
import { useState } from "react";
import {
  LEAK_METHOD_LABELS,
  LEAK_METHODS,
  LEAK_SEVERITIES,
  LEAK_SEVERITY_LABELS,
  LeakSearchBodySchema,
  RECHECK_LABELS,
  RECHECK_RESULTS,
  type LeakMethod,
  type LeakSeverity,
  type RecheckResult,
} from "@shared/schemas/procedure-records.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField, TextField } from "@/components/ui/field/field.tsx";
import { Segmented } from "@/components/ui/field/segmented.tsx";
import { ApiError } from "@/lib/api/api-client.ts";
import { useCreateLeakSearch, useLeakSearches } from "@/lib/api/procedures.ts";
import { procedureRecordsPath } from "@/lib/api/procedure-paths.ts";
import { useEntryClientId } from "@/lib/drafts/use-entry-client-id.ts";
import { useKeepWhenOffline } from "@/features/offline/use-outbox.ts";
import { fieldMessages } from "@shared/schemas/field-messages.ts";
import { useFieldErrors } from "../hooks/use-field-errors.ts";
import { LeakSearchView } from "./leak-search-view.tsx";
import { ProcedureLayout } from "./procedure-layout.tsx";

type LeakRow = { location: string; severity: LeakSeverity; repair: string; repaired: boolean };
const emptyLeak = (): LeakRow => ({ location: "", severity: "small", repair: "", repaired: false });

/** The leak search: how, where, what was found and repaired, and what the recheck showed. */
export function LeakSearchPanel({
  visitId,
  canWrite,
  readOnlyNote,
}: {
  visitId: string;
  canWrite: boolean;
  readOnlyNote?: string;
}) {
  const searches = useLeakSearches(visitId);
  const create = useCreateLeakSearch();
  // One id per entry, kept across retries: a save whose answer was lost is stored once (README decision 026).
  const entryId = useEntryClientId();
  const keepWhenOffline = useKeepWhenOffline();
  const [method, setMethod] = useState<LeakMethod>("electronic-detector");
  const [places, setPlaces] = useState("");
  const [leaks, setLeaks] = useState<LeakRow[]>([]);
  const [recheck, setRecheck] = useState<RecheckResult>("not-done");
  const [note, setNote] = useState("");
  const [formError, setFormError] = useState<string | null>(null);

  const updateLeak = (index: number, change: Partial<LeakRow>) =>
    setLeaks((rows) => rows.map((row, at) => (at === index ? { ...row, ...change } : row)));
  // A message goes as soon as its field is changed.
  const [errors, setErrors] = useFieldErrors({ method, placesChecked: places, leaks, recheck, note });

  const save = async () => {
    setFormError(null);
    const body = {
      method,
      // One place per line or separated by semicolons, as a technician jots them down.
      placesChecked: places
        .split(/[\n;]/)
        .map((place) => place.trim())
        .filter(Boolean),
      leaks: leaks.map((leak) => ({
        location: leak.location,
        severity: leak.severity,
        repair: leak.repair.trim() || undefined,
        repaired: leak.repaired,
      })),
      recheck,
      note: note.trim() || undefined,
    };
    const parsed = LeakSearchBodySchema.safeParse(body);
    if (!parsed.success) {
      setErrors(fieldMessages(parsed.error));
      setFormError("Check the fields marked below");
      return;
    }
    setErrors({});
    try {
      // Taken now, by the device's clock; without a connection it waits in the outbox.
      const record = { ...body, clientId: entryId.take(), takenAt: new Date().toISOString() };
      await keepWhenOffline(() => create.mutateAsync({ visitId, ...record }), {
        kind: "leak-search",
        visitId,
        path: procedureRecordsPath("leak-searches", visitId),
        body: record,
      });
      entryId.release();
      setPlaces("");
      setLeaks([]);
      setRecheck("not-done");
      setNote("");
    } catch (error) {
      if (error instanceof ApiError) setErrors(error.fields);
      setFormError(error instanceof Error ? error.message : "The leak search was not saved. Try again.");
    }
  };

  return (
    <ProcedureLayout
      visitId={visitId}
      readOnlyNote={readOnlyNote}
      saved={{
        headingId: "leak-saved-heading",
        title: "Leak searches on this visit",
        kind: "leak-search",
        canVoid: canWrite,
        records: (searches.data?.leakSearches ?? []).map((search) => ({
          id: search.id,
          voided: search.voided,
          what: `the leak search of ${formatTime(search.takenAt)}`,
          element: <LeakSearchView search={search} />,
        })),
      }}
      loadError={searches.isError ? `The leak searches could not be loaded: ${searches.error.message}` : undefined}
      form={
        canWrite
          ? {
              label: "New leak search",
              title: "New leak search",
              onSubmit: () => void save(),
              children: (
                <>
                  <SelectField
                    label="Method"
                    value={method}
                    onChange={(event) => setMethod(event.target.value as LeakMethod)}
                    error={errors.method}
                  >
                    {LEAK_METHODS.map((value) => (
                      <option key={value} value={value}>
                        {LEAK_METHOD_LABELS[value]}
                      </option>
                    ))}
                  </SelectField>
                  <div className="space-y-1">
                    <label htmlFor="leak-places" className="block font-medium">
                      Places checked
                    </label>
                    <textarea
                      id="leak-places"
                      rows={3}
                      value={places}
                      onChange={(event) => setPlaces(event.target.value)}
                      aria-invalid={errors.placesChecked ? true : undefined}
                      aria-describedby="leak-places-hint"
                      placeholder={"Service valves and caps\nEvaporator U-bends\nFilter drier flare nuts"}
                      className="block w-full rounded-card border-2 border-rule bg-surface px-3 py-2 text-base aria-[invalid=true]:border-fault"
                    />
                    <p id="leak-places-hint" className="text-sm text-muted">
                      One place per line.
                    </p>
                    {errors.placesChecked && <p className="text-sm font-medium text-fault">⚠ {errors.placesChecked}</p>}
                  </div>

                  <fieldset className="space-y-3">
                    <legend className="font-semibold">Leaks found</legend>
                    {leaks.length === 0 && <p className="text-sm text-muted">None recorded. Add each leak you find.</p>}
                    {leaks.map((leak, index) => (
                      <div key={index} className="space-y-2 rounded-card border-2 border-rule p-3">
                        <div className="grid gap-3 sm:grid-cols-[1fr_14rem]">
                          <TextField
                            label={`Leak ${index + 1}: where`}
                            value={leak.location}
                            onChange={(event) => updateLeak(index, { location: event.target.value })}
                            error={errors[`leaks.${index}.location`]}
                            placeholder="e.g. Schrader core, suction service valve"
                          />
                          <SelectField
                            label="Severity"
                            value={leak.severity}
                            onChange={(event) => updateLeak(index, { severity: event.target.value as LeakSeverity })}
                          >
                            {LEAK_SEVERITIES.map((value) => (
                              <option key={value} value={value}>
                                {LEAK_SEVERITY_LABELS[value]}
                              </option>
                            ))}
                          </SelectField>
                        </div>
                        <TextField
                          label="Repair done"
                          value={leak.repair}
                          onChange={(event) => updateLeak(index, { repair: event.target.value })}
                          placeholder="e.g. core replaced, cap fitted"
                        />
                        <div className="flex flex-wrap items-center gap-3">
                          <label className="inline-flex min-h-touch items-center gap-2 font-medium">
                            <input
                              type="checkbox"
                              className="size-6"
                              checked={leak.repaired}
                              onChange={(event) => updateLeak(index, { repaired: event.target.checked })}
                            />{" "}
                            Repaired
                          </label>
                          <Button
                            variant="quiet"
                            onClick={() => setLeaks((rows) => rows.filter((_row, at) => at !== index))}
                          >
                            <Trash2 aria-hidden className="size-5" /> Remove leak {index + 1}
                          </Button>
                        </div>
                      </div>
                    ))}
                    <Button variant="secondary" onClick={() => setLeaks((rows) => [...rows, emptyLeak()])}>
                      <Plus aria-hidden className="size-5" /> Add a leak found
                    </Button>
                  </fieldset>

                  <div className="space-y-1">
                    <p className="font-medium">Recheck after repair</p>
                    <Segmented<RecheckResult>
                      label="Recheck after repair"
                      value={recheck}
                      onChange={setRecheck}
                      options={RECHECK_RESULTS.map((value) => ({ value, label: RECHECK_LABELS[value] }))}
                      className="flex-wrap"
                    />
                    {errors.recheck && <p className="text-sm font-medium text-fault">⚠ {errors.recheck}</p>}
                  </div>
                  <TextField
                    label="Note"
                    value={note}
                    onChange={(event) => setNote(event.target.value)}
                    error={errors.note}
                  />
                  {formError && <FormAlert>{formError}</FormAlert>}
                  <Button type="submit" size="lg" disabled={create.isPending}>
                    <Save aria-hidden className="size-5" /> {create.isPending ? "Saving…" : "Save leak search"}
                  </Button>
                </>
              ),
            }
          : null
      }
    />
  );
}
