import { zodResolver } from "@hookform/resolvers/zod";
import { formatTime } from "@shared/format/date-time.ts";
import { CloudOff, Plus, Play, Power, Undo2 } from "lucide-react";
import { useState } from "react";
import { Controller, useForm } from "react-hook-form";
import { z } from "zod";
import { micronsToPa, paToMicrons } from "@shared/engine/index.ts";
import {
  EvacuationCreateSchema,
  EvacuationSampleBodySchema,
  MAX_TARGET_MICRONS,
  MIN_TARGET_MICRONS,
} from "@shared/schemas/procedure-records.ts";
import { isStanding } from "@shared/schemas/visits.ts";
import { CautionPanel } from "@/components/ui/caution-panel/caution-panel.tsx";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { Segmented } from "@/components/ui/field/segmented.tsx";
import { StaleWriteNotice } from "@/components/ui/stale-write/stale-write-notice.tsx";
import { VisitVoidAction } from "@/features/visit/components/visit-void-action.tsx";
import { VoidedRecord } from "@/components/ui/void-record/voided-record.tsx";
import { useNow } from "@/hooks/use-now.ts";
import { ApiError } from "@/lib/api/api-client.ts";
import {
  useAddEvacuationSample,
  useCreateEvacuation,
  useEvacuations,
  useUpdateEvacuation,
} from "@/lib/api/procedures.ts";
import { evacuationSamplesPath, procedureRecordsPath } from "@/lib/api/procedure-paths.ts";
import { formatNumber } from "@/lib/units/display-units.ts";
import { useOutboxEntries } from "@/features/offline/use-outbox.ts";
import { WaitingEntries } from "@/features/offline/waiting-entries.tsx";
import { useFormValues } from "@/hooks/use-form-values.ts";
import { useProcedureSave } from "../hooks/use-procedure-save.ts";
import { toNumber } from "../utils/parse-number.ts";
import { EvacuationChart } from "./lazy-evacuation-chart.tsx";
import { evacuationsOnDevice, type ShownEvacuation } from "../utils/evacuations-on-device.ts";
import { formatVacuum, VACUUM_LABEL, type VacuumUnit } from "./vacuum-units.ts";
import { EvacuationBadge, EvacuationSummary } from "./evacuation-view.tsx";
import { NumberField } from "@/components/ui/field/number-field.tsx";

/** Minutes since the evacuation started, to the tenth, by this device's clock. */
const minutesSince = (startedAt: string, now: number) =>
  Math.max(0, Math.round((now - new Date(startedAt).getTime()) / 6_000) / 10);
const fromDisplay = (value: number, unit: VacuumUnit) => (unit === "micron" ? value : paToMicrons(value));
/** A typed target carried over to the other unit when the technician switches (text that is not a number stays as typed). */
function convertTyped(text: string, from: VacuumUnit, to: VacuumUnit): string {
  const value = toNumber(text);
  if (from === to || value === undefined || Number.isNaN(value)) return text;
  return to === "micron" ? String(Math.round(paToMicrons(value))) : formatNumber(micronsToPa(value), 1);
}

/** What the reading form holds; a time still null fills itself in from the clock. */
interface TypedSample {
  microns: string;
  minutes: string | null;
  /** Typed beside "Pump valved off" (an update of the evacuation, not a reading); null: the last reading's time. */
  isolatedAtMinutes: string | null;
}

/** What the start form holds; a target still null is the company's figure. */
interface TypedStart {
  targetMicrons: string | null;
}

/** Readings entry for the evacuation in progress: the time fills itself in, the unit is the technician's choice. */
function SampleEntry({
  visitId,
  evacuation,
  unit,
  canWrite,
  onReload,
}: {
  visitId: string;
  evacuation: ShownEvacuation;
  unit: VacuumUnit;
  canWrite: boolean;
  onReload: () => Promise<unknown>;
}) {
  const now = useNow(5_000);
  const addSample = useAddEvacuationSample();
  const update = useUpdateEvacuation();
  const [actionError, setActionError] = useState<string | null>(null);
  const [stale, setStale] = useState<string | null>(null);
  const [reloading, setReloading] = useState(false);

  const autoMinutes = formatNumber(minutesSince(evacuation.startedAt, now), 1);
  const lastMinutes = evacuation.samples.at(-1)?.minutes;
  /** The body POST …/samples takes: the reading in microns, at the minutes typed or counted. */
  const toBody = (typed: TypedSample) => {
    const value = toNumber(typed.microns);
    return {
      microns: value === undefined || Number.isNaN(value) ? value : fromDisplay(value, unit),
      minutes: toNumber(typed.minutes ?? autoMinutes),
    };
  };
  const form = useForm<TypedSample, unknown, z.output<typeof EvacuationSampleBodySchema>>({
    resolver: zodResolver(z.preprocess(toBody, EvacuationSampleBodySchema)),
    defaultValues: { microns: "", minutes: null, isolatedAtMinutes: null },
  });
  const { errors } = form.formState;
  const save = useProcedureSave({
    form,
    visitId,
    mutation: addSample,
    // A sample kept on the device counts its minutes from the pump's start now, not when it arrives.
    record: (body, clientId) => ({
      ...body,
      minutes: body.minutes ?? minutesSince(evacuation.startedAt, Date.now()),
      clientId,
    }),
    // Readings of an evacuation still on the device go after it, in order, from the outbox: sent
    // now, they would reach the server before the evacuation they belong to.
    send: (sample) =>
      evacuation.onDevice
        ? Promise.reject(new ApiError(0, "Kept behind its evacuation"))
        : addSample.mutateAsync({ visitId, evacuationId: evacuation.id, ...sample }),
    entry: () => ({ kind: "evacuation-sample", path: evacuationSamplesPath(visitId, evacuation.id) }),
    // Cleared at once, so the next reading can be typed while this one saves; restored on failure.
    clearAtOnce: true,
    cleared: (typed) => ({ ...typed, microns: "", minutes: null }),
    notSaved: "The reading was not saved. Try again.",
    invalidMessage: null,
  });
  const typed = useFormValues(form.control);
  const minutesText = typed.minutes ?? autoMinutes;
  const isolationText = typed.isolatedAtMinutes ?? (lastMinutes !== undefined ? String(lastMinutes) : autoMinutes);

  const setIsolated = async (isolatedAtMinutes: number | null) => {
    save.dismiss();
    setActionError(null);
    setStale(null);
    try {
      await update.mutateAsync({
        visitId,
        evacuationId: evacuation.id,
        isolatedAtMinutes,
        version: evacuation.version,
      });
      form.setValue("isolatedAtMinutes", null);
    } catch (error) {
      // Another device valved off (or undid it) since this screen loaded: show theirs first.
      if (error instanceof ApiError && error.isStale) return setStale(error.message);
      if (error instanceof ApiError) {
        for (const [path, message] of Object.entries(error.fields))
          form.setError(path as keyof TypedSample, { type: "server", message });
      }
      setActionError(error instanceof Error ? error.message : "The change was not saved. Try again.");
    }
  };
  const formError = save.formError ?? actionError;

  if (!canWrite) return null;
  return (
    <div className="space-y-3">
      <form
        aria-label="Enter a gauge reading"
        noValidate
        className="grid grid-cols-2 items-end gap-3 sm:grid-cols-[1fr_10rem_auto]"
        onSubmit={(event) => {
          event.preventDefault();
          setActionError(null);
          void save.submit();
        }}
      >
        <NumberField
          label="Vacuum reading"
          unit={VACUUM_LABEL[unit]}
          registration={form.register("microns")}
          error={errors.microns?.message}
        />
        <Controller
          control={form.control}
          name="minutes"
          render={({ field }) => (
            <NumberField
              ref={field.ref}
              label="Time from start"
              unit="min"
              value={minutesText}
              onValueChange={field.onChange}
              onBlur={field.onBlur}
              error={errors.minutes?.message}
              hint={field.value === null ? "Fills in by itself" : undefined}
            />
          )}
        />
        <Button type="submit" size="lg" disabled={save.pending} className="col-span-2 sm:col-span-1">
          <Plus aria-hidden className="size-5" /> {save.pending ? "Saving…" : "Add reading"}
        </Button>
      </form>
      {evacuation.isolatedAtMinutes === null ? (
        <div className="grid grid-cols-2 items-end gap-3 sm:grid-cols-[10rem_auto]">
          <Controller
            control={form.control}
            name="isolatedAtMinutes"
            render={({ field }) => (
              <NumberField
                ref={field.ref}
                label="Valved off at"
                unit="min"
                value={isolationText}
                onValueChange={field.onChange}
                onBlur={field.onBlur}
                error={errors.isolatedAtMinutes?.message}
              />
            )}
          />
          <Button
            variant="secondary"
            size="lg"
            disabled={update.isPending || evacuation.samples.length === 0 || evacuation.onDevice}
            onClick={() => void setIsolated(toNumber(isolationText) ?? null)}
          >
            <Power aria-hidden className="size-5" /> Pump valved off
          </Button>
          {evacuation.onDevice && (
            <p className="col-span-2 text-sm text-muted">
              The decay test starts on the server: mark the pump valved off once this evacuation has been sent. Keep
              entering readings meanwhile.
            </p>
          )}
        </div>
      ) : (
        <Button variant="quiet" disabled={update.isPending} onClick={() => void setIsolated(null)}>
          <Undo2 aria-hidden className="size-5" /> Undo “valved off” (still pulling down)
        </Button>
      )}
      {formError && <FormAlert>{formError}</FormAlert>}
      {stale && (
        <StaleWriteNotice
          message={stale}
          reloading={reloading}
          onReload={() => {
            setReloading(true);
            void onReload().finally(() => {
              setReloading(false);
              setStale(null);
            });
          }}
        />
      )}
    </div>
  );
}

/**
 * Evacuation with its decay test: readings entered as they are read, charted on a log scale
 * with the target and the valve-off moment, judged held / moisture / leak with the rise rate.
 */
export function EvacuationPanel({ visitId, canWrite }: { visitId: string; canWrite: boolean }) {
  const evacuations = useEvacuations(visitId);
  const create = useCreateEvacuation();
  const [unit, setUnit] = useState<VacuumUnit>("micron");

  const onDevice = useOutboxEntries();
  // The server's evacuations with what waits on this device (readings, or one started without signal).
  const list = evacuationsOnDevice(evacuations.data, onDevice, visitId);
  // The latest evacuation that stands is the one in progress; voided ones stay listed below.
  const current = list.filter(isStanding).at(-1);
  const earlier = list.filter((evacuation) => evacuation !== current);
  // Typed in the unit shown; stored and sent in microns.
  const targetTextOf = (typed: TypedStart) =>
    typed.targetMicrons ??
    (evacuations.data ? convertTyped(String(evacuations.data.defaults.targetMicrons), "micron", unit) : "");
  const targetRange = `${formatVacuum(MIN_TARGET_MICRONS, unit)} to ${formatVacuum(MAX_TARGET_MICRONS, unit)}`;
  /** The body POST …/evacuations takes: the target in whole microns. */
  const toBody = (typed: TypedStart) => {
    const value = toNumber(targetTextOf(typed));
    return { targetMicrons: value === undefined || Number.isNaN(value) ? value : Math.round(fromDisplay(value, unit)) };
  };
  const form = useForm<TypedStart, unknown, z.output<typeof EvacuationCreateSchema>>({
    resolver: zodResolver(z.preprocess(toBody, EvacuationCreateSchema)),
    defaultValues: { targetMicrons: null },
  });
  const targetError = form.formState.errors.targetMicrons;
  const start = useProcedureSave({
    form,
    visitId,
    mutation: create,
    // The pump's start by this device's clock: kept without signal, the evacuation is stored with it.
    stamp: "startedAt",
    entry: (record) => ({
      kind: "evacuation",
      label: `Evacuation to ${formatVacuum(record.targetMicrons ?? evacuations.data?.defaults.targetMicrons ?? 500, unit)}`,
      path: procedureRecordsPath("evacuations", visitId),
      takenAt: record.startedAt,
    }),
    cleared: () => ({ targetMicrons: null }),
    notSaved: "The evacuation was not started. Try again.",
    invalidMessage: "Check the target",
  });

  return (
    <div className="space-y-4">
      <CautionPanel topic="electrical" />
      <p className="text-sm text-muted">
        Read the vacuum on an electronic (micron) gauge at the point furthest from the pump, never a compound gauge.
      </p>
      {evacuations.isError && <FormAlert>The evacuations could not be loaded: {evacuations.error.message}</FormAlert>}
      <WaitingEntries
        entries={onDevice.filter(
          (entry) => entry.visitId === visitId && (entry.kind === "evacuation" || entry.kind === "evacuation-sample"),
        )}
      />

      <Segmented<VacuumUnit>
        label="Vacuum unit"
        value={unit}
        onChange={(next) => {
          const typed = form.getValues("targetMicrons");
          if (typed !== null) form.setValue("targetMicrons", convertTyped(typed, unit, next));
          form.clearErrors();
          start.dismiss();
          setUnit(next);
        }}
        options={[
          { value: "micron", label: "Microns" },
          { value: "Pa", label: "Pa" },
        ]}
      />

      {current && (
        <section
          aria-labelledby="evacuation-current-heading"
          className="space-y-3 rounded-card border-2 border-rule bg-surface p-4"
        >
          <h2 id="evacuation-current-heading" className="text-lg font-semibold">
            Evacuation started {formatTime(current.startedAt)}
          </h2>
          {current.onDevice && (
            <p className="flex items-center gap-2 text-sm font-medium">
              <CloudOff aria-hidden className="size-5 shrink-0" /> On this device: waiting to send, with its readings
            </p>
          )}
          <EvacuationSummary evacuation={current} unit={unit} />
          <EvacuationChart evacuation={current} unit={unit} />
          <SampleEntry
            key={current.id}
            visitId={visitId}
            evacuation={current}
            unit={unit}
            canWrite={canWrite}
            onReload={() => evacuations.refetch()}
          />
          {current.samples.length > 0 && (
            <details>
              <summary className="min-h-touch cursor-pointer py-2 font-medium">
                Readings ({current.samples.length})
              </summary>
              <table className="num w-full max-w-sm text-sm">
                <thead>
                  <tr className="text-left font-sans text-muted">
                    <th className="py-1 font-medium">Time</th>
                    <th className="py-1 font-medium">Reading</th>
                  </tr>
                </thead>
                <tbody>
                  {current.samples.map((sample) => (
                    <tr key={sample.minutes} className="border-t border-rule">
                      <td className="py-1">
                        {formatNumber(sample.minutes, 1)} min
                        {current.isolatedAtMinutes !== null && sample.minutes >= current.isolatedAtMinutes
                          ? " (decay)"
                          : ""}
                      </td>
                      <td className="py-1">{formatVacuum(sample.microns, unit)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </details>
          )}
          {canWrite && !current.onDevice && (
            <VisitVoidAction
              visitId={visitId}
              kind="evacuation"
              recordId={current.id}
              what={`the evacuation started ${formatTime(current.startedAt)}`}
            />
          )}
        </section>
      )}

      {canWrite && (
        <form
          aria-label="Start an evacuation"
          noValidate
          className="grid items-end gap-3 rounded-card border-2 border-dashed border-rule p-4 sm:grid-cols-[12rem_auto]"
          onSubmit={(event) => {
            event.preventDefault();
            void start.submit();
          }}
        >
          <Controller
            control={form.control}
            name="targetMicrons"
            render={({ field }) => (
              <NumberField
                ref={field.ref}
                label="Target"
                unit={VACUUM_LABEL[unit]}
                value={targetTextOf({ targetMicrons: field.value })}
                onValueChange={(text) => {
                  field.onChange(text);
                  start.dismiss();
                }}
                onBlur={field.onBlur}
                error={
                  // The schema speaks microns; someone reading pascals gets the range in pascals.
                  targetError && unit === "Pa" && targetError.type !== "server"
                    ? `Enter a target from ${targetRange}`
                    : targetError?.message
                }
                hint={`Your company's figure; ${formatVacuum(500, unit)} is the trade norm (${targetRange} accepted)`}
              />
            )}
          />
          <Button type="submit" size="lg" variant={current ? "secondary" : "primary"} disabled={start.pending}>
            <Play aria-hidden className="size-5" /> {current ? "Start another evacuation" : "Start the evacuation"}
          </Button>
          {start.formError && !targetError && (
            <div className="sm:col-span-2">
              <FormAlert>{start.formError}</FormAlert>
            </div>
          )}
        </form>
      )}

      {earlier.length > 0 && (
        <section aria-labelledby="evacuation-earlier-heading">
          <h2 id="evacuation-earlier-heading" className="font-semibold">
            Earlier on this visit
          </h2>
          <ul className="mt-1 space-y-1">
            {earlier.map((evacuation) => (
              <li key={evacuation.id} className="flex flex-wrap items-center gap-2 text-sm">
                <VoidedRecord voided={evacuation.voided} className="flex flex-wrap items-center gap-2">
                  <span className="num">{formatTime(evacuation.startedAt)}</span>
                  <EvacuationBadge evacuation={evacuation} />
                  {evacuation.samples.length > 0 && (
                    <span className="num text-muted">
                      last {formatVacuum(evacuation.samples.at(-1)!.microns, unit)}
                    </span>
                  )}
                </VoidedRecord>
                {canWrite && !evacuation.voided && !evacuation.onDevice && (
                  <VisitVoidAction
                    visitId={visitId}
                    kind="evacuation"
                    recordId={evacuation.id}
                    what={`the evacuation started ${formatTime(evacuation.startedAt)}`}
                  />
                )}
              </li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}
