import { describe, expect, it } from "vitest";
import { METERING_DEVICES, CHARGE_STATES, DiagnosisResultSchema } from "@shared/schemas/diagnosis";
import { diagnose, saturationTemperature, gaugeToAbsolute } from "@shared/engine/index";
import rawCases from "../../fixtures/diagnosis-cases/cases.json" with { type: "json" };
import { DiagnosisCaseFileSchema } from "../../fixtures/diagnosis-cases/diagnosis-case-schema";
import { expectPhysicallyPossible } from "../../fixtures/physical-limits.ts";

// The worked cases are invented; their pressures were derived from the design saturation
// temperatures through the property engine (scripts/build-diagnosis-cases.ts), and each
// expected state follows the symptom table of TRADE.md §2 (sources named in each case).
const file = DiagnosisCaseFileSchema.parse(rawCases);

describe("diagnosis worked cases", () => {
  it("cover at least 40 cases, 8 refrigerants, all metering devices and every charge state", () => {
    expect(file.cases.length).toBeGreaterThanOrEqual(40);
    expect(new Set(file.cases.map((c) => c.input.refrigerant)).size).toBeGreaterThanOrEqual(8);
    expect(new Set(file.cases.map((c) => c.input.meteringDevice))).toEqual(new Set(METERING_DEVICES));
    expect(new Set(file.cases.map((c) => c.expected.chargeState))).toEqual(new Set(CHARGE_STATES));
    expect(new Set(file.cases.map((c) => c.id)).size).toBe(file.cases.length);
  });

  describe.each(file.cases.map((c) => [c.id, c] as const))("%s", (_id, worked) => {
    it("is physically consistent: its pressures give the design saturation temperatures", () => {
      const atmosphere = worked.input.atmosphericPressureKPa ?? 101.325;
      if (worked.design.evaporatingDewC !== null) {
        const dew = saturationTemperature(
          worked.input.refrigerant,
          gaugeToAbsolute(worked.input.suctionPressureKPa, atmosphere),
          "dew",
        );
        expect(Math.abs(dew - worked.design.evaporatingDewC)).toBeLessThanOrEqual(worked.toleranceK);
      }
      if (worked.design.condensingBubbleC !== null) {
        const bubble = saturationTemperature(
          worked.input.refrigerant,
          gaugeToAbsolute(worked.input.liquidPressureKPa, atmosphere),
          "bubble",
        );
        expect(Math.abs(bubble - worked.design.condensingBubbleC)).toBeLessThanOrEqual(worked.toleranceK);
      }
    });

    it("is physically possible: discharge above liquid, liquid no colder than the condenser's air", () => {
      expectPhysicallyPossible(worked.input, worked.expected.chargeState);
    });

    it(`diagnoses ${worked.expected.chargeState} with the expected values and warnings`, () => {
      const result = diagnose(Object.freeze({ ...worked.input }));
      expect(DiagnosisResultSchema.safeParse(result).success).toBe(true);
      expect(result.chargeState, worked.why).toBe(worked.expected.chargeState);
      const near = (actual: number | null, expected: number | null) => {
        if (expected === null) expect(actual).toBeNull();
        else expect(Math.abs(actual! - expected)).toBeLessThanOrEqual(worked.toleranceK);
      };
      near(result.superheatK, worked.expected.superheatK);
      near(result.subcoolingK, worked.expected.subcoolingK);
      if (worked.expected.targetSuperheatK !== undefined) {
        near(result.targets.superheat?.targetK ?? null, worked.expected.targetSuperheatK);
      }
      const codes = result.warnings.map((warning) => warning.code);
      for (const code of worked.expected.warnings) expect(codes).toContain(code);
    });
  });
});
