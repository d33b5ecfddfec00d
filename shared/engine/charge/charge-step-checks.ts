import type { ChargeDeviation } from "../../schemas/diagnosis.ts";

/** A charge step taken (kg added or recovered) at a time. */
export interface ChargeStep {
  at: string;
  /** Positive when added, negative when recovered. */
  kg: number;
}

/** A reading's estimate at a time. */
export interface EstimatePoint {
  takenAt: string;
  chargeDeviation: ChargeDeviation | null;
}

export interface ChargeStepCheck {
  step: ChargeStep;
  /** The estimate before the step (last reading before it) and after (last reading before the next step). */
  beforeKg: number | null;
  afterKg: number | null;
  /** beforeKg + step: where the estimate should have moved to. */
  expectedKg: number | null;
  /** The after-estimate's range contains the expected value; null when there is no estimate to compare. */
  agrees: boolean | null;
  /** A weigh-in after recovery (more than half the charge at once), not a trim: nothing to compare. */
  refill: boolean;
}

/** A step above this share of the correct charge is a refill after recovery, not a trim of a running circuit. */
export const REFILL_SHARE = 0.5;

/**
 * Each charge step beside what the estimate did: the estimate just before the step plus the
 * weighed step is where the next estimate should land; the last reading before the following
 * step (or the latest reading) is compared, and agrees when its range holds that value. A step
 * that disagrees says the estimate's coefficients or the readings are off — the scale wins.
 *
 * Units: kg. Times as ISO strings; both lists in any order.
 *
 * @throws never
 * @example chargeStepChecks([{ at: "…10:20", kg: 0.3 }], points)[0]?.agrees // true when the next estimate moved by about 0.3 kg
 */
export function chargeStepChecks(
  steps: readonly ChargeStep[],
  points: readonly EstimatePoint[],
  chargeKg?: number,
): ChargeStepCheck[] {
  const ordered = [...points]
    .filter((point) => point.chargeDeviation !== null)
    .sort((a, b) => Date.parse(a.takenAt) - Date.parse(b.takenAt));
  const sortedSteps = [...steps].sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  return sortedSteps.map((step, index) => {
    const at = Date.parse(step.at);
    const next = sortedSteps[index + 1];
    const nextAt = next ? Date.parse(next.at) : Number.POSITIVE_INFINITY;
    const before = ordered.filter((point) => Date.parse(point.takenAt) < at).at(-1)?.chargeDeviation ?? null;
    const after =
      ordered.filter((point) => Date.parse(point.takenAt) > at && Date.parse(point.takenAt) < nextAt).at(-1)
        ?.chargeDeviation ?? null;
    const refill = chargeKg !== undefined && Math.abs(step.kg) > REFILL_SHARE * chargeKg;
    const expectedKg = before === null || refill ? null : before.kg + step.kg;
    return {
      step,
      beforeKg: before?.kg ?? null,
      afterKg: after?.kg ?? null,
      expectedKg,
      agrees: expectedKg === null || after === null ? null : expectedKg >= after.lowKg && expectedKg <= after.highKg,
      refill,
    };
  });
}
