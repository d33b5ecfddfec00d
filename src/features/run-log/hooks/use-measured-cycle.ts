import { useMemo } from "react";
import { measuredCycle, type MeasuredCycle, type MeasuredCycleExtras } from "@shared/engine/index.ts";
import type { DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import { useSinglePhaseTable } from "./use-single-phase-table.ts";

export type MeasuredCycleState =
  | { kind: "idle" }
  | { kind: "loading" }
  | { kind: "failed"; message: string }
  | { kind: "ready"; cycle: MeasuredCycle; previous: MeasuredCycle | null };

/**
 * The measured cycle of a reading (and of a previous one, to compare), once the refrigerant's
 * single-phase table has arrived: the table is fetched on first use only (its own chunk), then
 * kept for the session (it never changes while the app runs).
 */
export function useMeasuredCycle(
  input: DiagnosisInput | null,
  previousInput: DiagnosisInput | null,
  extras: MeasuredCycleExtras,
  enabled: boolean,
): MeasuredCycleState {
  const refrigerant = input?.refrigerant ?? "";
  const table = useSinglePhaseTable(refrigerant, enabled);
  return useMemo((): MeasuredCycleState => {
    if (!enabled || !input) return { kind: "idle" };
    if (table.isError)
      return { kind: "failed", message: table.error instanceof Error ? table.error.message : String(table.error) };
    if (!table.isSuccess) return { kind: "loading" };
    const previous =
      previousInput && previousInput.refrigerant === input.refrigerant ? measuredCycle(previousInput) : null;
    return { kind: "ready", cycle: measuredCycle(input, extras), previous };
  }, [enabled, input, previousInput, extras, table.isError, table.isSuccess, table.error]);
}
