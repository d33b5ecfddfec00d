import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  DIAGNOSIS_FIELD_RANGES,
  DiagnosisInputSchema,
  DiagnosisResultSchema,
  LIQUID_TEMP_LOCATIONS,
  METERING_DEVICES,
} from "@shared/schemas/diagnosis";
import { diagnose, DiagnosisInputError, parseDiagnosisInput } from "@shared/engine/index";

// Consistency checks, not physical ones: the reference is the zod contract itself
// (shared/schemas/diagnosis.ts), the one check of an input before diagnose(), which trusts it.

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
    refrigerant: fc.constantFrom<unknown>(
      "R410A",
      "R410A",
      " R32 ",
      "\tR22\n",
      "",
      "   ",
      "R999",
      "R4\u000010A",
      "R410A\uD83D",
      "R\u007F32",
      5,
      undefined,
    ),
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
          subcoolingK: fc.oneof(
            fc.double({ min: -6, max: 61, noNaN: true }),
            fc.constantFrom<unknown>(-5, 60, "5", null),
          ),
          superheatK: fc.oneof(
            fc.double({ min: -6, max: 61, noNaN: true }),
            fc.constantFrom<unknown>(-5.0001, 60.0001),
          ),
          evaporatingTempC: fc.double({ min: -81, max: 91, noNaN: true }),
          condensingTempC: fc.oneof(
            fc.double({ min: -81, max: 91, noNaN: true }),
            fc.constantFrom<unknown>(Number.NaN, Infinity),
          ),
          outdoorAirDryBulbC: fc.oneof(fc.double({ min: -81, max: 91, noNaN: true }), fc.constant(null)),
          returnAirDryBulbC: fc.oneof(
            fc.double({ min: -81, max: 91, noNaN: true }),
            fc.constant(null),
            fc.constant(undefined),
          ),
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

/** What the boundary answers: the validated readings, or the field messages of its refusal. */
function boundary(
  candidate: unknown,
): { accepted: true; input: unknown } | { accepted: false; fieldErrors: Record<string, string[]> } {
  try {
    return { accepted: true, input: parseDiagnosisInput(candidate) };
  } catch (error) {
    if (error instanceof DiagnosisInputError) return { accepted: false, fieldErrors: error.fieldErrors };
    throw error;
  }
}

describe("parseDiagnosisInput", () => {
  it("accepts exactly what DiagnosisInputSchema accepts, and diagnose() answers every input it accepts", () => {
    let accepted = 0;
    fc.assert(
      fc.property(input, (candidate) => {
        const schema = DiagnosisInputSchema.safeParse(candidate);
        const parsed = boundary(candidate);
        expect(parsed.accepted).toBe(schema.success);
        if (!parsed.accepted || !schema.success) return;
        accepted += 1;
        expect(parsed.input).toEqual(schema.data);
        // The engine does not check its input again, so it must cope with everything the schema
        // lets through; only a refrigerant without a table is refused, on its own field.
        try {
          const result = diagnose(schema.data);
          expect(result.chargeState).toBeTypeOf("string");
          // And what it answers is a result the API can send and the screens can read.
          const answered = DiagnosisResultSchema.safeParse(result);
          expect(answered.success, JSON.stringify(answered.error?.issues)).toBe(true);
        } catch (error) {
          if (!(error instanceof DiagnosisInputError)) throw error;
          expect(Object.keys(error.fieldErrors)).toEqual(["refrigerant"]);
        }
      }),
      { numRuns: 5_000, seed: 20_261_201 },
    );
    // The samples must reach the accepting side too, or the check above proves little.
    expect(accepted).toBeGreaterThan(50);
  });

  it("decides each side of every cross-field limit as the schema's refinement says", () => {
    const base = {
      refrigerant: "R410A",
      meteringDevice: "txv",
      suctionPressureKPa: 820,
      suctionLineTempC: 13,
      liquidPressureKPa: 2650,
      liquidLineTempC: 38,
    };
    // Each variant with the fields the schema refuses it on (none: accepted).
    const variants: [Record<string, number>, string[]][] = [
      [{ returnAirDryBulbC: 26, returnAirWetBulbC: 26.2 }, []],
      [{ returnAirDryBulbC: 26, returnAirWetBulbC: 26.21 }, ["returnAirWetBulbC"]],
      [{ dischargePressureKPa: 820 }, ["dischargePressureKPa"]],
      [{ dischargePressureKPa: 820.01 }, []],
      [{ suctionPressureKPa: 2650 }, ["suctionPressureKPa", "liquidPressureKPa"]],
      [{ suctionPressureKPa: -101.325 }, ["suctionPressureKPa"]],
      [{ suctionPressureKPa: -101.32 }, []],
      [{ atmosphericPressureKPa: 80, suctionPressureKPa: -80 }, ["suctionPressureKPa"]],
      [{ atmosphericPressureKPa: 80, suctionPressureKPa: -79.9 }, []],
      [
        { atmosphericPressureKPa: 80, dischargePressureKPa: -80, suctionPressureKPa: -90 },
        ["suctionPressureKPa", "dischargePressureKPa"],
      ],
      [{ returnAirRelativeHumidity: 50 }, ["returnAirDryBulbC"]],
      [{ returnAirRelativeHumidity: 50, returnAirDryBulbC: 26 }, []],
      [{ returnAirRelativeHumidity: 0, returnAirDryBulbC: 26 }, ["returnAirRelativeHumidity"]],
      [{ compressorRla: 0 }, ["compressorRla"]],
      [{ compressorAmps: 0 }, []],
      [{ runMinutes: 0 }, []],
      [{ runMinutes: -0.01 }, ["runMinutes"]],
    ];
    for (const [variant, refusedOn] of variants) {
      const parsed = boundary({ ...base, ...variant });
      expect({ variant, refusedOn: parsed.accepted ? [] : Object.keys(parsed.fieldErrors) }).toEqual({
        variant,
        refusedOn,
      });
    }
  });

  it("trims the refrigerant and drops keys the schema does not know", () => {
    const parsed = parseDiagnosisInput({
      refrigerant: " R410A\t",
      meteringDevice: "txv",
      suctionPressureKPa: 820,
      suctionLineTempC: 13,
      liquidPressureKPa: 2650,
      liquidLineTempC: 38,
      unrelatedField: 1,
    });
    expect(parsed).toEqual({
      refrigerant: "R410A",
      meteringDevice: "txv",
      suctionPressureKPa: 820,
      suctionLineTempC: 13,
      liquidPressureKPa: 2650,
      liquidLineTempC: 38,
    });
  });

  it("refuses what is not a readings object", () => {
    for (const candidate of [null, undefined, 5, "R410A", [], [{ refrigerant: "R410A" }]]) {
      expect(() => parseDiagnosisInput(candidate)).toThrow(DiagnosisInputError);
      expect(DiagnosisInputSchema.safeParse(candidate).success).toBe(false);
    }
  });
});
