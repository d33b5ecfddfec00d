/**
 * How the server diagnoses a run-log reading: with the measured cycle's compressor figures, the
 * refrigerant's single-phase table loaded first (the browser's live diagnosis loads the same
 * table and asks for the same, so both give the same result). A refrigerant without a
 * single-phase table is diagnosed from its saturation readings only.
 */
import { diagnose } from "@shared/engine/index.ts";
import { loadSinglePhaseTable } from "@shared/property-tables/load-single-phase-table.ts";
import type { DiagnosisInput, DiagnosisResult } from "@shared/schemas/diagnosis.ts";

/** Loads the single-phase table of a refrigerant, if there is one; never rejects. */
export async function prepareRefrigerant(refrigerant: string): Promise<void> {
  await loadSinglePhaseTable(refrigerant).catch(() => undefined);
}

export async function diagnoseReading(input: DiagnosisInput): Promise<DiagnosisResult> {
  await prepareRefrigerant(input.refrigerant);
  return diagnose(input, { withMeasuredCycle: true });
}
