import { Mountain, Save } from "lucide-react";
import { useLayoutEffect, useMemo, useRef, useState, type FocusEvent } from "react";
import type { LiquidTempLocation } from "@shared/schemas/diagnosis.ts";
import type { SuctionLocationChoice } from "../utils/reading-draft.ts";
import { readingField } from "@shared/schemas/reading-fields.ts";
import type { Atmosphere, MeasuredValues, Visit } from "@shared/schemas/visits.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { useNow } from "@/hooks/use-now.ts";
import { lazyPanel } from "@/components/lazy/lazy-panel.tsx";
import { ApiError } from "@/lib/api/api-client.ts";
import { readingsPath, useCreateReading } from "@/lib/api/visits.ts";
import { discardEntry, type OutboxEntry } from "@/features/offline/outbox-store.ts";
import { useKeepWhenOffline, useOutboxEntries } from "@/features/offline/use-outbox.ts";
import { WaitingEntries } from "@/features/offline/waiting-entries.tsx";
import { useEntryClientId } from "@/lib/drafts/use-entry-client-id.ts";
import { useStoredDraft } from "@/lib/drafts/use-stored-draft.ts";
import { formatNumber, type DisplayUnits } from "@/lib/units/display-units.ts";
import { useLiveDiagnosis, type CircuitContext } from "../hooks/use-live-diagnosis.ts";
import { circuitSeries } from "../utils/circuit-series.ts";
import {
  draftFromInput,
  emptyDraft,
  REQUIRED_FIELDS,
  type DraftField,
  type ReadingDraft,
} from "../utils/reading-draft.ts";
import { runMinutesAt, runTimeBase } from "../utils/run-time-base.ts";
import { ChargingPlanPanel } from "./charging-plan-panel.tsx";
import { CsvImport } from "./csv-import.tsx";
import { FindingPanel } from "./finding-panel.tsx";
import { LiveLine } from "./live-line.tsx";
import { MeasuredCyclePanel } from "./measured-cycle-panel.tsx";
import { ReadingCards } from "./reading-cards.tsx";
import { SettledIndicator } from "./settled-indicator.tsx";
import { TimelineStrip } from "./timeline-strip.tsx";
import { TrendChart } from "./lazy-trend-chart.tsx";
import { formatTime } from "@shared/format/date-time.ts";

// Below the reading and the timeline, with react-hook-form (14 kB): fetched once the run log is
// drawn with its finding, so that it never delays them on a slow link.
const AdjustmentForm = lazyPanel(() => import("./adjustment-form.tsx"), "AdjustmentForm", { afterFirstScreen: true });
// Folded at first, and its void dialogs bring react-hook-form: loaded once the first screen is drawn.
const RecordedEntries = lazyPanel(() => import("./recorded-entries.tsx"), "RecordedEntries", {
  afterFirstScreen: true,
});

/** A field's name within a sentence: "Enter the suction pressure first". */
const nameInSentence = (field: DraftField) => {
  const { label } = readingField(field);
  return label.charAt(0).toLowerCase() + label.slice(1);
};

interface RunLogProps {
  visit: Visit;
  circuit: number;
  context: CircuitContext;
  isBlend: boolean;
  units: DisplayUnits;
  /** The site's atmosphere, from the server: the live diagnosis uses exactly what the server will. */
  atmosphere: Atmosphere;
  canWrite: boolean;
  /** Why nothing can be recorded, when canWrite is false (a closed visit, or the role). */
  readOnlyNote: string;
}

/**
 * The run log of one circuit: the finding on top, the entry cards in flow order, then the
 * timeline strip that opens into the full trend chart.
 */
export function RunLog({ visit, circuit, context, isBlend, units, atmosphere, canWrite, readOnlyNote }: RunLogProps) {
  const atmosphericKPa = atmosphere.pressureKPa;
  const series = useMemo(() => circuitSeries(visit, circuit), [visit, circuit]);
  const lastInput = series.readings.at(-1)?.input;
  // Last values carried forward, so a new reading changes only what moved. What is typed is
  // kept on the device (per visit, circuit and display units) until it is saved: a switch of
  // section or circuit, a reload or a dropped page loses nothing.
  const stored = useStoredDraft<ReadingDraft>(
    `run-log:${visit.id}:${circuit}:${units.temperature}-${units.pressure}`,
    () => (lastInput ? { ...draftFromInput(lastInput, units, atmosphericKPa), runMinutes: "" } : emptyDraft()),
  );
  const draft = stored.value;
  const setDraft = stored.update;
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [savedAt, setSavedAt] = useState<string | null>(null);
  // A reading saved without a connection: kept in the device's outbox, sent when the signal returns.
  const [keptAt, setKeptAt] = useState<string | null>(null);
  const keepWhenOffline = useKeepWhenOffline();
  const onDevice = useOutboxEntries().filter((entry) => entry.visitId === visit.id && entry.body.circuit === circuit);
  const [showTrend, setShowTrend] = useState(false);
  const createReading = useCreateReading();
  const now = useNow();

  // Run time counts on by itself from the last reading or adjustment unless typed over.
  const autoRunMinutes = runMinutesAt(runTimeBase(series), now);
  // Memoised, so the draft is checked once per change rather than on every render.
  const effectiveDraft = useMemo(
    () =>
      draft.runMinutes === "" && autoRunMinutes !== null ? { ...draft, runMinutes: String(autoRunMinutes) } : draft,
    [draft, autoRunMinutes],
  );
  const { reading, live } = useLiveDiagnosis(effectiveDraft, context, units, atmosphericKPa);
  const fieldErrors = { ...live.fieldErrors, ...serverErrors };
  const lastReading = series.readings.at(-1);
  const shownResult = live.kind === "ready" ? live.result : (lastReading?.result ?? null);
  const findingRef = useRef<HTMLDivElement>(null);
  const shownInput = live.kind === "ready" ? live.input : (series.readings.at(-1)?.input ?? null);

  // A save that failed keeps the time the reading was taken for the next try, until a value changes.
  const [pendingTakenAt, setPendingTakenAt] = useState<string | null>(null);
  // And its client id, so a save whose answer was lost is stored once when tried again.
  const entryId = useEntryClientId();
  const setField = (field: DraftField, value: string) => {
    setPendingTakenAt(null);
    entryId.release();
    setDraft((current) => ({ ...current, [field]: value }));
    setServerErrors(({ [field]: _dropped, ...rest }) => rest);
  };
  const setLocation = (liquidTempLocation: LiquidTempLocation) =>
    setDraft((current) => ({ ...current, liquidTempLocation }));
  const setSuctionLocation = (suctionTempLocation: SuctionLocationChoice) =>
    setDraft((current) => ({ ...current, suctionTempLocation }));

  const save = async () => {
    setFormError(null);
    // What is typed was checked once, as it changed: the save sends that reading.
    if (reading.kind !== "valid") {
      setFormError(
        reading.kind === "incomplete" && reading.missing.length > 0
          ? `Enter the ${reading.missing.map(nameInSentence).join(", ")} first`
          : reading.kind === "invalid" && reading.formError
            ? reading.formError
            : "Check the fields marked below",
      );
      return;
    }
    // The reading keeps the time it was taken, however long the answer takes or how often the save is tried.
    const takenAt = pendingTakenAt ?? new Date().toISOString();
    const clientId = entryId.take();
    // Measured values only: the server adds the nameplate targets, the RLA and the site's atmosphere.
    const body = { circuit, takenAt, clientId, ...reading.measured };
    try {
      // Without a connection (or an answer in time) the reading waits in the device's outbox.
      const sent = await keepWhenOffline(() => createReading.mutateAsync({ visitId: visit.id, ...body }), {
        kind: "reading",
        visitId: visit.id,
        label: `Reading, circuit ${circuit}`,
        path: readingsPath(visit.id),
        body,
      });
      setSavedAt(sent.outcome === "stored" ? sent.stored.takenAt : null);
      setKeptAt(sent.outcome === "kept" ? takenAt : null);
      setServerErrors({});
      stored.discard((current) => ({ ...current, runMinutes: "" }));
      setPendingTakenAt(null);
      entryId.release();
    } catch (error) {
      setPendingTakenAt(takenAt);
      if (error instanceof ApiError && Object.keys(error.fields).length > 0) {
        setServerErrors(error.fields);
        setFormError(error.message);
      } else {
        setFormError(error instanceof Error ? error.message : "The reading was not saved. Try again.");
      }
    }
  };

  // A refused reading's values go back in the form, with the server's field messages, to be
  // corrected and saved again (as a new entry); the refused one leaves the device.
  const putBack = (entry: OutboxEntry) => {
    setDraft(() => ({
      ...draftFromInput(entry.body as Partial<MeasuredValues>, units, atmosphericKPa),
      runMinutes: "",
    }));
    setServerErrors(entry.fields ?? {});
    setFormError(entry.reason ?? null);
    setKeptAt(null);
    void discardEntry(entry.clientId);
  };

  const missingRequired = REQUIRED_FIELDS.filter((field) => draft[field] === "");

  // The save bar (and on a phone the navigation bar under it) cover the bottom of the screen:
  // their height goes to the page's scroll padding (app.css), so a field the browser scrolls to
  // on focus lands above them, not behind.
  const saveBarRef = useRef<HTMLDivElement>(null);
  useLayoutEffect(() => {
    const bar = saveBarRef.current;
    if (!bar) return;
    const root = document.documentElement;
    const update = () => {
      const offset = Number.parseFloat(getComputedStyle(bar).bottom) || 0;
      root.style.setProperty("--bottom-bars", `${Math.ceil(bar.offsetHeight + offset)}px`);
    };
    update();
    const observer = new ResizeObserver(update);
    observer.observe(bar);
    window.addEventListener("resize", update);
    return () => {
      observer.disconnect();
      window.removeEventListener("resize", update);
      root.style.removeProperty("--bottom-bars");
    };
  }, [canWrite]);

  // What a field gives (its saturation temperature, superheat, subcooling) sits on its card's
  // derived line, below the field: bring that line above the save bar too, so the number the
  // technician acts on is never typed blind. Runs after the browser's own focus scroll.
  const keepDerivedInView = (event: FocusEvent<HTMLFormElement>) => {
    const field = event.target;
    const derived = field.closest("section")?.querySelector<HTMLElement>("[data-derived]");
    const bar = saveBarRef.current;
    if (!derived || !bar) return;
    requestAnimationFrame(() => {
      const gap = 8;
      const overlap = derived.getBoundingClientRect().bottom - (bar.getBoundingClientRect().top - gap);
      if (overlap <= 0) return;
      // Never so far that the field itself leaves the top of the screen.
      const room = Math.max(0, field.getBoundingClientRect().top - gap);
      window.scrollBy({ top: Math.min(overlap, room) });
    });
  };

  return (
    <div className="space-y-4">
      {/* Tablet and wider: entry on the left, the finding in a column on the right that stays in
          view while any field is typed. A phone keeps one column, the verdict in the save bar. */}
      <div className="space-y-4 lg:grid lg:grid-cols-[minmax(0,1fr)_minmax(0,20rem)] lg:items-start lg:gap-4 lg:space-y-0">
        <div
          className="space-y-4 lg:sticky lg:top-4 lg:col-start-2 lg:row-start-1 lg:max-h-[calc(100dvh-2rem)] lg:overflow-y-auto"
          data-testid="finding-column"
        >
          <PanelBoundary>
            {live.kind !== "ready" && shownResult && lastReading && (
              <p
                role="status"
                className="rounded-card border-2 border-caution p-2 text-sm font-medium"
                data-testid="finding-waits"
              >
                Waiting for the readings: the finding below is the last saved reading&apos;s (
                {formatTime(lastReading.takenAt)}), not the values on screen now.
              </p>
            )}
            {shownResult ? (
              <div ref={findingRef} className="scroll-mt-4">
                <FindingPanel result={shownResult} pending={live.kind !== "ready"} />
              </div>
            ) : (
              <section aria-label="Finding" className="rounded-card border-2 border-dashed border-rule p-4">
                <h2 className="text-xl font-semibold">Enter the readings</h2>
                <p className="text-muted">
                  Suction and liquid pressures with their line temperatures give the first finding.
                </p>
              </section>
            )}
          </PanelBoundary>
          <SettledIndicator trend={series.trend} />
        </div>
        <div className="space-y-4 lg:col-start-1 lg:row-start-1">
          <p className="flex items-start gap-2 text-sm text-muted" data-testid="atmosphere-line">
            <Mountain aria-hidden className="mt-0.5 size-4 shrink-0" />
            <span>
              Gauge pressures against <span className="num">{formatNumber(atmosphericKPa, 1)} kPa</span> absolute:{" "}
              {atmosphere.description}.
            </span>
          </p>

          <form
            aria-label={`New reading, circuit ${circuit}`}
            onSubmit={(event) => {
              event.preventDefault();
              void save();
            }}
            onFocus={keepDerivedInView}
            className="space-y-3"
          >
            <ReadingCards
              onSuctionLocation={setSuctionLocation}
              draft={effectiveDraft}
              onField={setField}
              onLocation={setLocation}
              fieldErrors={fieldErrors}
              result={live.kind === "ready" ? live.result : null}
              units={units}
              isBlend={isBlend}
              dischargeLineTempC={live.kind === "ready" ? live.input.dischargeLineTempC : undefined}
            />
            {formError && <FormAlert>{formError}</FormAlert>}
            {canWrite ? (
              <div
                ref={saveBarRef}
                className="sticky bottom-20 z-30 space-y-1 rounded-card border-2 border-ink bg-surface px-3 py-2 md:bottom-2"
                data-testid="save-bar"
              >
                {/* From tablet width the finding column beside the fields says all this already. */}
                <div className="lg:hidden">
                  <LiveLine
                    result={live.kind === "ready" ? live.result : null}
                    trend={series.trend}
                    units={units}
                    onOpen={() => findingRef.current?.scrollIntoView({ block: "start", behavior: "smooth" })}
                  />
                </div>
                <div className="flex items-center gap-3">
                  <Button type="submit" size="lg" disabled={createReading.isPending} className="min-w-40 shrink-0">
                    <Save aria-hidden className="size-5" /> {createReading.isPending ? "Saving…" : "Save reading"}
                  </Button>
                  <span className="line-clamp-2 text-xs text-muted sm:text-sm" aria-live="polite">
                    {keptAt
                      ? `Kept on this device (${formatTime(keptAt)}) — sent when online`
                      : savedAt
                        ? `✓ Saved at ${formatTime(savedAt)} — values stay for the next reading`
                        : stored.restored
                          ? "Values typed earlier on this device are back — not saved yet"
                          : missingRequired.length > 0
                            ? `${missingRequired.length} required field(s) to go`
                            : "Values carry forward: change only what moved"}
                  </span>
                </div>
              </div>
            ) : (
              <p className="text-muted">{readOnlyNote}</p>
            )}
          </form>
        </div>
      </div>

      <WaitingEntries
        entries={onDevice}
        onPutBack={(entry: OutboxEntry) => (entry.kind === "reading" ? putBack(entry) : undefined)}
      />

      {shownInput && shownResult && (
        <PanelBoundary>
          <ChargingPlanPanel result={shownResult} input={shownInput} series={series} isBlend={isBlend} />
        </PanelBoundary>
      )}

      <MeasuredCyclePanel
        mode="run-log"
        input={live.kind === "ready" ? live.input : (series.readings.at(-1)?.input ?? null)}
        previousInput={(live.kind === "ready" ? series.readings.at(-1) : series.readings.at(-2))?.input ?? null}
        units={units}
      />

      <section aria-labelledby={`timeline-${circuit}`} className="space-y-2">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 id={`timeline-${circuit}`} className="text-lg font-semibold">
            Timeline
          </h2>
          <Button variant="secondary" aria-expanded={showTrend} onClick={() => setShowTrend((value) => !value)}>
            {showTrend ? "Hide trend chart" : "Open trend chart"}
          </Button>
        </div>
        <TimelineStrip series={series} units={units} />
        {showTrend && (
          <PanelBoundary>
            <div className="rounded-card border-2 border-rule bg-surface p-2">
              <TrendChart series={series} units={units} />
            </div>
          </PanelBoundary>
        )}
      </section>

      <details className="rounded-card border-2 border-rule bg-surface p-4">
        <summary className="min-h-touch cursor-pointer py-2 text-lg font-semibold">
          Recorded entries (to check or void)
        </summary>
        <RecordedEntries
          visitId={visit.id}
          circuit={circuit}
          readings={visit.readings}
          olderCursor={visit.circuitLogs.find((log) => log.circuit === circuit)?.olderCursor ?? null}
          recordCount={visit.circuitLogs.find((log) => log.circuit === circuit)?.recordCount ?? 0}
          adjustments={visit.adjustments}
          units={units}
          atmosphericKPa={atmosphericKPa}
          canVoid={canWrite}
        />
      </details>

      {canWrite && (
        <section aria-labelledby={`adjust-${circuit}`} className="rounded-card border-2 border-rule bg-surface p-4">
          <h2 id={`adjust-${circuit}`} className="mb-2 text-lg font-semibold">
            Log an adjustment
          </h2>
          <PanelBoundary>
            <AdjustmentForm visitId={visit.id} circuit={circuit} />
          </PanelBoundary>
        </section>
      )}
      {canWrite && (
        <details className="rounded-card border-2 border-rule bg-surface p-4">
          <summary className="min-h-touch cursor-pointer py-2 text-lg font-semibold">
            Import a logged series (CSV)
          </summary>
          <CsvImport visitId={visit.id} circuit={circuit} />
        </details>
      )}
    </div>
  );
}
