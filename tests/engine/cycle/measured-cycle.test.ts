/**
 * measuredCycle: a textbook cycle end to end, then what it does with a field reading and with
 * missing or doubtful readings.
 *
 * Worked example: Çengel & Boles, "Thermodynamics: An Engineering Approach", Example 11–1
 * "The ideal vapor-compression refrigeration cycle" (R-134a between 0.14 and 0.8 MPa,
 * 0.05 kg/s; from memory, not re-read): saturated vapour leaves the evaporator, the compression
 * is isentropic, saturated liquid leaves the condenser. The book prints Q̇_L = 7.18 kW,
 * Ẇ_in = 1.81 kW, Q̇_H = 8.99 kW and COP_R = 3.97. Its tables use another enthalpy reference
 * (h = 0 for saturated liquid at −40 °C), so only differences are compared — which is all the
 * book's answers are.
 */
import { beforeAll, describe, expect, it } from "vitest";
import type { DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import {
  cycleLimits,
  measuredCycle,
  PropertyRangeError,
  saturatedPhasesAtPressure,
  saturationPressure,
  saturationTemperature,
  singlePhaseState,
  singlePhaseStateFromEntropy,
  STANDARD_ATMOSPHERE_KPA,
} from "@shared/engine/index.ts";
import { loadSinglePhaseTable } from "@shared/property-tables/load-single-phase-table.ts";
import { R410A_FIELD_READING } from "../../fixtures/field-reading.ts";

const gauge = (absoluteKPa: number) => absoluteKPa - STANDARD_ATMOSPHERE_KPA;

// Tolerances, as toBeCloseTo's digits (passes when |actual − expected| < 0.5 × 10^−digits).
/** Çengel & Boles print Example 11–1's kW and COP to two decimals: agreement to their last printed digit. */
const BOOK_PRINTED_DIGITS = 2;
/**
 * The ideal compressor's outlet is found from the suction entropy in the same single-phase table
 * the efficiency is read from (singlePhaseStateFromEntropy), so η_s differs from 1 only by that
 * inversion's own error, well inside SINGLE_PHASE_TOLERANCES.
 */
const ISENTROPIC_ROUND_TRIP_DIGITS = 3;
/**
 * The same value reached by another path (a gauge ↔ absolute round trip, a clamp to saturation,
 * the energy balance run backwards): round-off only.
 */
const OTHER_PATH_DIGITS = 9;
/** The same arithmetic on the same doubles as the expected value: floating-point round-off only. */
const SAME_ARITHMETIC_DIGITS = 12;
/**
 * 400 cfm per ton with 1 ton of refrigeration = 3.5169 kW and 1 cfm = 0.00047195 m³/s (NIST SP 811
 * appendix B conversion factors, to five significant digits): good to 10⁻³ m³/s.
 */
const AIRFLOW_CONVERSION_DIGITS = 3;

describe("measuredCycle", () => {
  beforeAll(async () => {
    await Promise.all(["R134a", "R410A", "R407C", "R32"].map((id) => loadSinglePhaseTable(id)));
  });

  it("reproduces Çengel & Boles Example 11–1 within its printed precision", () => {
    const [low, high] = [140, 800];
    const suctionC = saturationTemperature("R134a", low, "dew");
    const liquidC = saturationTemperature("R134a", high, "bubble");
    // the ideal compressor's outlet: discharge pressure at the suction entropy
    const isentropic = singlePhaseStateFromEntropy(
      "R134a",
      high,
      saturatedPhasesAtPressure("R134a", low).vapour.entropyKJPerKgK,
    );
    const input: DiagnosisInput = Object.freeze({
      refrigerant: "R134a",
      meteringDevice: "txv",
      suctionPressureKPa: gauge(low),
      suctionLineTempC: suctionC,
      liquidPressureKPa: gauge(high),
      liquidLineTempC: liquidC,
      dischargePressureKPa: gauge(high),
      dischargeLineTempC: isentropic.temperatureC,
    });
    const cycle = measuredCycle(input);
    const massFlow = 0.05;
    expect(massFlow * cycle.refrigeratingEffectKJPerKg!).toBeCloseTo(7.18, BOOK_PRINTED_DIGITS); // Q̇_L, kW
    expect(massFlow * cycle.compressionWorkKJPerKg!).toBeCloseTo(1.81, BOOK_PRINTED_DIGITS); // Ẇ_in, kW
    expect(massFlow * (cycle.states.discharge!.enthalpyKJPerKg - cycle.states.liquid!.enthalpyKJPerKg)).toBeCloseTo(
      8.99,
      BOOK_PRINTED_DIGITS,
    ); // Q̇_H
    expect(cycle.cop).toBeCloseTo(3.97, BOOK_PRINTED_DIGITS);
    expect(cycle.isentropicEfficiency).toBeCloseTo(1, ISENTROPIC_ROUND_TRIP_DIGITS);
    // the evaporator inlet is the throttled liquid: same enthalpy, at the suction pressure
    expect(cycle.states.evaporatorInlet!.enthalpyKJPerKg).toBe(cycle.states.liquid!.enthalpyKJPerKg);
    expect(cycle.states.evaporatorInlet!.pressureKPa).toBeCloseTo(low, OTHER_PATH_DIGITS);
    // with the book's power input, the energy balance gives back the book's mass flow and capacity
    const metered = measuredCycle(input, { measuredPowerKW: massFlow * cycle.compressionWorkKJPerKg! });
    expect(metered.massFlowKgPerS).toBeCloseTo(massFlow, OTHER_PATH_DIGITS);
    expect(metered.capacityKW).toBeCloseTo(7.18, BOOK_PRINTED_DIGITS);
  });

  const field = R410A_FIELD_READING;

  it("fixes each state from its own pressure and line temperature (IIR enthalpies from the single-phase table)", () => {
    const cycle = measuredCycle(field);
    const suctionKPa = 820 + STANDARD_ATMOSPHERE_KPA;
    expect(cycle.states.suction!.enthalpyKJPerKg).toBe(
      singlePhaseState("R410A", suctionKPa, SAME_ARITHMETIC_DIGITS).enthalpyKJPerKg,
    );
    expect(cycle.states.liquid!.enthalpyKJPerKg).toBe(
      singlePhaseState("R410A", 2600 + STANDARD_ATMOSPHERE_KPA, 38).enthalpyKJPerKg,
    );
    expect(cycle.refrigeratingEffectKJPerKg).toBeCloseTo(
      cycle.states.suction!.enthalpyKJPerKg - cycle.states.liquid!.enthalpyKJPerKg,
      SAME_ARITHMETIC_DIGITS,
    );
    // no discharge gauge: liquid pressure plus the pressure of 1 K of dew temperature
    const condensingDewC = saturationTemperature("R410A", 2600 + STANDARD_ATMOSPHERE_KPA, "dew");
    const expectedKPa = saturationPressure("R410A", condensingDewC + cycleLimits.DISCHARGE_PRESSURE_ALLOWANCE_K, "dew");
    expect(cycle.states.discharge!.pressureKPa).toBeCloseTo(expectedKPa, OTHER_PATH_DIGITS);
    expect(cycle.dischargePressureBasis).toBe("liquid-plus-allowance");
    expect(cycle.dischargeSuperheatK).toBeCloseTo(
      75 - saturationTemperature("R410A", expectedKPa, "dew"),
      OTHER_PATH_DIGITS,
    );
    expect(cycle.notes.some((note) => note.figure === "discharge" && /liquid pressure plus/.test(note.message))).toBe(
      true,
    );
    // a sound scroll compressor on R410A: apparent η_s between 0.5 and 1
    expect(cycle.isentropicEfficiency!).toBeGreaterThan(0.5);
    expect(cycle.isentropicEfficiency!).toBeLessThan(1);
    expect(cycle.cop).toBeCloseTo(
      cycle.refrigeratingEffectKJPerKg! / cycle.compressionWorkKJPerKg!,
      SAME_ARITHMETIC_DIGITS,
    );
    // no electrical input or airflow: null, with what is missing
    expect(cycle.capacityKW).toBeNull();
    expect(cycle.notes.find((note) => note.figure === "electricalPower")!.message).toMatch(
      /the supply voltage, the power factor, the number of phases/,
    );
    expect(cycle.airSide).toBeNull();
  });

  it("gives mass flow and capacity from V·I·cos φ, and compares them with the air side", () => {
    const cycle = measuredCycle(field, {
      voltageV: 230,
      phases: 1,
      powerFactor: 0.9,
      airflowM3PerS: 0.45,
      supplyAirWetBulbC: 13.2,
    });
    expect(cycle.electricalPowerKW).toBeCloseTo((230 * 10 * 0.9) / 1000, SAME_ARITHMETIC_DIGITS);
    expect(cycle.massFlowKgPerS).toBeCloseTo(
      cycle.electricalPowerKW! / cycle.compressionWorkKJPerKg!,
      SAME_ARITHMETIC_DIGITS,
    );
    expect(cycle.capacityKW).toBeCloseTo(
      cycle.massFlowKgPerS! * cycle.refrigeratingEffectKJPerKg!,
      SAME_ARITHMETIC_DIGITS,
    );
    expect(cycle.airSide!.airflowBasis).toBe("measured");
    expect(cycle.airSide!.totalKW).not.toBeNull();
    expect(cycle.airToRefrigerantRatio).toBeCloseTo(
      cycle.airSide!.totalKW! / cycle.capacityKW!,
      SAME_ARITHMETIC_DIGITS,
    );
    expect(cycle.notes.some((note) => note.figure === "airSide" && /(agree within|differ by)/.test(note.message))).toBe(
      true,
    );
  });

  it("estimates the airflow from the nominal capacity (400 cfm per ton) when none was measured", () => {
    const cycle = measuredCycle(field, { nominalCapacityKW: 7 });
    expect(cycle.airSide!.airflowBasis).toBe("nominal-capacity");
    // 2 tons = 800 cfm = 0.3776 m³/s
    expect(cycle.airSide!.airflowM3PerS).toBeCloseTo((7 / 3.5169) * 400 * 0.00047195, AIRFLOW_CONVERSION_DIGITS);
    expect(cycle.airSide!.totalKW).toBeNull();
  });

  it("gives no suction state when the suction line is colder than the dew point, and says why", () => {
    const dewC = saturationTemperature("R410A", 820 + STANDARD_ATMOSPHERE_KPA, "dew");
    const cycle = measuredCycle({ ...field, suctionLineTempC: dewC - 2 });
    expect(cycle.states.suction).toBeNull();
    expect(cycle.refrigeratingEffectKJPerKg).toBeNull();
    expect(cycle.isentropicEfficiency).toBeNull();
    expect(cycle.notes.find((note) => note.figure === "suction")!.message).toMatch(
      /below the dew point .* may carry liquid/,
    );
    // within probe accuracy of the dew point: saturated vapour
    const saturated = measuredCycle({ ...field, suctionLineTempC: dewC - 0.1 });
    expect(saturated.states.suction!.temperatureC).toBeCloseTo(dewC, OTHER_PATH_DIGITS);
  });

  it("gives no liquid state for a temperature taken on the discharge line or above the bubble point", () => {
    expect(measuredCycle({ ...field, liquidTempLocation: "discharge-line" }).states.liquid).toBeNull();
    const bubbleC = saturationTemperature("R410A", 2600 + STANDARD_ATMOSPHERE_KPA, "bubble");
    const warm = measuredCycle({ ...field, liquidLineTempC: bubbleC + 1 });
    expect(warm.states.liquid).toBeNull();
    expect(warm.notes.find((note) => note.figure === "liquid")!.message).toMatch(/flash gas/);
    // no subcooling at all: saturated liquid, the left edge of the dome
    const saturated = measuredCycle({ ...field, liquidLineTempC: bubbleC });
    expect(saturated.states.liquid!.enthalpyKJPerKg).toBeCloseTo(
      saturatedPhasesAtPressure("R410A", 2600 + STANDARD_ATMOSPHERE_KPA).liquid.enthalpyKJPerKg,
      OTHER_PATH_DIGITS,
    );
  });

  it("places a blend's evaporator inlet inside its glide", () => {
    const cycle = measuredCycle({
      ...field,
      refrigerant: "R407C",
      suctionPressureKPa: 380,
      suctionLineTempC: 12,
      liquidPressureKPa: 1700,
      liquidLineTempC: 40,
    });
    const inlet = cycle.states.evaporatorInlet!;
    const bubbleC = saturationTemperature("R407C", 380 + STANDARD_ATMOSPHERE_KPA, "bubble");
    const dewC = saturationTemperature("R407C", 380 + STANDARD_ATMOSPHERE_KPA, "dew");
    expect(inlet.temperatureC).toBeGreaterThan(bubbleC);
    expect(inlet.temperatureC).toBeLessThan(dewC);
    expect(inlet.quality!).toBeGreaterThan(0.1);
    expect(inlet.quality!).toBeLessThan(0.5);
  });

  it("reports a discharge line at or below its dew point as near-zero superheat, without a state", () => {
    const cycle = measuredCycle({ ...field, dischargePressureKPa: 2700, dischargeLineTempC: 40 });
    const dewC = saturationTemperature("R410A", 2700 + STANDARD_ATMOSPHERE_KPA, "dew");
    expect(cycle.dischargeSuperheatK).toBeCloseTo(40 - dewC, OTHER_PATH_DIGITS);
    expect(cycle.states.discharge).toBeNull();
    expect(
      cycle.notes.some((note) => note.figure === "dischargeSuperheat" && /below the dew point/.test(note.message)),
    ).toBe(true);
  });

  it("throws a clear error when the refrigerant's table has not been loaded", () => {
    try {
      measuredCycle({ ...field, refrigerant: "R600a" });
      expect.unreachable("measuredCycle should refuse an unloaded table");
    } catch (error) {
      expect(error).toBeInstanceOf(PropertyRangeError);
      expect((error as PropertyRangeError).code).toBe("TABLE_NOT_LOADED");
    }
  });
});
