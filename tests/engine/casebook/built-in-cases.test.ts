import { describe, expect, it } from "vitest";
import { diagnose, expectedAnswers, gaugeToAbsolute, saturationTemperature } from "@shared/engine/index.ts";
import { BuiltInCaseFileSchema, CASE_DIFFICULTIES } from "@shared/schemas/casebook.ts";
import { CHARGE_STATES, METERING_DEVICES, type ChargeState } from "@shared/schemas/diagnosis.ts";
import rawFile from "../../../data/casebook/built-in-cases.json" with { type: "json" };
import { expectPhysicallyPossible, PROBE_BAND_K } from "../../fixtures/physical-limits.ts";

// The built-in cases are invented (PRODUCT.md demo world and other made-up sites). Their
// pressures come from design saturation temperatures through the property engine, and their
// expected answers from diagnose(); each expected state follows the symptom table of
// TRADE.md §2 (sources named in each case).
const file = BuiltInCaseFileSchema.parse(rawFile);

/** Stored answers are rounded to 0.001; a table regenerated from the same EOS may move them a hair. */
const AGREEMENT_TOLERANCE_K = 0.02;
/** 1 kPa gauge rounding moves a saturation temperature by < 0.15 K even on R600a at −25 °C (dp/dT ≈ 2 kPa/K there). */
const DESIGN_TOLERANCE_K = 0.3;

/**
 * Where a reading stands against its target, as the symptom table's arrows read (TRADE.md §2,
 * "relative to the normal value"): within ±1 K is normal, about the accuracy of a clamp-on line
 * probe (common practice). Null when the case has no such figure (it cannot be judged).
 */
type Arrow = "↑" | "→" | "↓" | null;
function arrow(value: number | null, target: number | null): Arrow {
  if (value === null || target === null) return null;
  return value - target > PROBE_BAND_K ? "↑" : target - value > PROBE_BAND_K ? "↓" : "→";
}

/** An installer's pass band around the target subcooling: Title 24, about ±3 °F (TRADE.md §1.3, from memory). */
const SUBCOOLING_TOLERANCE_K = 1.7;

/** Fixed restrictors: the table's superheat column names them apart from TXV/EEV systems. */
const FIXED_RESTRICTORS = new Set(["fixed-orifice", "capillary"]);

/**
 * The superheat and subcooling arrows each charge state allows, from TRADE.md §2's symptom table
 * ([S21]–[S30]); `shFixed` where the table gives fixed restrictors their own cell. Cells the
 * table leaves open ("varies") are not judged. Notes:
 * - undercharge: SH ↑ with a fixed restrictor, and with a TXV "once the valve is wide open", so
 *   a TXV may still hold it (→); SC ↓ [S21][S22];
 * - overcharge: SH ↓ with a fixed restrictor, ~ with a TXV; SC ↑ [S21][S23];
 * - restriction: SH ↑ with SC normal or high, which separates it from undercharge [S24][S25];
 * - low evaporator airflow: SH ↓, which a TXV holds at its setting (→); SC → to ↑ [S21];
 * - low condenser airflow: SC ↓ [S21][S26]; its SH moves either way with severity;
 * - inefficient compressor: SH ↓, SC ↑ [S21][S29][S30];
 * - a metering device overfeeding is not in the table: it floods the evaporator, so SH ↓
 *   (common practice, from memory);
 * - normal: SH → with a fixed restrictor (its target is the charging chart's, §1.4); SC within
 *   the installer's tolerance of its target (Title 24, ±1.7 K, TRADE.md §1.3, from memory).
 */
const SYMPTOMS: Record<ChargeState, { sh?: Arrow[]; shFixed?: Arrow[]; sc?: Arrow[] }> = {
  undercharged: { sh: ["↑", "→"], shFixed: ["↑"], sc: ["↓"] },
  overcharged: { shFixed: ["↓"], sc: ["↑"] },
  "restricted-metering": { sh: ["↑"], sc: ["→", "↑"] },
  "low-evaporator-airflow": { sh: ["↓", "→"], sc: ["→", "↑"] },
  "condenser-airflow": { sc: ["↓"] },
  "non-condensables": {},
  "weak-compressor": { sh: ["↓"], sc: ["↑"] },
  "overfeeding-metering": { sh: ["↓"] },
  normal: { shFixed: ["→"] },
  "insufficient-data": {},
};

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

    it("is physically possible: discharge above liquid, liquid no colder than the condenser's air", () => {
      expectPhysicallyPossible(worked.input, worked.expected.chargeState);
    });

    it(`reads as the symptom table reads its state: ${worked.expected.chargeState} (TRADE.md §2)`, () => {
      const { superheatK, targetSuperheatK, subcoolingK, targetSubcoolingK, chargeState } = worked.expected;
      const sh = arrow(superheatK, targetSuperheatK);
      const sc = arrow(subcoolingK, targetSubcoolingK);
      const fixed = FIXED_RESTRICTORS.has(worked.input.meteringDevice);
      const cells = SYMPTOMS[chargeState];
      const expected = { sh: fixed ? (cells.shFixed ?? cells.sh) : cells.sh, sc: cells.sc };
      if (expected.sh) expect(expected.sh, `superheat ${superheatK} K against ${targetSuperheatK} K`).toContain(sh);
      if (expected.sc) expect(expected.sc, `subcooling ${subcoolingK} K against ${targetSubcoolingK} K`).toContain(sc);
      if (chargeState === "normal" && subcoolingK !== null && targetSubcoolingK !== null)
        expect(Math.abs(subcoolingK - targetSubcoolingK)).toBeLessThanOrEqual(SUBCOOLING_TOLERANCE_K);
    });

    // The stored answers were written by diagnose() when the file was built (scripts/build-casebook-cases.ts):
    // this catches the engine drifting from them; the symptom table above is what judges them.
    it(`still gives its stored answers: ${worked.expected.chargeState}`, () => {
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
