import { describe, expect, it } from "vitest";
import { diagnose, expectedAnswers, gaugeToAbsolute, saturationTemperature } from "@shared/engine/index.ts";
import { BuiltInCaseFileSchema, CASE_DIFFICULTIES } from "@shared/schemas/casebook.ts";
import { CHARGE_STATES, METERING_DEVICES } from "@shared/schemas/diagnosis.ts";
import rawFile from "../../../data/casebook/built-in-cases.json" with { type: "json" };

// The built-in cases are invented (PRODUCT.md demo world and other made-up sites). Their
// pressures come from design saturation temperatures through the property engine, and their
// expected answers from diagnose(); each expected state follows the symptom table of
// TRADE.md §2 (sources named in each case).
const file = BuiltInCaseFileSchema.parse(rawFile);

/** Stored answers are rounded to 0.001; a table regenerated from the same EOS may move them a hair. */
const AGREEMENT_TOLERANCE_K = 0.02;
/** 1 kPa gauge rounding moves a saturation temperature by < 0.15 K even on R600a at −25 °C (dp/dT ≈ 2 kPa/K there). */
const DESIGN_TOLERANCE_K = 0.3;

describe("built-in casebook cases", () => {
  it("cover at least 30 cases, 8 refrigerants, every metering device, charge state and difficulty", () => {
    expect(file.cases.length).toBeGreaterThanOrEqual(30);
    expect(new Set(file.cases.map((c) => c.input.refrigerant)).size).toBeGreaterThanOrEqual(8);
    expect(new Set(file.cases.map((c) => c.input.meteringDevice))).toEqual(new Set(METERING_DEVICES));
    expect(new Set(file.cases.map((c) => c.expected.chargeState))).toEqual(new Set(CHARGE_STATES));
    expect(new Set(file.cases.map((c) => c.difficulty))).toEqual(new Set(CASE_DIFFICULTIES));
    expect(new Set(file.cases.map((c) => c.id)).size).toBe(file.cases.length);
  });

  it("set the demo scenario's three units at Wattle Lane Clinic (PRODUCT.md demo scenario)", () => {
    const wattle = file.cases.filter((c) => c.story.site.includes("Wattle Lane Clinic"));
    const units = new Set(wattle.map((c) => `${c.input.refrigerant}/${c.input.meteringDevice}`));
    for (const unit of ["R407C/txv", "R32/eev", "R404A/txv"]) expect(units.has(unit), unit).toBe(true);
  });

  describe.each(file.cases.map((c) => [c.id, c] as const))("%s", (_id, worked) => {
    it("is physically consistent: its pressures give the design saturation temperatures", () => {
      const atmosphere = worked.input.atmosphericPressureKPa ?? 101.325;
      // Dew point for the suction side, bubble point for the liquid side (TRADE.md §1.1 [S1][S2][S3]).
      const dew = saturationTemperature(
        worked.input.refrigerant,
        gaugeToAbsolute(worked.input.suctionPressureKPa, atmosphere),
        "dew",
      );
      const bubble = saturationTemperature(
        worked.input.refrigerant,
        gaugeToAbsolute(worked.input.liquidPressureKPa, atmosphere),
        "bubble",
      );
      expect(Math.abs(dew - worked.design.evaporatingDewC!)).toBeLessThanOrEqual(DESIGN_TOLERANCE_K);
      expect(Math.abs(bubble - worked.design.condensingBubbleC!)).toBeLessThanOrEqual(DESIGN_TOLERANCE_K);
    });

    it(`still agrees with the engine: ${worked.expected.chargeState}`, () => {
      const now = expectedAnswers(diagnose(Object.freeze({ ...worked.input })));
      expect(now.chargeState, worked.reasoning).toBe(worked.expected.chargeState);
      expect(now.warnings).toEqual(worked.expected.warnings);
      for (const field of [
        "evaporatingTempC",
        "condensingTempC",
        "superheatK",
        "subcoolingK",
        "targetSuperheatK",
        "targetSubcoolingK",
      ] as const) {
        const stored = worked.expected[field];
        if (stored === null) expect(now[field], field).toBeNull();
        else expect(Math.abs(now[field]! - stored), field).toBeLessThanOrEqual(AGREEMENT_TOLERANCE_K);
      }
    });

    it("follows the definitions: superheat = line − dew, subcooling = bubble − line (TRADE.md §1.1)", () => {
      const { expected, input } = worked;
      if (expected.superheatK !== null)
        expect(expected.superheatK).toBeCloseTo(input.suctionLineTempC - expected.evaporatingTempC!, 2);
      if (expected.subcoolingK !== null)
        expect(expected.subcoolingK).toBeCloseTo(expected.condensingTempC! - input.liquidLineTempC, 2);
    });
  });

  it("gives the piston target the trade formula gives (TRADE.md §1.4: SH ≈ 1.5 × WB − 0.5 × DB − 4.4, commonly taught, from memory)", () => {
    const piston = file.cases.find((c) => c.id === "banksia-dental-piston-service")!;
    // WB 19.4 °C, outdoor 35 °C → 29.1 − 17.5 − 4.44 = 7.16 K (the same as 14.5 °F from the °F form).
    expect(piston.expected.targetSuperheatK).toBeCloseTo(7.16, 2);
  });
});
