/**
 * The compressor judged from the measured cycle: apparent isentropic efficiency
 * η = (h₂s − h₁)/(h₂ − h₁) (ASHRAE Handbook—Fundamentals ch. 2, cycle relations; from memory).
 * Healthy compressors read about 0.6–0.75 from pipe temperatures (from memory, unverified);
 * below 0.45 gas is being compressed twice (common practice), which supports a weak compressor.
 * The enthalpies come from the single-phase tables, themselves checked against the published
 * equations of state in tests/engine/properties.
 */
import { beforeAll, describe, expect, it } from "vitest";
import {
  diagnose,
  singlePhaseState,
  singlePhaseStateFromEntropy,
  STANDARD_ATMOSPHERE_KPA,
} from "@shared/engine/index.ts";
import { loadSinglePhaseTable } from "@shared/property-tables/load-single-phase-table.ts";

// An R410A split system on a 35 °C day: evaporating ≈ 7 °C, condensing ≈ 43 °C, TXV.
const reading = {
  refrigerant: "R410A",
  meteringDevice: "txv" as const,
  suctionPressureKPa: 830,
  suctionLineTempC: 12,
  liquidPressureKPa: 2650,
  liquidLineTempC: 38,
  outdoorAirTempC: 35,
  returnAirTempC: 26.7,
};

function efficiencyByHand(dischargeLineTempC: number): number {
  const atmosphere = STANDARD_ATMOSPHERE_KPA;
  const suction = singlePhaseState("R410A", reading.suctionPressureKPa + atmosphere, reading.suctionLineTempC);
  // Without a discharge gauge the engine takes the liquid pressure as the discharge pressure.
  const dischargeKPa = reading.liquidPressureKPa + atmosphere;
  const actual = singlePhaseState("R410A", dischargeKPa, dischargeLineTempC);
  const ideal = singlePhaseStateFromEntropy("R410A", dischargeKPa, suction.entropyKJPerKgK);
  return (ideal.enthalpyKJPerKg - suction.enthalpyKJPerKg) / (actual.enthalpyKJPerKg - suction.enthalpyKJPerKg);
}

describe("compressor efficiency from the measured cycle", () => {
  beforeAll(async () => {
    await loadSinglePhaseTable("R410A");
  });

  it("flags a compressor that puts far more work into the gas than compression needs", () => {
    const result = diagnose({ ...reading, dischargeLineTempC: 110 }, { withMeasuredCycle: true });
    const finding = result.findings.find((f) => f.ruleId === "compressor-efficiency");
    expect(finding, "a 110 °C discharge line on this cycle").toBeDefined();
    expect(finding!.direction).toBe("low");
    // The discharge pressure is a little above the liquid pressure, so the hand figure is close, not equal.
    expect(finding!.value / 100).toBeCloseTo(efficiencyByHand(110), 1);
    expect(finding!.value).toBeLessThan(45);
    expect(finding!.pointsTo.map((p) => p.state)).toEqual(["weak-compressor"]);
  });

  it("stays silent for a compressor in its healthy band", () => {
    const healthy = diagnose({ ...reading, dischargeLineTempC: 72 }, { withMeasuredCycle: true });
    expect(efficiencyByHand(72)).toBeGreaterThan(0.6);
    expect(healthy.findings.some((f) => f.ruleId === "compressor-efficiency")).toBe(false);
  });

  it("needs the measured cycle asked for: the same hot reading without it says nothing of efficiency", () => {
    const result = diagnose({ ...reading, dischargeLineTempC: 110 });
    expect(result.findings.some((f) => f.ruleId === "compressor-efficiency")).toBe(false);
  });

  it("needs a discharge line temperature", () => {
    const result = diagnose(reading, { withMeasuredCycle: true });
    expect(result.findings.some((f) => f.ruleId === "compressor-efficiency")).toBe(false);
  });
});
