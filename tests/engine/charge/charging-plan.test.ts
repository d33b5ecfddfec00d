/**
 * The charging plan and the check of each step against the next estimate. The rules are the
 * trade's common practice (charge in steps and let the readings settle after each, 10–15 min;
 * blends charged as liquid — refrigerant makers' blend-charging guidance, from memory); the
 * numbers below are worked by hand.
 */
import { describe, expect, it } from "vitest";
import { chargeStepChecks, chargingPlan } from "@shared/engine/index.ts";
import type { ChargeDeviation } from "@shared/schemas/diagnosis.ts";

const deviation = (kg: number, lowKg: number, highKg: number): ChargeDeviation => ({
  kg,
  lowKg,
  highKg,
  basis: "unit-reference",
  source: "test",
});

describe("chargingPlan", () => {
  it("adds a shortage in steps no larger than the range's cautious end or a tenth of the charge", () => {
    // 0.6 kg short (0.3–0.9) on a 3.2 kg circuit: steps ≤ 0.3 kg (cautious end) and ≤ 0.32 kg → 2 × 0.3 kg.
    const plan = chargingPlan(deviation(-0.6, -0.9, -0.3), "undercharged", 3.2, false)!;
    expect(plan.action).toBe("add");
    expect(plan.steps).toEqual([0.3, 0.3]);
    expect(plan).toMatchObject({ kg: 0.6, lowKg: 0.3, highKg: 0.9, liquidCharging: false });
    expect(plan.summary).toBe(
      "Add about 0.6 kg (0.3–0.9) in 2 steps of 0.3 kg; let the readings settle 10 minutes between steps and follow the new estimate",
    );
  });

  it("splits a large shortage so no step exceeds a tenth of the charge, and charges a blend as liquid", () => {
    // 1.2 kg short on a 4 kg circuit: ceil(1.2 / 0.4) = 3 steps of 0.4 kg.
    const plan = chargingPlan(deviation(-1.2, -1.8, -0.6), "undercharged", 4, true)!;
    expect(plan.steps).toEqual([0.4, 0.4, 0.4]);
    expect(plan.liquidCharging).toBe(true);
    expect(plan.summary).toMatch(/as liquid, throttled into the suction side/);
    expect(Math.max(...plan.steps)).toBeLessThanOrEqual(0.1 * 4 + 1e-9);
  });

  it("recovers an overcharge, never as liquid charging", () => {
    const plan = chargingPlan(deviation(0.5, 0.2, 0.8), "overcharged", 3, true)!;
    expect(plan.action).toBe("recover");
    // cautious end 0.2 kg → ceil(0.5 / 0.2) = 3 steps of 0.5/3 ≈ 0.167 → 0.15 kg on the scale's 0.05 kg
    expect(plan.steps).toEqual([0.15, 0.15, 0.15]);
    expect(plan.liquidCharging).toBe(false);
  });

  it("makes no plan unless the verdict and the estimate agree on a charge fault", () => {
    expect(chargingPlan(deviation(-0.6, -0.9, -0.3), "normal", 3, false)).toBeNull();
    expect(chargingPlan(deviation(-0.6, -0.9, -0.3), "condenser-airflow", 3, false)).toBeNull();
    expect(chargingPlan(null, "undercharged", 3, false)).toBeNull();
    // the estimate says over, the verdict says under: no plan to add
    expect(chargingPlan(deviation(0.3, 0.1, 0.5), "undercharged", 3, false)).toBeNull();
  });
});

describe("chargeStepChecks", () => {
  const point = (takenAt: string, kg: number) => ({ takenAt, chargeDeviation: deviation(kg, kg - 0.2, kg + 0.2) });

  it("compares each weighed step with the last estimate before the next step", () => {
    const checks = chargeStepChecks(
      [
        { at: "2026-12-01T10:30:00Z", kg: 0.3 },
        { at: "2026-12-01T10:10:00Z", kg: 0.3 },
      ],
      [
        point("2026-12-01T10:00:00Z", -0.6),
        point("2026-12-01T10:20:00Z", -0.35),
        point("2026-12-01T10:25:00Z", -0.3),
        point("2026-12-01T10:45:00Z", 0.3),
      ],
    );
    expect(checks.map((check) => check.step.at)).toEqual(["2026-12-01T10:10:00Z", "2026-12-01T10:30:00Z"]);
    // −0.6 + 0.3 = −0.3 expected; −0.3 measured (range −0.5…−0.1): agrees
    expect(checks[0]).toMatchObject({ beforeKg: -0.6, afterKg: -0.3 });
    expect(checks[0]!.expectedKg).toBeCloseTo(-0.3, 9);
    expect(checks[0]!.agrees).toBe(true);
    // −0.3 + 0.3 = 0 expected; +0.3 measured (range 0.1…0.5): the estimate overshot the scale
    expect(checks[1]!.agrees).toBe(false);
  });

  it("has nothing to compare without an estimate on both sides", () => {
    const [check] = chargeStepChecks([{ at: "2026-12-01T10:10:00Z", kg: -0.2 }], [point("2026-12-01T10:20:00Z", 0.1)]);
    expect(check).toMatchObject({ beforeKg: null, afterKg: 0.1, expectedKg: null, agrees: null });
  });

  it("does not compare a weigh-in after recovery (more than half the charge at once) with the estimate before it", () => {
    const [check] = chargeStepChecks(
      [{ at: "2026-12-01T10:10:00Z", kg: 4.2 }],
      [point("2026-12-01T10:00:00Z", -1.2), point("2026-12-01T10:30:00Z", 0)],
      4.2,
    );
    expect(check).toMatchObject({ refill: true, beforeKg: -1.2, afterKg: 0, expectedKg: null, agrees: null });
  });
});
