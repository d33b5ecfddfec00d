import { describe, expect, it } from "vitest";
import { atmosphericPressureAtAltitude, STANDARD_ATMOSPHERE_KPA } from "@shared/engine/index";

/** Tolerance against the printed ISO 2533 table values (5 significant figures), kPa. */
const TABLE_TOLERANCE_KPA = 0.005;

describe("atmosphericPressureAtAltitude (ISO 2533 barometric formula)", () => {
  it("gives the standard atmosphere at sea level", () => {
    expect(atmosphericPressureAtAltitude(0)).toBe(STANDARD_ATMOSPHERE_KPA);
  });

  // ISO 2533:1975 standard atmosphere table, geopotential altitude (values from memory).
  it.each([
    [1000, 89.875],
    [2000, 79.495],
    [3000, 70.109],
    [5000, 54.02],
  ])("at %i m gives the table's %f kPa", (altitude, expected) => {
    expect(Math.abs(atmosphericPressureAtAltitude(altitude) - expected)).toBeLessThanOrEqual(TABLE_TOLERANCE_KPA);
  });

  it("falls as the site rises and is above sea level pressure below it", () => {
    expect(atmosphericPressureAtAltitude(-400)).toBeGreaterThan(STANDARD_ATMOSPHERE_KPA);
    expect(atmosphericPressureAtAltitude(85)).toBeLessThan(STANDARD_ATMOSPHERE_KPA);
    expect(atmosphericPressureAtAltitude(1500)).toBeLessThan(atmosphericPressureAtAltitude(1000));
  });

  it("refuses altitudes outside the troposphere and non-numbers", () => {
    expect(() => atmosphericPressureAtAltitude(Number.NaN)).toThrow(RangeError);
    expect(() => atmosphericPressureAtAltitude(12_000)).toThrow(RangeError);
    expect(() => atmosphericPressureAtAltitude(-1000)).toThrow(RangeError);
  });
});
