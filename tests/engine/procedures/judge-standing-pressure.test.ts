import { describe, expect, it } from "vitest";
import {
  judgeStandingPressure,
  NON_CONDENSABLE_EXCESS_K,
  saturationPressure,
  STANDARD_ATMOSPHERE_KPA,
} from "@shared/engine/index";

/** R134a saturation pressure at 25 °C, kPa absolute: 665.8 (ASHRAE Handbook—Fundamentals refrigerant tables; value from memory). */
const R134A_25C_KPA_ABS = 665.8;
/** Tolerance on that table value, kPa (its printed precision plus the table interpolation). */
const TABLE_TOLERANCE_KPA = 1;

describe("judgeStandingPressure (non-condensables from the off-cycle standing pressure [S27][S28][S31])", () => {
  it("expects the saturation pressure of the equalised temperature (R134a at 25 °C, handbook table)", () => {
    const result = judgeStandingPressure({
      refrigerant: "R134a",
      standingGaugeKPa: R134A_25C_KPA_ABS - STANDARD_ATMOSPHERE_KPA,
      equalisedTempC: 25,
    });
    expect(Math.abs(result.expectedGaugeKPa + STANDARD_ATMOSPHERE_KPA - R134A_25C_KPA_ABS)).toBeLessThanOrEqual(
      TABLE_TOLERANCE_KPA,
    );
    expect(result.verdict).toBe("pass");
    expect(Math.abs(result.excessK)).toBeLessThan(0.1);
    expect(result.zeotrope).toBe(false);
  });

  it("fails a pressure whose saturation temperature is more than 3 K (5 °F) above the condenser [S31]", () => {
    const standing = saturationPressure("R410A", 25 + NON_CONDENSABLE_EXCESS_K + 1, "bubble") - STANDARD_ATMOSPHERE_KPA;
    const result = judgeStandingPressure({ refrigerant: "R410A", standingGaugeKPa: standing, equalisedTempC: 25 });
    expect(result.verdict).toBe("fail");
    expect(result.excessK).toBeCloseTo(NON_CONDENSABLE_EXCESS_K + 1, 2);
    expect(result.reason).toMatch(/Non-condensables/);
  });

  it("calls 1–3 K above saturation suspect, not proven (thermometer and gauge allowance, common practice)", () => {
    const standing = saturationPressure("R32", 22, "bubble") - STANDARD_ATMOSPHERE_KPA;
    expect(judgeStandingPressure({ refrigerant: "R32", standingGaugeKPa: standing, equalisedTempC: 20 }).verdict).toBe(
      "warn",
    );
  });

  it("says no liquid is left when the pressure is well below saturation", () => {
    const result = judgeStandingPressure({ refrigerant: "R22", standingGaugeKPa: 500, equalisedTempC: 25 });
    expect(result.verdict).toBe("warn");
    expect(result.reason).toMatch(/No liquid is left/);
  });

  it("compares a zeotrope with its bubble pressure and says what the check cannot show inside the glide [S1]", () => {
    const bubble = saturationPressure("R407C", 25, "bubble");
    const dew = saturationPressure("R407C", 25, "dew");
    const inside = judgeStandingPressure({
      refrigerant: "R407C",
      standingGaugeKPa: (bubble + dew) / 2 - STANDARD_ATMOSPHERE_KPA,
      equalisedTempC: 25,
    });
    expect(inside.zeotrope).toBe(true);
    expect(inside.verdict).toBe("pass");
    expect(inside.reason).toMatch(/neither be shown nor ruled out/);
    const above = judgeStandingPressure({
      refrigerant: "R407C",
      standingGaugeKPa: saturationPressure("R407C", 30, "bubble") - STANDARD_ATMOSPHERE_KPA,
      equalisedTempC: 25,
    });
    expect(above.verdict).toBe("fail");
  });

  it("uses the site's atmosphere to turn the gauge reading into absolute", () => {
    const atSea = judgeStandingPressure({ refrigerant: "R134a", standingGaugeKPa: 565, equalisedTempC: 25 });
    const high = judgeStandingPressure({
      refrigerant: "R134a",
      standingGaugeKPa: 565,
      equalisedTempC: 25,
      atmosphericPressureKPa: 85,
    });
    expect(high.excessKPa).toBeCloseTo(atSea.excessKPa - (STANDARD_ATMOSPHERE_KPA - 85), 6);
  });

  it("refuses non-finite readings", () => {
    expect(() =>
      judgeStandingPressure({ refrigerant: "R134a", standingGaugeKPa: Number.NaN, equalisedTempC: 25 }),
    ).toThrow(RangeError);
  });
});
