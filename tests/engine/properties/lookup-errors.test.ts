/**
 * Failure behaviour of the property lookups: unknown refrigerants, out-of-range and
 * non-finite inputs throw PropertyRangeError with a code and a message a technician
 * can act on; nothing is extrapolated (issue 3 API contract).
 */
import { describe, expect, it } from "vitest";
import {
  getRefrigerant,
  saturatedState,
  saturationPressure,
  saturationTemperature,
  type SaturationPoint,
} from "@shared/engine/index.ts";
import { thrownPropertyError } from "./thrown-property-error.ts";

/** R744's triple point as the tables and docs/properties.md print it (−56.557 °C, to 0.001 K): toBeCloseTo digits. */
const TRIPLE_POINT_DIGITS = 3;

const thrown = thrownPropertyError;

describe("property lookup errors", () => {
  it("rejects a temperature below the table in words a technician reads", () => {
    const error = thrown(() => saturationPressure("R32", -60.5));
    expect(error.code).toBe("BELOW_RANGE");
    expect(error.refrigerantId).toBe("R32");
    expect(error.message).toMatch(/^R32 below -60 °C is outside the table/);
  });

  it("rejects a temperature above the table and names the critical point", () => {
    const error = thrown(() => saturationPressure("R744", 31.5));
    expect(error.code).toBe("ABOVE_RANGE");
    expect(error.message).toMatch(/^R744 above 30.878 °C is outside the table/);
    expect(error.message).toMatch(/critical point 30.9782 °C/);
  });

  it("starts R744 at its triple point, above -60 °C", () => {
    expect(getRefrigerant("R744").validRange.minimumC).toBeCloseTo(-56.557, TRIPLE_POINT_DIGITS);
    expect(thrown(() => saturationPressure("R744", -57)).code).toBe("BELOW_RANGE");
  });

  it("accepts the exact ends of the table", () => {
    const { minimumC, maximumC } = getRefrigerant("R410A").validRange;
    expect(Number.isFinite(saturationPressure("R410A", minimumC, "bubble"))).toBe(true);
    expect(Number.isFinite(saturationPressure("R410A", maximumC, "dew"))).toBe(true);
  });

  it("rejects a pressure below the table and hints at gauge readings", () => {
    // 5 kPa would be a gauge reading mistaken for absolute at -60 °C for R32 (65 kPa abs)
    const error = thrown(() => saturationTemperature("R32", 5));
    expect(error.code).toBe("BELOW_RANGE");
    expect(error.message).toMatch(/^R32 below 64.96 kPa absolute is outside the table/);
    expect(error.message).toMatch(/absolute, not gauge/);
  });

  it("rejects a pressure above the table", () => {
    expect(thrown(() => saturationTemperature("R410A", 6000)).code).toBe("ABOVE_RANGE");
    expect(thrown(() => saturationTemperature("R410A", 0)).code).toBe("BELOW_RANGE");
    expect(thrown(() => saturationTemperature("R410A", -100)).code).toBe("BELOW_RANGE");
  });

  it.each([Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY])(
    "rejects the non-finite input %f",
    (value) => {
      expect(thrown(() => saturationPressure("R134a", value)).code).toBe("NOT_FINITE");
      expect(thrown(() => saturationTemperature("R134a", value)).code).toBe("NOT_FINITE");
      expect(thrown(() => saturatedState("R134a", value)).code).toBe("NOT_FINITE");
      expect(thrown(() => saturationPressure("R134a", value)).message).toMatch(
        /^R134a: the temperature must be a number/,
      );
    },
  );

  it("rejects an unknown refrigerant and lists the known ones", () => {
    const error = thrown(() => saturationPressure("R999", 0));
    expect(error.code).toBe("UNKNOWN_REFRIGERANT");
    expect(error.message).toMatch(/^R999 is not a refrigerant Satura has tables for/);
    expect(error.message).toMatch(/R410A/);
    // designations are exact: lower-case or without the isomer suffix is not guessed
    expect(thrown(() => getRefrigerant("r32")).code).toBe("UNKNOWN_REFRIGERANT");
    expect(thrown(() => getRefrigerant("R1234ze")).code).toBe("UNKNOWN_REFRIGERANT");
  });

  it("rejects a saturation point other than bubble or dew", () => {
    const error = thrown(() => saturationPressure("R407C", 0, "mid" as SaturationPoint));
    expect(error.code).toBe("INVALID_POINT");
    expect(thrown(() => saturationTemperature("R407C", 500, "mid" as SaturationPoint)).code).toBe("INVALID_POINT");
  });

  it("uses the dew point by default (superheat side, TRADE.md §1.1)", () => {
    expect(saturationPressure("R407C", 0)).toBe(saturationPressure("R407C", 0, "dew"));
    expect(saturationTemperature("R407C", 500)).toBe(saturationTemperature("R407C", 500, "dew"));
  });
});
