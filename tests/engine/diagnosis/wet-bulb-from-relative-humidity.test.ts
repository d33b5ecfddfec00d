import { describe, expect, it } from "vitest";
import psychrolib from "psychrolib";
import { wetBulbFromRelativeHumidity } from "@shared/engine/index";

describe("wetBulbFromRelativeHumidity", () => {
  it("gives about 19.4 °C wet bulb at 26.7 °C and 51 % RH, the 80/67 °F rating point (ASHRAE psychrometric chart, from memory)", () => {
    expect(wetBulbFromRelativeHumidity(26.7, 51, 101.325)).toBeCloseTo(19.4, 0);
    expect(Math.abs(wetBulbFromRelativeHumidity(26.7, 51, 101.325) - 19.44)).toBeLessThan(0.2);
  });

  it("equals the dry bulb at 100 % RH (definition of saturation)", () => {
    expect(wetBulbFromRelativeHumidity(20, 100, 101.325)).toBeCloseTo(20, 2);
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
