import { zodResolver } from "@hookform/resolvers/zod";
import { Plus, Trash2 } from "lucide-react";
import { Controller, useFieldArray, useForm } from "react-hook-form";
import { z } from "zod";
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
import { SelectField, TextField } from "@/components/ui/field/field.tsx";
import { Segmented } from "@/components/ui/field/segmented.tsx";
import { useCreateLeakSearch, useLeakSearches } from "@/lib/api/procedures.ts";
import { procedureRecordsPath } from "@/lib/api/procedure-paths.ts";
import { messageAt } from "@/lib/form-errors.ts";
import { useProcedureSave } from "../hooks/use-procedure-save.ts";
import { LeakSearchView } from "./leak-search-view.tsx";
import { ProcedureLayout, type ProcedurePanelProps } from "./procedure-layout.tsx";

type LeakRow = { location: string; severity: LeakSeverity; repair: string; repaired: boolean };
const emptyLeak = (): LeakRow => ({ location: "", severity: "small", repair: "", repaired: false });

/** What the form holds, named as the body's fields so the schema's messages land under them. */
interface TypedLeakSearch {
  method: LeakMethod;
  placesChecked: string;
  leaks: LeakRow[];
  recheck: RecheckResult;
  note: string;
}

const EMPTY_SEARCH: TypedLeakSearch = {
  method: "electronic-detector",
  placesChecked: "",
  leaks: [],
  recheck: "not-done",
  note: "",
};

/** The body POST …/leak-searches takes, from what was typed. */
const toBody = (typed: TypedLeakSearch) => ({
  method: typed.method,
  // One place per line or separated by semicolons, as a technician jots them down.
  placesChecked: typed.placesChecked
    .split(/[\n;]/)
    .map((place) => place.trim())
    .filter(Boolean),
  leaks: typed.leaks.map((leak) => ({
    location: leak.location,
    severity: leak.severity,
    repair: leak.repair.trim() || undefined,
    repaired: leak.repaired,
  })),
  recheck: typed.recheck,
  note: typed.note.trim() || undefined,
});

/** The leak search: how, where, what was found and repaired, and what the recheck showed. */
export function LeakSearchPanel(panel: ProcedurePanelProps) {
  const { visitId } = panel;
  const searches = useLeakSearches(visitId);
  const create = useCreateLeakSearch();
  const form = useForm({
    resolver: zodResolver(z.preprocess(toBody, LeakSearchBodySchema)),
    defaultValues: EMPTY_SEARCH,
  });
  const leaks = useFieldArray({ control: form.control, name: "leaks" });
  const { errors } = form.formState;
  const save = useProcedureSave({
    form,
    visitId,
    mutation: create,
    stamp: "takenAt",
    entry: () => ({ kind: "leak-search", path: procedureRecordsPath("leak-searches", visitId) }),
    // The method stays: the next search on this visit is usually made the same way.
    cleared: (typed) => ({ ...EMPTY_SEARCH, method: typed.method }),
    notSaved: "The leak search was not saved. Try again.",
  });

  return (
    <ProcedureLayout
      {...panel}
      kind="leak-search"
      saved={{
        title: "Leak searches on this visit",
        records: searches.data?.leakSearches,
        name: "the leak search",
        view: (search) => <LeakSearchView search={search} />,
      }}
      loadError={searches.isError ? `The leak searches could not be loaded: ${searches.error.message}` : undefined}
      form={{
        label: "New leak search",
        save,
        saveLabel: "Save leak search",
        children: (
          <>
            <SelectField label="Method" error={errors.method?.message} {...form.register("method")}>
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
                aria-invalid={messageAt(errors, "placesChecked") ? true : undefined}
                aria-describedby="leak-places-hint"
                placeholder={"Service valves and caps\nEvaporator U-bends\nFilter drier flare nuts"}
                className="block w-full rounded-card border-2 border-rule bg-surface px-3 py-2 text-base aria-[invalid=true]:border-fault"
                {...form.register("placesChecked")}
              />
              <p id="leak-places-hint" className="text-sm text-muted">
                One place per line.
              </p>
              {messageAt(errors, "placesChecked") && (
                <p className="text-sm font-medium text-fault">⚠ {messageAt(errors, "placesChecked")}</p>
              )}
            </div>

            <fieldset className="space-y-3">
              <legend className="font-semibold">Leaks found</legend>
              {leaks.fields.length === 0 && (
                <p className="text-sm text-muted">None recorded. Add each leak you find.</p>
              )}
              {leaks.fields.map((leak, index) => (
                <div key={leak.id} className="space-y-2 rounded-card border-2 border-rule p-3">
                  <div className="grid gap-3 sm:grid-cols-[1fr_14rem]">
                    <TextField
                      label={`Leak ${index + 1}: where`}
                      error={messageAt(errors, `leaks.${index}.location`)}
                      placeholder="e.g. Schrader core, suction service valve"
                      {...form.register(`leaks.${index}.location`)}
                    />
                    <SelectField label="Severity" {...form.register(`leaks.${index}.severity`)}>
                      {LEAK_SEVERITIES.map((value) => (
                        <option key={value} value={value}>
                          {LEAK_SEVERITY_LABELS[value]}
                        </option>
                      ))}
                    </SelectField>
                  </div>
                  <TextField
                    label="Repair done"
                    placeholder="e.g. core replaced, cap fitted"
                    {...form.register(`leaks.${index}.repair`)}
                  />
                  <div className="flex flex-wrap items-center gap-3">
                    <label className="inline-flex min-h-touch items-center gap-2 font-medium">
                      <input type="checkbox" className="size-6" {...form.register(`leaks.${index}.repaired`)} />{" "}
                      Repaired
                    </label>
                    <Button variant="quiet" onClick={() => leaks.remove(index)}>
                      <Trash2 aria-hidden className="size-5" /> Remove leak {index + 1}
                    </Button>
                  </div>
                </div>
              ))}
              <Button variant="secondary" onClick={() => leaks.append(emptyLeak())}>
                <Plus aria-hidden className="size-5" /> Add a leak found
              </Button>
            </fieldset>

            <div className="space-y-1">
              <p className="font-medium">Recheck after repair</p>
              <Controller
                control={form.control}
                name="recheck"
                render={({ field }) => (
                  <Segmented<RecheckResult>
                    label="Recheck after repair"
                    value={field.value}
                    onChange={field.onChange}
                    options={RECHECK_RESULTS.map((value) => ({ value, label: RECHECK_LABELS[value] }))}
                    className="flex-wrap"
                  />
                )}
              />
              {errors.recheck && <p className="text-sm font-medium text-fault">⚠ {errors.recheck.message}</p>}
            </div>
            <TextField label="Note" error={errors.note?.message} {...form.register("note")} />
          </>
        ),
      }}
    />
  );
}
