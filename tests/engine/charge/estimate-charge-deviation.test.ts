/**
 * The charge-deviation estimate as diagnose() returns it (`chargeDeviation`,
 * `chargeDeviationNote`): when there is none and why, its sign, its range, and the two bases.
 * Worked numbers use the default coefficients (default-charge-coefficients.test.ts) and the
 * ranges of shared/engine/charge/charge-deviation-limits.ts (sized on the charge-inventory model,
 * `npm run validate:charge`).
 */
import { describe, expect, it } from "vitest";
import type { ChargeReference, DiagnosisInputDraft } from "@shared/schemas/diagnosis";
import { absoluteToGauge, diagnose, saturationPressure } from "@shared/engine/index";

const gaugeAt = (id: string, temperatureC: number, point: "bubble" | "dew") =>
  absoluteToGauge(saturationPressure(id, temperatureC, point));

/** An R410A TXV split on a 35 °C day: evaporating 7 °C, condensing 45 °C, 3 kg correct charge, 7.5 m line. */
function txvReading(
  subcoolingK: number,
  superheatK = 5,
  extra: Partial<DiagnosisInputDraft> = {},
): DiagnosisInputDraft {
  return Object.freeze({
    refrigerant: "R410A",
    meteringDevice: "txv",
    suctionPressureKPa: gaugeAt("R410A", 7, "dew"),
    suctionLineTempC: 7 + superheatK,
    liquidPressureKPa: gaugeAt("R410A", 45, "bubble"),
    liquidLineTempC: 45 - subcoolingK,
    outdoorAirDryBulbC: 35,
    returnAirDryBulbC: 26.7,
    returnAirWetBulbC: 19.4,
    targetSubcoolingK: 6,
    application: "comfort-cooling",
    runMinutes: 20,
    chargeKg: 3,
    liquidLineLengthM: 7.5,
    ...extra,
  }) as DiagnosisInputDraft;
}
const reference: ChargeReference = Object.freeze({
  subcoolingK: 6,
  superheatK: 5,
  evaporatingTempC: 7,
  condensingTempC: 45,
  outdoorAirDryBulbC: 35,
  returnAirDryBulbC: 26.7,
});

describe("estimateChargeDeviation (through diagnose)", () => {
  it("works the generic example: 2 K against a 6 K target on 3 kg, 7.5 m → −0.45 kg (−0.75 to −0.10)", () => {
    // k_ch = 6 / (0.25 × (3 − 0.375)/3) = 27.43 K; (2 − 6)/27.43 = −0.1458; × 3 kg = −0.4375 kg.
    // Half range 0.35 × 0.4375 + 0.06 × 3 = 0.333 kg: −0.771 → −0.75, −0.104 → −0.10 (rounded to 0.05 kg).
    const result = diagnose(txvReading(2));
    expect(result.chargeDeviationNote).toBeNull();
    expect(result.chargeDeviation).toMatchObject({ kg: -0.45, lowKg: -0.75, highKg: -0.1, basis: "generic" });
    expect(result.chargeDeviation?.source).toMatch(/Li and J. E. Braun/);
  });

  it("works the unit-reference example: same reading against its own 6 K point → −0.45 kg (−0.65 to −0.25)", () => {
    // Same k_ch and −0.4375 kg; half range 0.02 × 3 + (0.5/27.43) × 3 + 0.2 × 0.4375 = 0.202 kg.
    const result = diagnose({ ...txvReading(2), chargeReference: reference });
    expect(result.chargeDeviation).toMatchObject({ kg: -0.45, lowKg: -0.65, highKg: -0.25, basis: "unit-reference" });
  });

  it("is negative when short and positive when over (issue 14: negative kg means short of charge)", () => {
    expect(diagnose(txvReading(2)).chargeDeviation?.kg).toBeLessThan(0);
    expect(diagnose(txvReading(10)).chargeDeviation?.kg).toBeGreaterThan(0);
    expect(diagnose(txvReading(6)).chargeDeviation?.kg).toBe(0);
  });

  it("keeps kg inside [lowKg, highKg] on both bases, from short to over", () => {
    for (const subcoolingK of [0.5, 2, 4, 6, 8, 11]) {
      for (const input of [txvReading(subcoolingK), { ...txvReading(subcoolingK), chargeReference: reference }]) {
        const estimate = diagnose(input).chargeDeviation!;
        expect(estimate.lowKg).toBeLessThanOrEqual(estimate.kg);
        expect(estimate.highKg).toBeGreaterThanOrEqual(estimate.kg);
      }
    }
  });

  it("gives the unit-reference basis a narrower range than the generic one (one reference point removes the offset)", () => {
    for (const subcoolingK of [2, 6, 10]) {
      const generic = diagnose(txvReading(subcoolingK)).chargeDeviation!;
      const own = diagnose({ ...txvReading(subcoolingK), chargeReference: reference }).chargeDeviation!;
      expect(own.highKg - own.lowKg).toBeLessThan(generic.highKg - generic.lowKg);
    }
  });

  it("reaches further short once the subcooling is gone: 0.5 K reads about −0.60 kg but the low end adds 10 % of the charge (the subcooling cannot fall below zero; inventory model)", () => {
    // (0.5 − 6)/27.43 × 3 = −0.6016 kg; half 0.35 × 0.6016 + 0.18 = 0.3905; low −0.6016 − 0.3905 − 0.3 = −1.29 → −1.30.
    const estimate = diagnose(txvReading(0.5)).chargeDeviation!;
    expect(estimate.kg).toBe(-0.6);
    expect(estimate.lowKg).toBe(-1.3);
  });

  it("counts a fixed orifice's superheat at −0.1 K of subcooling per kelvin: SC 2 K / 6 K, SH 18 K / 8 K → −0.55 kg", () => {
    // (−4 + (−0.1) × 10)/27.43 = −0.1823; × 3 kg = −0.547 kg → −0.55.
    const result = diagnose(txvReading(2, 18, { meteringDevice: "fixed-orifice", targetSuperheatK: 8 }));
    expect(result.chargeDeviation?.kg).toBe(-0.55);
  });

  it("counts a valve's superheat only above its band (2.8–6.7 K, common practice): 11.7 K adds 5 K × −0.2", () => {
    // (−4 + (−0.2) × (11.7 − 6.7))/27.43 = −0.1823 → −0.55 kg; inside the band the superheat does not count.
    expect(diagnose(txvReading(2, 11.7)).chargeDeviation?.kg).toBe(-0.55);
    expect(diagnose(txvReading(2, 6)).chargeDeviation?.kg).toBe(-0.45);
  });

  it("never reaches below the whole charge missing", () => {
    // Fixed orifice, 2 kg, no line: k_ch = 4/0.25 = 16 K; (0 − 4 + (−0.1) × 60)/16 = −0.625 → −1.25 kg;
    // low −1.25 − (0.35 × 1.25 + 0.12) − 0.2 = −2.0075, held at −2 kg.
    const input = txvReading(0, 60, {
      meteringDevice: "fixed-orifice",
      targetSuperheatK: 0,
      targetSubcoolingK: 4,
      chargeKg: 2,
      liquidLineLengthM: 0,
    });
    const estimate = diagnose(input).chargeDeviation!;
    expect(estimate.kg).toBe(-1.25);
    expect(estimate.lowKg).toBe(-2);
  });

  it("gives none without the correct charge, and says to enter it", () => {
    const { chargeKg: _omitted, ...withoutCharge } = txvReading(2);
    const result = diagnose(withoutCharge as DiagnosisInputDraft);
    expect(result.chargeDeviation).toBeNull();
    expect(result.chargeDeviationNote).toMatch(/correct charge/);
  });

  it("gives none for a capillary circuit: critically charged, weigh in (common practice)", () => {
    const result = diagnose(txvReading(2, 8, { meteringDevice: "capillary" }));
    expect(result.chargeDeviation).toBeNull();
    expect(result.chargeDeviationNote).toMatch(/capillary.*weigh/);
  });

  it("gives none for refrigeration: a receiver holds liquid the subcooling does not show (Li & Braun's method is for air conditioners without receivers, from memory)", () => {
    for (const application of [
      "medium-temperature-refrigeration",
      "low-temperature-refrigeration",
      "process-chilling",
    ] as const) {
      const result = diagnose(txvReading(2, 6, { application }));
      expect(result.chargeDeviation).toBeNull();
      expect(result.chargeDeviationNote).toMatch(/receiver/);
    }
  });

  it("gives none without a valid subcooling, with the exclusion's reason (TRADE.md §1.2: a discharge-line reading is not subcooling)", () => {
    const result = diagnose(txvReading(-40, 5, { liquidTempLocation: "discharge-line" }));
    expect(result.chargeDeviation).toBeNull();
    expect(result.chargeDeviationNote).toMatch(/^No estimate without a valid subcooling \(.*discharge/);
  });

  it("gives none for a fixed device without its superheat target, with the target's reason (weigh in, TRADE.md §1.4)", () => {
    // 45 °C outdoor and a dry 15 °C wet bulb put the chart target below 2.8 K: a "dash".
    const result = diagnose(
      txvReading(2, 8, { meteringDevice: "fixed-orifice", outdoorAirDryBulbC: 45, returnAirWetBulbC: 15 }),
    );
    expect(result.chargeDeviation).toBeNull();
    expect(result.chargeDeviationNote).toMatch(/superheat target/);
  });

  it("cautions that the kilograms assume the charge is the only fault when the verdict names another (common practice: airflow and other faults first)", () => {
    // A compressor that no longer pumps (TRADE.md §2): suction high for the load (coil 11.7 K below
    // the return air), condensing only 6 K over ambient, half its rated current, a small split.
    const weak = diagnose({
      ...txvReading(4.5, 4),
      suctionPressureKPa: gaugeAt("R410A", 15, "dew"),
      suctionLineTempC: 19,
      liquidPressureKPa: gaugeAt("R410A", 41, "bubble"),
      liquidLineTempC: 36.5,
      supplyAirDryBulbC: 21,
      compressorAmps: 8,
      compressorRla: 18,
    });
    expect(weak.chargeState).toBe("weak-compressor");
    expect(weak.chargeDeviation).not.toBeNull();
    const caution = weak.warnings.find((warning) => warning.code === "charge-estimate-beside-other-fault");
    expect(caution?.severity).toBe("caution");
    expect(caution?.message).toMatch(/compressor not pumping well/);
    // A shortage read as a shortage carries no such caution.
    const short = diagnose(txvReading(1, 14));
    expect(short.chargeState).toBe("undercharged");
    expect(short.warnings.map((warning) => warning.code)).not.toContain("charge-estimate-beside-other-fault");
  });
});
