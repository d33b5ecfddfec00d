import type { ChargeDeviation, ChargeState } from "../../schemas/diagnosis.ts";

/** Largest step, as a share of the correct charge: a bigger step can overshoot before the readings catch up (common practice). */
export const MAX_STEP_SHARE = 0.1;
/** Smallest step worth weighing on a charging scale, kg. */
export const MIN_STEP_KG = 0.05;
/** Minutes to let the readings settle after each step (common practice: 10–15 min after a change). */
export const SETTLE_MINUTES_BETWEEN_STEPS = 10;
export const CHARGING_PLAN_SOURCE =
  "common practice: charge in steps, waiting for the readings to settle after each, and never the whole estimate at once; blends are charged as liquid (their vapour leaves the cylinder off-composition), throttled into the suction side so no liquid reaches the compressor";

export interface ChargingPlan {
  action: "add" | "recover";
  /** Amount to add or recover, kg (positive), with the estimate's range turned the same way. */
  kg: number;
  lowKg: number;
  highKg: number;
  /** The steps, kg each; they add up to the estimate (rounded to the scale's 0.05 kg). */
  steps: number[];
  /** Charge as liquid (a zeotropic blend). */
  liquidCharging: boolean;
  settleMinutes: number;
  /** One sentence: how much, in how many steps. */
  summary: string;
  source: string;
}

/** Rounded to the scale's 0.05 kg, as a clean decimal (20 steps per kg). */
const roundToStep = (kg: number) => Math.round(kg / MIN_STEP_KG) / Math.round(1 / MIN_STEP_KG);
const kgText = (kg: number) =>
  kg
    .toFixed(kg < 1 ? 2 : 1)
    .replace(/0$/, "")
    .replace(/\.$/, "");

/**
 * How to bring an under- or overcharged circuit to its charge: the estimate split into equal
 * steps (at least two, so the readings are looked at on the way), none larger than a tenth of
 * the charge or than the cautious end of the estimate's range, so no single step can overshoot;
 * the settled estimate after each step says what is left, and the plan is made again from it. Null when the state is not under- or overcharged, there is no
 * estimate, or the estimate does not point the same way as the verdict.
 *
 * Units: kg. Source: `CHARGING_PLAN_SOURCE` (common practice).
 *
 * @throws never
 * @example chargingPlan({ kg: -0.6, lowKg: -0.9, highKg: -0.3, basis: "unit-reference", source: "" }, "undercharged", 3, true)?.steps // [0.3, 0.3]
 */
export function chargingPlan(
  deviation: ChargeDeviation | null,
  state: ChargeState,
  chargeKg: number,
  zeotropic: boolean,
): ChargingPlan | null {
  if (deviation === null || (state !== "undercharged" && state !== "overcharged")) return null;
  const action = state === "undercharged" ? "add" : "recover";
  const sign = action === "add" ? -1 : 1;
  const kg = sign * deviation.kg;
  if (kg < MIN_STEP_KG) return null;
  // The range turned into "amount to move": for an addition, −highKg is the cautious end.
  const [lowKg, highKg] =
    action === "add" ? [-deviation.highKg, -deviation.lowKg] : [deviation.lowKg, deviation.highKg];
  // No step larger than a tenth of the charge, nor than the range's cautious end (so the first
  // step alone cannot overshoot), and at least two steps.
  const cautiousEnd = Math.max(lowKg, MIN_STEP_KG);
  const stepCount = Math.max(2, Math.ceil(kg / (MAX_STEP_SHARE * chargeKg)), Math.ceil(kg / cautiousEnd - 1e-9));
  const step = Math.max(MIN_STEP_KG, roundToStep(kg / stepCount));
  const steps = Array.from({ length: stepCount }, () => step);
  const verb = action === "add" ? "Add" : "Recover";
  const how = action === "add" && zeotropic ? " as liquid, throttled into the suction side" : "";
  return {
    action,
    kg,
    lowKg: Math.max(0, lowKg),
    highKg,
    steps,
    liquidCharging: action === "add" && zeotropic,
    settleMinutes: SETTLE_MINUTES_BETWEEN_STEPS,
    summary: `${verb} about ${kgText(kg)} kg (${kgText(Math.max(0, lowKg))}–${kgText(highKg)}) in ${stepCount} steps of ${kgText(step)} kg${how}; let the readings settle ${SETTLE_MINUTES_BETWEEN_STEPS} minutes between steps and follow the new estimate`,
    source: CHARGING_PLAN_SOURCE,
  };
}
