import { useDeferredValue, useMemo } from "react";
import { diagnose, DiagnosisInputError } from "@shared/engine/index.ts";
import { withCircuitFacts, type CircuitFacts } from "@shared/schemas/circuit-facts.ts";
import { DiagnosisInputSchema, type DiagnosisInput, type DiagnosisResult } from "@shared/schemas/diagnosis.ts";
import type { MeasuredValues } from "@shared/schemas/visits.ts";
import type { DisplayUnits } from "@/lib/units/display-units.ts";
import { useSinglePhaseTable } from "./use-single-phase-table.ts";
import { parseDraft, type DraftField, type ReadingDraft } from "../utils/reading-draft.ts";

/** The circuit's facts the live diagnosis joins to what is typed (`circuitFacts`). */
export type CircuitContext = CircuitFacts;

type NotReady =
  | { kind: "incomplete"; missing: DraftField[]; fieldErrors: Record<string, string> }
  | { kind: "invalid"; fieldErrors: Record<string, string>; formError: string | null };

/** What is typed, checked once: the engine's validated input and the measured values a save sends. */
export type CheckedReading =
  NotReady | { kind: "valid"; input: DiagnosisInput; measured: MeasuredValues; fieldErrors: Record<string, string> };

export type LiveDiagnosis =
  NotReady | { kind: "ready"; input: DiagnosisInput; result: DiagnosisResult; fieldErrors: Record<string, string> };

function invalid(error: DiagnosisInputError, fieldErrors: Record<string, string>): NotReady {
  const marked = { ...fieldErrors };
  for (const [field, messages] of Object.entries(error.fieldErrors)) marked[field] = messages[0] ?? "Check this value";
  return { kind: "invalid", fieldErrors: marked, formError: error.formErrors[0] ?? null };
}

/**
 * The form's one check of what is typed: numbers in the technician's units become SI-metric
 * (parseDraft), the circuit's nameplate and the site's atmosphere join them, and the whole goes
 * through `DiagnosisInputSchema`, the schema the server checks the same reading with.
 */
function checkReading(
  draft: ReadingDraft,
  context: CircuitContext,
  units: DisplayUnits,
  atmosphericKPa: number,
): CheckedReading {
  const { values, typingErrors, missing } = parseDraft(draft, units, atmosphericKPa);
  const fieldErrors: Record<string, string> = { ...typingErrors };
  if (missing.length > 0 || Object.keys(typingErrors).length > 0) return { kind: "incomplete", missing, fieldErrors };
  const parsed = DiagnosisInputSchema.safeParse(withCircuitFacts(values, context, atmosphericKPa));
  if (!parsed.success) return invalid(DiagnosisInputError.fromZodError(parsed.error), fieldErrors);
  // Measured values only go to the server: it adds the nameplate targets, the RLA and the site's atmosphere.
  return { kind: "valid", input: parsed.data, measured: values as MeasuredValues, fieldErrors };
}

/**
 * Runs the same engine the server runs, on what is typed so far. The draft is checked once per
 * change (`reading`, which a save sends as it is); the diagnosis is deferred, so a burst of
 * keystrokes re-diagnoses once the typing pauses rather than on every key (`live`).
 */
export function useLiveDiagnosis(
  draft: ReadingDraft,
  context: CircuitContext,
  units: DisplayUnits,
  atmosphericKPa: number,
): { reading: CheckedReading; live: LiveDiagnosis } {
  const reading = useMemo(
    () => checkReading(draft, context, units, atmosphericKPa),
    [draft, context, units, atmosphericKPa],
  );
  const deferred = useDeferredValue(reading);
  // The compressor is judged from the measured cycle once its table is here, as on the server.
  const cycleReady = useSinglePhaseTable(context.refrigerant).isSuccess;
  const live = useMemo((): LiveDiagnosis => {
    if (deferred.kind !== "valid") return deferred;
    try {
      return {
        kind: "ready",
        input: deferred.input,
        result: diagnose(deferred.input, { withMeasuredCycle: cycleReady }),
        fieldErrors: deferred.fieldErrors,
      };
    } catch (error) {
      // A refrigerant without a table: said on its field, as the server's 400 would.
      if (!(error instanceof DiagnosisInputError)) throw error;
      return invalid(error, deferred.fieldErrors);
    }
  }, [deferred, cycleReady]);
  return { reading, live };
}
