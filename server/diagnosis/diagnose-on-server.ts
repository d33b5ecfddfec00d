/**
 * How the server diagnoses a run-log reading: with the measured cycle's compressor figures, the
 * refrigerant's single-phase table loaded first (the browser's live diagnosis loads the same
 * table and asks for the same, so both give the same result). A refrigerant without a
 * single-phase table is diagnosed from its saturation readings only.
 */
import { diagnose, loadRefrigerant } from "@shared/engine/index.ts";
import { loadSinglePhaseTable } from "@shared/property-tables/load-single-phase-table.ts";
import type { DiagnosisInput, DiagnosisResult } from "@shared/schemas/diagnosis.ts";

/**
 * Loads the saturation and single-phase tables of a refrigerant, if it has them; never rejects
 * (an unknown refrigerant is refused by `diagnose` with its own message). The server has every
 * saturation table from its start; the CSV import's worker thread has only what this loads.
 */
export async function prepareRefrigerant(refrigerant: string): Promise<void> {
  await Promise.all([
    loadRefrigerant(refrigerant).catch(() => undefined),
    loadSinglePhaseTable(refrigerant).catch(() => undefined),
  ]);
}

export async function diagnoseReading(input: DiagnosisInput): Promise<DiagnosisResult> {
  await prepareRefrigerant(input.refrigerant);
  return diagnose(input, { withMeasuredCycle: true });
}
