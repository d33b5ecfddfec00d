import { useDeferredValue, useMemo } from "react";
import { diagnose, DiagnosisInputError } from "@shared/engine/index.ts";
import type { Application, ChargeReference, DiagnosisInputDraft, DiagnosisResult, MeteringDevice } from "@shared/schemas/diagnosis.ts";
import type { DisplayUnits } from "@/lib/units/display-units.ts";
import { useSinglePhaseTable } from "./use-single-phase-table.ts";
import { parseDraft, type DraftField, type ReadingDraft } from "../utils/reading-draft.ts";

export interface CircuitContext {
  refrigerant: string;
  meteringDevice: MeteringDevice;
  targetSuperheatK: number | null;
  targetSubcoolingK: number | null;
  compressorRla: number | null;
  /** The equipment's application and the circuit's liquid line length: they set the bands. */
  application: Application;
  liquidLineLengthM: number | null;
  /**
   * The circuit's correct charge (nameplate plus its weigh-in line adjustment), kg, and its
   * reference point, as the server diagnoses with them: the live charge estimate matches the
   * stored one. Null while they load (no estimate in kilograms until then).
   */
  chargeKg: number | null;
  chargeReference: ChargeReference | null;
}

export type LiveDiagnosis =
  | { kind: "incomplete"; missing: DraftField[]; fieldErrors: Record<string, string> }
  | { kind: "invalid"; fieldErrors: Record<string, string>; formError: string | null }
  | { kind: "ready"; input: DiagnosisInputDraft; result: DiagnosisResult; fieldErrors: Record<string, string> };

/**
 * Runs the same engine the server runs, on what is typed so far. The draft is deferred, so a
 * burst of keystrokes re-diagnoses once the typing pauses rather than on every key.
 */
export function useLiveDiagnosis(draft: ReadingDraft, context: CircuitContext, units: DisplayUnits, atmosphericKPa: number): LiveDiagnosis {
  const deferredDraft = useDeferredValue(draft);
  // The compressor is judged from the measured cycle once its table is here, as on the server.
  const cycleReady = useSinglePhaseTable(context.refrigerant).isSuccess;
  return useMemo(() => {
    const { values, typingErrors, missing } = parseDraft(deferredDraft, units, atmosphericKPa);
    const fieldErrors: Record<string, string> = { ...typingErrors };
    if (missing.length > 0 || Object.keys(typingErrors).length > 0) return { kind: "incomplete", missing, fieldErrors };
    const input: DiagnosisInputDraft = {
      refrigerant: context.refrigerant,
      meteringDevice: context.meteringDevice,
      targetSuperheatK: context.targetSuperheatK ?? undefined,
      targetSubcoolingK: context.targetSubcoolingK ?? undefined,
      compressorRla: context.compressorRla ?? undefined,
      application: context.application,
      liquidLineLengthM: context.liquidLineLengthM ?? undefined,
      chargeKg: context.chargeKg ?? undefined,
      chargeReference: context.chargeReference ?? undefined,
      atmosphericPressureKPa: atmosphericKPa,
      ...(values as Omit<DiagnosisInputDraft, "refrigerant" | "meteringDevice">),
    };
    try {
      return { kind: "ready", input, result: diagnose(input, { withMeasuredCycle: cycleReady }), fieldErrors };
    } catch (error) {
      if (!(error instanceof DiagnosisInputError)) throw error;
      for (const [field, messages] of Object.entries(error.fieldErrors)) fieldErrors[field] = messages[0] ?? "Check this value";
      return { kind: "invalid", fieldErrors, formError: error.formErrors[0] ?? null };
    }
  }, [deferredDraft, context, units, atmosphericKPa, cycleReady]);
}
