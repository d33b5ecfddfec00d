import { describe, expect, it } from "vitest";
import { checkTestPressure, pressureTestResult } from "@shared/engine/index";

/** Gauge reading resolution quoted in the maker's worked example: 0.01 MPa = 10 kPa [S65]. */
const WORKED_EXAMPLE_ROUNDING_KPA = 5;

describe("pressureTestResult", () => {
  it("reproduces the maker's worked example: 3.80 MPa g at 27 °C read at 20 °C → expected 3.71 MPa g; 3.73 MPa g is no leak [S65]", () => {
    const input = Object.freeze({
      startGaugeKPa: 3800,
      startTempC: 27,
      endGaugeKPa: 3730,
      endTempC: 20,
      allowedDropKPa: 0,
    });
    const result = pressureTestResult(input);
    // By hand: (3800 + 101.325) × 293.15 / 300.15 − 101.325 = 3709.01 kPa g.
    expect(result.expectedEndGaugeKPa).toBeCloseTo(3709.01, 2);
    expect(Math.abs(result.expectedEndGaugeKPa - 3710)).toBeLessThanOrEqual(WORKED_EXAMPLE_ROUNDING_KPA);
    expect(result.correctedDropKPa).toBeCloseTo(-20.99, 2);
    expect(result.pass).toBe(true);
    expect(result.verdict).toBe("pass");
    expect(result.gaugeDropKPa).toBe(70);
  });

  it("gives the 13 kPa/K sensitivity at 3.8 MPa g and 27 °C, near the maker's 0.01 MPa per °C rule of thumb (computed check [S65])", () => {
    const result = pressureTestResult({
      startGaugeKPa: 3800,
      startTempC: 27,
      endGaugeKPa: 3800,
      endTempC: 27,
      allowedDropKPa: 0,
    });
    expect(result.sensitivityKPaPerK).toBeCloseTo(13.0, 1);
  });

  it("gives 14.3 kPa/K at 4.15 MPa g and 25 °C and 3.8 kPa/K at 1034 kPa g (computed checks in the trade notes §5.3)", () => {
    expect(
      pressureTestResult({ startGaugeKPa: 4150, startTempC: 25, endGaugeKPa: 4150, endTempC: 25, allowedDropKPa: 0 })
        .sensitivityKPaPerK,
    ).toBeCloseTo(14.26, 2);
    expect(
      pressureTestResult({ startGaugeKPa: 1034, startTempC: 25, endGaugeKPa: 1034, endTempC: 25, allowedDropKPa: 0 })
        .sensitivityKPaPerK,
    ).toBeCloseTo(3.81, 2);
  });

  it("fails a drop beyond the allowance once temperature is accounted for", () => {
    // Same temperature, 30 kPa lost, 10 kPa allowed.
    const result = pressureTestResult({
      startGaugeKPa: 1034,
      startTempC: 20,
      endGaugeKPa: 1004,
      endTempC: 20,
      allowedDropKPa: 10,
    });
    expect(result.correctedDropKPa).toBeCloseTo(30, 10);
    expect(result.pass).toBe(false);
    expect(result.reason).toMatch(/find the leak/);
  });

  it("hides a leak no longer when the site warms up: 1034 kPa g at 15 °C read 1034 kPa g at 25 °C has lost 39.4 kPa (computed)", () => {
    // Expected: 1135.325 × 298.15 / 288.15 − 101.325 = 1073.400 kPa g, so 39.400 kPa lost.
    const result = pressureTestResult({
      startGaugeKPa: 1034,
      startTempC: 15,
      endGaugeKPa: 1034,
      endTempC: 25,
      allowedDropKPa: 0,
    });
    expect(result.expectedEndGaugeKPa).toBeCloseTo(1073.4, 2);
    expect(result.correctedDropKPa).toBeCloseTo(39.4, 2);
    expect(result.pass).toBe(false);
  });

  it("uses the site atmospheric pressure for the absolute scale", () => {
    const sea = pressureTestResult({
      startGaugeKPa: 1000,
      startTempC: 30,
      endGaugeKPa: 1000,
      endTempC: 0,
      allowedDropKPa: 0,
    });
    const altitude = pressureTestResult({
      startGaugeKPa: 1000,
      startTempC: 30,
      endGaugeKPa: 1000,
      endTempC: 0,
      allowedDropKPa: 0,
      atmosphericPressureKPa: 80,
    });
    // (1000 + 80) × 273.15 / 303.15 − 80 = 893.122; at sea level 1101.325 × 273.15 / 303.15 − 101.325 = 891.012.
    expect(altitude.expectedEndGaugeKPa).toBeCloseTo(893.122, 3);
    expect(sea.expectedEndGaugeKPa).toBeCloseTo(891.012, 3);
  });

  it("refuses a start pressure of zero and non-finite inputs", () => {
    expect(() =>
      pressureTestResult({ startGaugeKPa: 0, startTempC: 20, endGaugeKPa: 0, endTempC: 20, allowedDropKPa: 0 }),
    ).toThrow(/pressureTestResult requires/);
    expect(() =>
      pressureTestResult({
        startGaugeKPa: 100,
        startTempC: Number.NaN,
        endGaugeKPa: 0,
        endTempC: 20,
        allowedDropKPa: 0,
      }),
    ).toThrow(/pressureTestResult requires/);
  });
});

describe("checkTestPressure", () => {
  it("passes up to the rated pressure of the lowest-rated component and fails above it [S57][S63][S64]", () => {
    expect(checkTestPressure({ testGaugeKPa: 3800, ratedKPa: 4150 }).verdict).toBe("pass");
    expect(checkTestPressure({ testGaugeKPa: 4150, ratedKPa: 4150 }).verdict).toBe("pass");
    const over = checkTestPressure({ testGaugeKPa: 4200, ratedKPa: 4150 });
    expect(over.verdict).toBe("fail");
    expect(over.reason).toMatch(/isolate/);
  });

  it("takes an organisation's lower fraction of the rating", () => {
    const verdict = checkTestPressure({ testGaugeKPa: 4000, ratedKPa: 4150 }, { maxFractionOfRated: 0.9 });
    expect(verdict.verdict).toBe("fail");
    expect(verdict.source).toMatch(/organisation/);
  });
});

describe("pressureTestResult reason", () => {
  it("says 'no loss' when the end reading is above the corrected expectation ([S65] worked example)", () => {
    const { reason } = pressureTestResult({
      startGaugeKPa: 3800,
      startTempC: 27,
      endGaugeKPa: 3730,
      endTempC: 20,
      allowedDropKPa: 0,
    });
    expect(reason).toBe(
      "Held: end reading 3730.0 kPa against expected 3709.0 kPa at 20.0 °C; no loss once corrected for temperature (21.0 kPa above expected)",
    );
  });
});
