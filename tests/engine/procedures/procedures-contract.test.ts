import { describe, expect, it } from "vitest";
import {
  analyseDecay,
  judgeInsulationResistance,
  judgeVoltageImbalance,
  pressureTestResult,
  voltageImbalance,
} from "@shared/engine/index";
import {
  DecayAnalysisSchema,
  DecayTestInputSchema,
  InsulationResistanceInputSchema,
  InsulationResistanceResultSchema,
  PressureTestInputSchema,
  PressureTestResultSchema,
  ProcedureLimitsSchema,
  RefrigerantBalanceInputSchema,
  VerdictSchema,
  VoltageImbalanceInputSchema,
} from "@shared/schemas/procedures";

const messages = (result: { success: boolean; error?: { issues: { message: string }[] } }) =>
  result.error?.issues.map((issue) => issue.message) ?? [];

describe("procedures contract", () => {
  it("accepts the pressure-test worked example [S65] and the engine's answer matches the result schema", () => {
    const input = PressureTestInputSchema.parse({
      startGaugeKPa: 3800,
      startTempC: 27,
      endGaugeKPa: 3730,
      endTempC: 20,
      allowedDropKPa: 0,
    });
    expect(PressureTestResultSchema.safeParse(pressureTestResult(input)).success).toBe(true);
  });

  it("tells the technician what is wrong in plain words", () => {
    expect(messages(VoltageImbalanceInputSchema.safeParse({ volts: [400, 400] }))).toEqual([
      "Enter the line voltage for all three phases, in V",
    ]);
    expect(
      messages(InsulationResistanceInputSchema.safeParse({ megohms: -1, testVoltageV: 500, kind: "compressor" })),
    ).toEqual(["Insulation resistance cannot be negative"]);
    expect(
      messages(InsulationResistanceInputSchema.safeParse({ megohms: 1, testVoltageV: 500, kind: "heater" })),
    ).toEqual(["Say what was tested: compressor, motor or wiring"]);
    expect(
      messages(
        PressureTestInputSchema.safeParse({
          startGaugeKPa: "high",
          startTempC: 27,
          endGaugeKPa: 3730,
          endTempC: 20,
          allowedDropKPa: 0,
        }),
      ),
    ).toEqual(["Start pressure must be a number in kPa gauge"]);
    expect(
      messages(RefrigerantBalanceInputSchema.safeParse({ nameplateKg: 2, recoveredKg: 1, addedKg: 1, reusedKg: 1.5 })),
    ).toEqual(["Reused refrigerant cannot be more than was recovered"]);
  });

  it("refuses decay readings out of time order or fewer than two", () => {
    expect(
      messages(
        DecayTestInputSchema.safeParse({
          samples: [
            { minutes: 0, microns: 400 },
            { minutes: 0, microns: 420 },
          ],
        }),
      ),
    ).toContain("Each reading must be later than the one before it");
    expect(messages(DecayTestInputSchema.safeParse({ samples: [{ minutes: 0, microns: 400 }] }))).toContain(
      "Enter at least two readings after valving off the pump: the first and the last",
    );
  });

  it("takes only known limit names in an organisation's overrides, and the engine accepts what it takes", () => {
    expect(ProcedureLimitsSchema.safeParse({ evacuation: { targetMicrons: 300 }, charge: { foo: 1 } }).success).toBe(
      false,
    );
    const limits = ProcedureLimitsSchema.parse({
      voltageImbalance: { passUpToPercent: 1 },
      evacuation: { targetMicrons: 300 },
    });
    expect(judgeVoltageImbalance(1.5, limits.voltageImbalance).verdict).toBe("warn");
    expect(
      analyseDecay(
        [
          { minutes: 0, microns: 250 },
          { minutes: 20, microns: 320 },
        ],
        limits.evacuation,
      ).verdict,
    ).toBe("leak");
  });

  it("engine verdicts match the verdict schemas", () => {
    expect(VerdictSchema.safeParse(judgeVoltageImbalance(voltageImbalance([460, 467, 450]))).success).toBe(true);
    expect(
      InsulationResistanceResultSchema.safeParse(
        judgeInsulationResistance({ megohms: 3, testVoltageV: 500, kind: "motor" }),
      ).success,
    ).toBe(true);
    expect(
      DecayAnalysisSchema.safeParse(
        analyseDecay([
          { minutes: 0, microns: 400 },
          { minutes: 20, microns: 450 },
        ]),
      ).success,
    ).toBe(true);
  });
});
