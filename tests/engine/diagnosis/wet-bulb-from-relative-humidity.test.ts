import { describe, expect, it } from "vitest";
import psychrolib from "psychrolib";
import { wetBulbFromRelativeHumidity } from "@shared/engine/index";

/** The 80/67 °F rating point read off the ASHRAE psychrometric chart from memory (67 °F = 19.44 °C): a chart reading, K. */
const CHART_READING_K = 0.2;
/** The same point as toBeCloseTo digits: 19.4 °C to the degree (|Δ| < 0.5 K). */
const CHART_READING_DIGITS = 0;
/** Saturation by definition; psychrolib's iterative solve stops within 0.001 K (PSYCHROLIB_TOLERANCE, SI): digits. */
const SATURATION_DIGITS = 2;

describe("wetBulbFromRelativeHumidity", () => {
  it("gives about 19.4 °C wet bulb at 26.7 °C and 51 % RH, the 80/67 °F rating point (ASHRAE psychrometric chart, from memory)", () => {
    expect(wetBulbFromRelativeHumidity(26.7, 51, 101.325)).toBeCloseTo(19.4, CHART_READING_DIGITS);
    expect(Math.abs(wetBulbFromRelativeHumidity(26.7, 51, 101.325) - 19.44)).toBeLessThan(CHART_READING_K);
  });

  it("equals the dry bulb at 100 % RH (definition of saturation)", () => {
    expect(wetBulbFromRelativeHumidity(20, 100, 101.325)).toBeCloseTo(20, SATURATION_DIGITS);
  });

  it("falls with altitude at the same dry bulb and RH (lower pressure evaporates faster; psychrometric theory)", () => {
    expect(wetBulbFromRelativeHumidity(30, 40, 84)).toBeLessThan(wetBulbFromRelativeHumidity(30, 40, 101.325));
  });

  it("sets SI itself even after another caller switched psychrolib to IP (its unit system is global state)", () => {
    const reference = wetBulbFromRelativeHumidity(25, 50, 101.325);
    psychrolib.SetUnitSystem(psychrolib.IP);
    expect(wetBulbFromRelativeHumidity(25, 50, 101.325)).toBe(reference);
  });

  it("rejects humidity outside (0, 100] %", () => {
    expect(() => wetBulbFromRelativeHumidity(25, 0, 101.325)).toThrow(/relative humidity/);
    expect(() => wetBulbFromRelativeHumidity(25, 101, 101.325)).toThrow(/relative humidity/);
  });
});
