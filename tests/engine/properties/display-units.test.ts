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

// Digits for toBeCloseTo, which passes when |actual − expected| < 0.5 × 10^−digits.
/** Exact by definition (1 bar = 100 kPa, 1 MPa = 1000 kPa, 1 atm = 760 torr): float rounding alone, past the value's decimals. */
const DEFINED_BAR_DIGITS = 6;
const DEFINED_MPA_DIGITS = 8;
const DEFINED_TORR_DIGITS = 6;
/** °F = 1.8 °C + 32, K = °C + 273.15, gauge = absolute − atmosphere: exact arithmetic, float rounding alone. */
const DEFINED_ARITHMETIC_DIGITS = 10;
/** Gauge psi or bar from kPa absolute (a subtraction and a defined factor, or read and shown back): float rounding alone. */
const GAUGE_DISPLAY_DIGITS = 8;
/** NIST SP 811 prints 1 atm as 14.6959 psi: half a unit of its last digit. */
const SP811_PSI_DIGITS = 4;
/** 1 atm = 29.9213 inHg (SP 811): one digit looser, as inHg goes through torr ≈ mmHg (to 1.4e-7) and in ↔ mm. */
const SP811_INHG_DIGITS = 3;
/** 29.9213 inHg back to kPa: the printed figure's rounding times 3.386 kPa/inHg, with margin. */
const SP811_INHG_TO_KPA_DIGITS = 2;
/** "500 microns ≈ 66.66 Pa", the evacuation figure as technicians quote it, read to its tenths and back to the micron. */
const QUOTED_MICRONS_PA_DIGITS = 1;
const QUOTED_MICRONS_DIGITS = 0;
/** "118 psig ≈ 40 °F dew" for R410A is a rule of thumb (practice): to the degree. */
const RULE_OF_THUMB_F_DIGITS = 0;
/** "Half an atmosphere reads about 15 inHg of vacuum": 14.96 inHg to its hundredths, 50.66 kPa back to its tenths. */
const HALF_ATMOSPHERE_INHG_DIGITS = 2;
const HALF_ATMOSPHERE_KPA_DIGITS = 1;

describe("display units", () => {
  it("converts one standard atmosphere to psi, bar, MPa, torr and inHg (NIST SP 811)", () => {
    expect(convertPressure(101.325, "kPa", "psi")).toBeCloseTo(14.6959, SP811_PSI_DIGITS);
    expect(convertPressure(101.325, "kPa", "bar")).toBeCloseTo(1.01325, DEFINED_BAR_DIGITS);
    expect(convertPressure(101.325, "kPa", "MPa")).toBeCloseTo(0.101325, DEFINED_MPA_DIGITS);
    expect(convertPressure(101.325, "kPa", "torr")).toBeCloseTo(760, DEFINED_TORR_DIGITS);
    expect(convertPressure(101.325, "kPa", "inHg")).toBeCloseTo(29.9213, SP811_INHG_DIGITS);
    expect(convertPressure(29.9213, "inHg", "kPa")).toBeCloseTo(101.325, SP811_INHG_TO_KPA_DIGITS);
  });

  it("converts microns of mercury (1 micron = 1 mTorr, 500 microns ≈ 66.7 Pa; common evacuation target)", () => {
    expect(convertPressure(500, "micron", "Pa")).toBeCloseTo(66.66, QUOTED_MICRONS_PA_DIGITS);
    expect(convertPressure(66.66, "Pa", "micron")).toBeCloseTo(500, QUOTED_MICRONS_DIGITS);
  });

  it("converts temperatures and temperature differences", () => {
    expect(convertTemperature(0, "C", "F")).toBeCloseTo(32, DEFINED_ARITHMETIC_DIGITS);
    expect(convertTemperature(-40, "C", "F")).toBeCloseTo(-40, DEFINED_ARITHMETIC_DIGITS);
    expect(convertTemperature(0, "C", "K")).toBeCloseTo(273.15, DEFINED_ARITHMETIC_DIGITS);
    expect(convertTemperatureDifference(5, "K", "F")).toBeCloseTo(9, DEFINED_ARITHMETIC_DIGITS);
    expect(convertTemperatureDifference(9, "F", "C")).toBeCloseTo(5, DEFINED_ARITHMETIC_DIGITS);
  });

  it("adds and removes the atmosphere for gauge readings (default 101.325 kPa)", () => {
    expect(gaugeToAbsolute(1000)).toBeCloseTo(1101.325, DEFINED_ARITHMETIC_DIGITS);
    expect(absoluteToGauge(1101.325)).toBeCloseTo(1000, DEFINED_ARITHMETIC_DIGITS);
    expect(gaugeToAbsolute(1000, 90)).toBe(1090); // site at altitude, about 1000 m
    expect(() => gaugeToAbsolute(Number.NaN)).toThrow(/gaugeToAbsolute requires/);
    expect(() => absoluteToGauge(100, 0)).toThrow(/absoluteToGauge requires/);
  });

  it("shows and reads psig, bar gauge and inHg vacuum", () => {
    // R410A: 118 psig suction ≈ 40 °F dew, a common rule of thumb (practice)
    const suction = pressureFromDisplay(118, "psi", "gauge");
    expect(convertTemperature(saturationTemperature("R410A", suction, "dew"), "C", "F")).toBeCloseTo(
      40,
      RULE_OF_THUMB_F_DIGITS,
    );
    expect(pressureToDisplay(suction, "psi", "gauge")).toBeCloseTo(118, GAUGE_DISPLAY_DIGITS);
    expect(pressureToDisplay(201.325, "bar", "gauge")).toBeCloseTo(1, GAUGE_DISPLAY_DIGITS);
    // half an atmosphere absolute reads about 15 inHg of vacuum
    expect(pressureToDisplay(50.6625, "inHg", "vacuum")).toBeCloseTo(14.96, HALF_ATMOSPHERE_INHG_DIGITS);
    expect(pressureFromDisplay(14.96, "inHg", "vacuum")).toBeCloseTo(50.66, HALF_ATMOSPHERE_KPA_DIGITS);
  });

  it("rejects non-finite values", () => {
    expect(() => convertPressure(Number.NaN, "kPa", "psi")).toThrow(/convertPressure requires a finite number/);
    expect(() => convertTemperature(Number.POSITIVE_INFINITY, "C", "F")).toThrow(/convertTemperature requires/);
  });
});
