import type { ChargeDeviation } from "@shared/schemas/diagnosis.ts";
import type { Movement } from "@shared/schemas/register.ts";
import type { Reading } from "@shared/schemas/visits.ts";

/**
 * The charge estimate the readings gave just before the circuit's first recovery on the visit:
 * the scale then weighs what was really there, so the two can be set side by side (the
 * estimate is checked against the scale on every recovery). Null when no reading before the
 * recovery carried an estimate. Voided readings are corrections and never count.
 */
export function estimateBeforeRecovery(readings: readonly Reading[], movements: readonly Movement[], circuit: number): ChargeDeviation | null {
  const recoveries = movements.filter((movement) => movement.kind === "recovered" && movement.circuit === circuit).map((movement) => Date.parse(movement.at));
  if (recoveries.length === 0) return null;
  const firstRecovery = Math.min(...recoveries);
  const before = readings
    .filter((reading) => reading.circuit === circuit && reading.voided === null && reading.result.chargeDeviation && Date.parse(reading.takenAt) < firstRecovery)
    .sort((a, b) => Date.parse(a.takenAt) - Date.parse(b.takenAt))
    .at(-1);
  return before?.result.chargeDeviation ?? null;
}
