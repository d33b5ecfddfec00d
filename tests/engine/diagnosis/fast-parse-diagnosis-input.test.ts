import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  DIAGNOSIS_FIELD_RANGES,
  DiagnosisInputSchema,
  LIQUID_TEMP_LOCATIONS,
  METERING_DEVICES,
} from "@shared/schemas/diagnosis";
import { fastParseDiagnosisInput } from "@shared/engine/diagnosis/fast-parse-diagnosis-input";

// Consistency check, not a physical one: the reference here is the zod contract itself
// (shared/schemas/diagnosis.ts), which the fast check must agree with exactly.

type Field = keyof typeof DIAGNOSIS_FIELD_RANGES;

/** Mostly inside the field's range (so whole inputs pass often enough), sometimes on or past a
 * limit (ranges, the vacuum at standard atmosphere), now and then not a number at all. */
function reading(field: Field) {
  const range = DIAGNOSIS_FIELD_RANGES[field];
  const low = Math.max(range.min, -150);
  const high = Math.min(range.max, 3_000);
  return fc.oneof(
    { weight: 30, arbitrary: fc.double({ min: low, max: high, noNaN: true }) },
    {
      weight: 2,
      arbitrary: fc.constantFrom(
        range.min,
        range.max,
        range.min - 0.01,
        range.max + 0.01,
        -101.325,
        -101.3,
        -101.4,
        0,
        -0,
      ),
    },
    {
      weight: 1,
      arbitrary: fc.constantFrom<unknown>(
        "12",
        null,
        true,
        {},
        [],
        undefined,
        Number.NaN,
        Number.POSITIVE_INFINITY,
        Number.NEGATIVE_INFINITY,
      ),
    },
  );
}
const optional = (field: Field) => fc.option(reading(field), { nil: undefined, freq: 3 });

const input = fc.record(
  {
    refrigerant: fc.constantFrom<unknown>("R410A", "R410A", " R32 ", "\tR22\n", "", "   ", "R999", "R4\u000010A", "R410A\uD83D", "R\u007F32", 5, undefined),
    meteringDevice: fc.constantFrom<unknown>(...METERING_DEVICES, ...METERING_DEVICES, "TXV", "", undefined),
    suctionPressureKPa: reading("suctionPressureKPa"),
    suctionLineTempC: reading("suctionLineTempC"),
    liquidPressureKPa: reading("liquidPressureKPa"),
    liquidLineTempC: reading("liquidLineTempC"),
    liquidTempLocation: fc.constantFrom<unknown>(
      ...LIQUID_TEMP_LOCATIONS,
      ...LIQUID_TEMP_LOCATIONS,
      "suction-line",
      null,
      undefined,
    ),
    dischargePressureKPa: optional("dischargePressureKPa"),
    dischargeLineTempC: optional("dischargeLineTempC"),
    returnAirDryBulbC: optional("returnAirDryBulbC"),
    returnAirWetBulbC: optional("returnAirWetBulbC"),
    returnAirRelativeHumidity: optional("returnAirRelativeHumidity"),
    supplyAirDryBulbC: optional("supplyAirDryBulbC"),
    outdoorAirDryBulbC: optional("outdoorAirDryBulbC"),
    compressorAmps: optional("compressorAmps"),
    compressorRla: optional("compressorRla"),
    targetSuperheatK: optional("targetSuperheatK"),
    targetSubcoolingK: optional("targetSubcoolingK"),
    atmosphericPressureKPa: optional("atmosphericPressureKPa"),
    runMinutes: optional("runMinutes"),
    chargeKg: optional("chargeKg"),
    chargeReference: fc.option(
      fc.record(
        {
          subcoolingK: fc.oneof(fc.double({ min: -6, max: 61, noNaN: true }), fc.constantFrom<unknown>(-5, 60, "5", null)),
          superheatK: fc.oneof(fc.double({ min: -6, max: 61, noNaN: true }), fc.constantFrom<unknown>(-5.0001, 60.0001)),
          evaporatingTempC: fc.double({ min: -81, max: 91, noNaN: true }),
          condensingTempC: fc.oneof(fc.double({ min: -81, max: 91, noNaN: true }), fc.constantFrom<unknown>(Number.NaN, Infinity)),
          outdoorAirDryBulbC: fc.oneof(fc.double({ min: -81, max: 91, noNaN: true }), fc.constant(null)),
          returnAirDryBulbC: fc.oneof(fc.double({ min: -81, max: 91, noNaN: true }), fc.constant(null), fc.constant(undefined)),
          extra: fc.constant("dropped"),
        },
        { requiredKeys: ["subcoolingK", "superheatK", "evaporatingTempC", "condensingTempC", "outdoorAirDryBulbC"] },
      ),
      { nil: undefined, freq: 2 },
    ),
    unrelatedField: fc.constant("dropped by the schema"),
  },
  {
    requiredKeys: [
      "refrigerant",
      "meteringDevice",
      "suctionPressureKPa",
      "suctionLineTempC",
      "liquidPressureKPa",
      "liquidLineTempC",
    ],
  },
);

/** Schema output with absent and undefined keys treated alike (the fast check keeps every key). */
const withoutUndefined = (value: object) =>
  Object.fromEntries(Object.entries(value).filter(([, field]) => field !== undefined));

describe("fastParseDiagnosisInput", () => {
  it("accepts exactly what DiagnosisInputSchema accepts, with the same parsed readings", () => {
    let accepted = 0;
    fc.assert(
      fc.property(input, (candidate) => {
        const schema = DiagnosisInputSchema.safeParse(candidate);
        const fast = fastParseDiagnosisInput(candidate);
        if (schema.success) accepted += 1;
        expect(fast !== null).toBe(schema.success);
        if (fast !== null && schema.success) expect(withoutUndefined(fast)).toEqual(withoutUndefined(schema.data));
      }),
      { numRuns: 5_000, seed: 20_261_201 },
    );
    // The samples must reach the accepting side too, or the check above proves little.
    expect(accepted).toBeGreaterThan(50);
  });

  it("agrees on each side of every cross-field limit", () => {
    const base = {
      refrigerant: "R410A",
      meteringDevice: "txv",
      suctionPressureKPa: 820,
      suctionLineTempC: 13,
      liquidPressureKPa: 2650,
      liquidLineTempC: 38,
    };
    const variants = [
      { returnAirDryBulbC: 26, returnAirWetBulbC: 26.2 },
      { returnAirDryBulbC: 26, returnAirWetBulbC: 26.21 },
      { dischargePressureKPa: 820 },
      { dischargePressureKPa: 820.01 },
      { suctionPressureKPa: 2650 },
      { suctionPressureKPa: -101.325 },
      { suctionPressureKPa: -101.32 },
      { atmosphericPressureKPa: 80, suctionPressureKPa: -80 },
      { atmosphericPressureKPa: 80, suctionPressureKPa: -79.9 },
      { atmosphericPressureKPa: 80, dischargePressureKPa: -80, suctionPressureKPa: -90 },
      { returnAirRelativeHumidity: 50 },
      { returnAirRelativeHumidity: 50, returnAirDryBulbC: 26 },
      { returnAirRelativeHumidity: 0, returnAirDryBulbC: 26 },
      { compressorRla: 0 },
      { compressorAmps: 0 },
      { runMinutes: 0 },
      { runMinutes: -0.01 },
    ];
    for (const variant of variants) {
      const candidate = { ...base, ...variant };
      expect({ variant, accepted: fastParseDiagnosisInput(candidate) !== null }).toEqual({
        variant,
        accepted: DiagnosisInputSchema.safeParse(candidate).success,
      });
    }
  });

  it("refuses what is not a readings object", () => {
    for (const candidate of [null, undefined, 5, "R410A", [], [{ refrigerant: "R410A" }]]) {
      expect(fastParseDiagnosisInput(candidate)).toBeNull();
      expect(DiagnosisInputSchema.safeParse(candidate).success).toBe(false);
    }
  });
});
