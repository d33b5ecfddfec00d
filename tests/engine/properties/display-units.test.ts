/**
 * Display unit conversions (shared/engine/units) against defined or published
 * values: 1 atm = 101.325 kPa = 14.696 psi = 29.921 inHg = 760 torr (BIPM SI
 * Brochure / NIST SP 811 definitions); °F = 1.8 °C + 32; 1 K difference = 1.8 °F.
 * Kept beside the property tests because gauge/absolute handling feeds the lookups.
 */
import { describe, expect, it } from "vitest";
import {
  absoluteToGauge,
  convertPressure,
  convertTemperature,
  convertTemperatureDifference,
  gaugeToAbsolute,
  pressureFromDisplay,
  pressureToDisplay,
  saturationTemperature,
} from "@shared/engine/index.ts";

describe("display units", () => {
  it("converts one standard atmosphere to psi, bar, MPa, torr and inHg (NIST SP 811)", () => {
    expect(convertPressure(101.325, "kPa", "psi")).toBeCloseTo(14.6959, 4);
    expect(convertPressure(101.325, "kPa", "bar")).toBeCloseTo(1.01325, 6);
    expect(convertPressure(101.325, "kPa", "MPa")).toBeCloseTo(0.101325, 8);
    expect(convertPressure(101.325, "kPa", "torr")).toBeCloseTo(760, 6);
    expect(convertPressure(101.325, "kPa", "inHg")).toBeCloseTo(29.9213, 3);
    expect(convertPressure(29.9213, "inHg", "kPa")).toBeCloseTo(101.325, 2);
  });

  it("converts microns of mercury (1 micron = 1 mTorr, 500 microns ≈ 66.7 Pa; common evacuation target)", () => {
    expect(convertPressure(500, "micron", "Pa")).toBeCloseTo(66.66, 1);
    expect(convertPressure(66.66, "Pa", "micron")).toBeCloseTo(500, 0);
  });

  it("converts temperatures and temperature differences", () => {
    expect(convertTemperature(0, "C", "F")).toBeCloseTo(32, 10);
    expect(convertTemperature(-40, "C", "F")).toBeCloseTo(-40, 10);
    expect(convertTemperature(0, "C", "K")).toBeCloseTo(273.15, 10);
    expect(convertTemperatureDifference(5, "K", "F")).toBeCloseTo(9, 10);
    expect(convertTemperatureDifference(9, "F", "C")).toBeCloseTo(5, 10);
  });

  it("adds and removes the atmosphere for gauge readings (default 101.325 kPa)", () => {
    expect(gaugeToAbsolute(1000)).toBeCloseTo(1101.325, 10);
    expect(absoluteToGauge(1101.325)).toBeCloseTo(1000, 10);
    expect(gaugeToAbsolute(1000, 90)).toBe(1090); // site at altitude, about 1000 m
    expect(() => gaugeToAbsolute(Number.NaN)).toThrow(/gaugeToAbsolute requires/);
    expect(() => absoluteToGauge(100, 0)).toThrow(/absoluteToGauge requires/);
  });

  it("shows and reads psig, bar gauge and inHg vacuum", () => {
    // R410A: 118 psig suction ≈ 40 °F dew, a common rule of thumb (practice)
    const suction = pressureFromDisplay(118, "psi", "gauge");
    expect(convertTemperature(saturationTemperature("R410A", suction, "dew"), "C", "F")).toBeCloseTo(40, 0);
    expect(pressureToDisplay(suction, "psi", "gauge")).toBeCloseTo(118, 8);
    expect(pressureToDisplay(201.325, "bar", "gauge")).toBeCloseTo(1, 8);
    // half an atmosphere absolute reads about 15 inHg of vacuum
    expect(pressureToDisplay(50.6625, "inHg", "vacuum")).toBeCloseTo(14.96, 2);
    expect(pressureFromDisplay(14.96, "inHg", "vacuum")).toBeCloseTo(50.66, 1);
  });

  it("rejects non-finite values", () => {
    expect(() => convertPressure(Number.NaN, "kPa", "psi")).toThrow(/convertPressure requires a finite number/);
    expect(() => convertTemperature(Number.POSITIVE_INFINITY, "C", "F")).toThrow(/convertTemperature requires/);
  });
});
