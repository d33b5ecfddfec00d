import { describe, expect, it } from "vitest";
import { DiagnosisResultSchema, type DiagnosisInputDraft } from "@shared/schemas/diagnosis";
import {
  DiagnosisInputError,
  diagnose,
  parseDiagnosisInput,
  gaugeToAbsolute,
  getRefrigerant,
  saturationPressure,
  saturationTemperature,
  subcooling,
  superheat,
  absoluteToGauge,
} from "@shared/engine/index";

const gaugeAt = (id: string, temperatureC: number, point: "bubble" | "dew") =>
  absoluteToGauge(saturationPressure(id, temperatureC, point));

// Tolerances, as toBeCloseTo's digits (passes when |actual − expected| < 0.5 × 10^−digits).
/**
 * Pressures made by saturationPressure at a design temperature and read back by
 * saturationTemperature: the two interpolations of one table (decision 003) are inverse to far
 * inside the table's own accuracy against the equation of state (INTERPOLATION_TOLERANCE_K, 0.005 K).
 */
const TABLE_ROUND_TRIP_DIGITS = 6;
/** The engine's figure against the same engine function on the same readings: round-off only. */
const SAME_FUNCTION_DIGITS = 9;
/** The reading's glide is at its suction pressure (5 °C dew), the table's at the 0 °C dew pressure: they differ a little by construction, K. */
const GLIDE_AT_OTHER_PRESSURE_K = 0.5;

const r407c: DiagnosisInputDraft = Object.freeze({
  refrigerant: "R407C",
  meteringDevice: "txv",
  suctionPressureKPa: gaugeAt("R407C", 5, "dew"),
  suctionLineTempC: 10,
  liquidPressureKPa: gaugeAt("R407C", 45, "bubble"),
  liquidLineTempC: 40,
});

/** The field messages for readings refused at the boundary (the schema), or by diagnose() itself (an unknown refrigerant). */
function fieldErrorsOf(input: unknown): Record<string, string[]> {
  try {
    diagnose(parseDiagnosisInput(input));
  } catch (error) {
    if (error instanceof DiagnosisInputError) return error.fieldErrors;
    throw error;
  }
  throw new Error("expected a DiagnosisInputError");
}

describe("diagnose", () => {
  it("takes superheat from the dew point and subcooling from the bubble point of a blend (TRADE.md §1.1 [S1][S2][S3])", () => {
    const result = diagnose(r407c);
    expect(result.evaporatingTempC).toBeCloseTo(5, TABLE_ROUND_TRIP_DIGITS);
    expect(result.condensingTempC).toBeCloseTo(45, TABLE_ROUND_TRIP_DIGITS);
    expect(result.superheatK).toBeCloseTo(5, TABLE_ROUND_TRIP_DIGITS);
    expect(result.subcoolingK).toBeCloseTo(5, TABLE_ROUND_TRIP_DIGITS);
    expect(result.superheatK).toBeCloseTo(superheat("R407C", r407c.suctionPressureKPa, 10), SAME_FUNCTION_DIGITS);
    expect(result.subcoolingK).toBeCloseTo(subcooling("R407C", r407c.liquidPressureKPa, 40), SAME_FUNCTION_DIGITS);
  });

  it("reports the glide: about 5–7 K for R407C (TRADE.md §1.1, memory), in line with the table's glide at 0 °C", () => {
    const result = diagnose(r407c);
    expect(result.glideK).toBeGreaterThan(5);
    expect(result.glideK).toBeLessThan(7);
    const tableGlide = getRefrigerant("R407C").glideAt0C?.glideK ?? Number.NaN;
    expect(Math.abs(result.glideK! - tableGlide)).toBeLessThan(GLIDE_AT_OTHER_PRESSURE_K);
    expect(result.evaporatingBubbleTempC).toBeCloseTo(
      saturationTemperature("R407C", gaugeToAbsolute(r407c.suctionPressureKPa), "bubble"),
      SAME_FUNCTION_DIGITS,
    );
  });

  it("reports zero glide for a pure refrigerant (bubble = dew [S2][S4])", () => {
    const result = diagnose({
      ...r407c,
      refrigerant: "R32",
      suctionPressureKPa: gaugeAt("R32", 5, "dew"),
      liquidPressureKPa: gaugeAt("R32", 45, "bubble"),
    });
    expect(result.glideK).toBeCloseTo(0, SAME_FUNCTION_DIGITS);
    expect(result.condenserGlideK).toBeCloseTo(0, SAME_FUNCTION_DIGITS);
  });

  it("computes the compression ratio from absolute pressures [S38], from discharge pressure when given", () => {
    const fromLiquid = diagnose(r407c);
    expect(fromLiquid.compressionRatioBasis).toBe("liquid");
    expect(fromLiquid.compressionRatio).toBeCloseTo(
      gaugeToAbsolute(r407c.liquidPressureKPa) / gaugeToAbsolute(r407c.suctionPressureKPa),
      SAME_FUNCTION_DIGITS,
    );
    const fromDischarge = diagnose({ ...r407c, dischargePressureKPa: r407c.liquidPressureKPa + 50 });
    expect(fromDischarge.compressionRatioBasis).toBe("discharge");
    expect(fromDischarge.compressionRatio!).toBeGreaterThan(fromLiquid.compressionRatio!);
  });

  it("uses the site's atmospheric pressure for gauge readings (PRODUCT.md units)", () => {
    const highSite = diagnose({ ...r407c, atmosphericPressureKPa: 90 });
    expect(highSite.evaporatingTempC!).toBeLessThan(diagnose(r407c).evaporatingTempC!);
  });

  it("leaves subcooling out when the temperature was taken on the discharge line, and says so [S13]", () => {
    const result = diagnose({ ...r407c, liquidTempLocation: "discharge-line", liquidLineTempC: 75 });
    expect(result.subcoolingK).toBeNull();
    expect(result.chargeState).toBe("insufficient-data");
    const warning = result.warnings.find((w) => w.code === "subcooling-on-discharge-line");
    expect(warning?.severity).toBe("invalid-data");
    expect(warning?.message).toMatch(/not valid/);
  });

  it("warns about a discharge line above 107 °C (225 °F) [S13][S37]", () => {
    const codes = diagnose({ ...r407c, dischargeLineTempC: 108 }).warnings.map((w) => w.code);
    expect(codes).toContain("discharge-temperature-high");
    expect(diagnose({ ...r407c, dischargeLineTempC: 106 }).warnings.map((w) => w.code)).not.toContain(
      "discharge-temperature-high",
    );
  });

  it("refuses a discharge line colder than the dew point at discharge pressure (impossible)", () => {
    const result = diagnose({ ...r407c, dischargeLineTempC: 30 });
    expect(result.warnings.map((w) => w.code)).toContain("discharge-below-saturation");
    expect(result.findings.some((f) => f.ruleId === "discharge-line-temperature")).toBe(false);
  });

  it("warns when the unit has run under 10 minutes (practice; Title 24 reads at 15 min [S10])", () => {
    expect(diagnose({ ...r407c, runMinutes: 9 }).warnings.map((w) => w.code)).toContain("short-run-time");
    expect(diagnose({ ...r407c, runMinutes: 10 }).warnings.map((w) => w.code)).not.toContain("short-run-time");
  });

  it("reports a pressure outside the table as a warning instead of throwing", () => {
    const result = diagnose({ ...r407c, suctionPressureKPa: -95 });
    expect(result.evaporatingTempC).toBeNull();
    expect(result.superheatK).toBeNull();
    const warning = result.warnings.find((w) => w.code === "outside-table");
    expect(warning?.field).toBe("suctionPressureKPa");
    expect(warning?.message).toMatch(/R407C at 6\.3 kPa absolute is below .* outside the table/);
  });

  it("computes the wet bulb from humidity when none was measured, and uses it for the piston target", () => {
    const result = diagnose({
      ...r407c,
      meteringDevice: "fixed-orifice",
      returnAirDryBulbC: 26.7,
      returnAirRelativeHumidity: 50,
      outdoorAirDryBulbC: 35,
    });
    expect(result.wetBulbBasis).toBe("from-relative-humidity");
    expect(result.returnAirWetBulbC).toBeCloseTo(19.29, 1);
    expect(result.targets.superheat?.basis).toBe("formula");
  });

  it("names a source for every finding and warning", () => {
    const result = diagnose({
      ...r407c,
      returnAirDryBulbC: 26,
      supplyAirDryBulbC: 15,
      outdoorAirDryBulbC: 35,
      dischargeLineTempC: 110,
      compressorAmps: 20,
      runMinutes: 3,
    });
    for (const item of [...result.findings, ...result.warnings])
      expect(item.source).toMatch(/\[S\d+\]|common practice|memory|TRADE\.md|physics|discharge gas/);
    expect(DiagnosisResultSchema.safeParse(result).success).toBe(true);
  });

  it("does not mutate its input", () => {
    const frozen = Object.freeze({ ...r407c });
    expect(() => diagnose(frozen)).not.toThrow();
  });

  // diagnose() trusts its input: the readings are checked once, at the boundary they come through.
  describe("validation (parseDiagnosisInput, then diagnose)", () => {
    it("refuses suction pressure at or above liquid pressure with messages on both fields", () => {
      const errors = fieldErrorsOf({ ...r407c, suctionPressureKPa: 1800, liquidPressureKPa: 1800 });
      expect(errors.suctionPressureKPa?.[0]).toMatch(/must be below liquid pressure/);
      expect(errors.liquidPressureKPa?.[0]).toMatch(/hoses/);
    });

    it("refuses a wet bulb above the dry bulb", () => {
      expect(fieldErrorsOf({ ...r407c, returnAirDryBulbC: 24, returnAirWetBulbC: 26 }).returnAirWetBulbC?.[0]).toMatch(
        /cannot be above its dry bulb/,
      );
    });

    it("asks for the dry bulb when only relative humidity is given", () => {
      expect(fieldErrorsOf({ ...r407c, returnAirRelativeHumidity: 50 }).returnAirDryBulbC?.[0]).toMatch(/dry bulb/);
    });

    it("refuses a gauge pressure below a perfect vacuum", () => {
      expect(fieldErrorsOf({ ...r407c, suctionPressureKPa: -102 }).suctionPressureKPa?.[0]).toMatch(/perfect vacuum/);
    });

    it("names the field of a missing or non-numeric reading", () => {
      const errors = fieldErrorsOf({ ...r407c, suctionLineTempC: "warm" });
      expect(errors.suctionLineTempC?.[0]).toBe("Suction line temperature must be a number in °C");
      expect(fieldErrorsOf({ ...r407c, meteringDevice: "piston" }).meteringDevice?.[0]).toMatch(/metering device/);
    });

    it("refuses readings outside their plausible range with the field's own message", () => {
      expect(
        fieldErrorsOf({ ...r407c, returnAirDryBulbC: 25, returnAirRelativeHumidity: 120 })
          .returnAirRelativeHumidity?.[0],
      ).toBe("Return air relative humidity cannot exceed 100 %");
      expect(fieldErrorsOf({ ...r407c, suctionLineTempC: 250 }).suctionLineTempC?.[0]).toMatch(/not a pipe reading/);
      expect(fieldErrorsOf({ ...r407c, compressorRla: 0 }).compressorRla?.[0]).toMatch(/below 0.05 A/);
      // A rating too small to be one: the current ratio divided by it ran away to Infinity,
      // which no result can carry (found by the boundary's property test).
      expect(fieldErrorsOf({ ...r407c, compressorRla: 5e-324 }).compressorRla?.[0]).toMatch(
        /not a compressor's rating/,
      );
      expect(fieldErrorsOf({ ...r407c, atmosphericPressureKPa: 30 }).atmosphericPressureKPa?.[0]).toMatch(/altitude/);
    });

    it("refuses an unknown refrigerant on the refrigerant field", () => {
      expect(fieldErrorsOf({ ...r407c, refrigerant: "R999" }).refrigerant?.[0]).toMatch(/R999/);
    });
  });
});
