/**
 * The electrical and air-side helpers of the measured cycle against their textbook formulas.
 *
 * - Active power: P = V·I·cos φ (single phase), P = √3·V_LL·I·cos φ (balanced three phase);
 *   any electrical-engineering text (e.g. Hughes, Electrical and Electronic Technology).
 * - Moist air: ASHRAE Handbook—Fundamentals (2017) ch. 1: h = 1.006 t + W (2501 + 1.86 t)
 *   kJ/kg dry air (eq. 32); saturation humidity ratio W_s = 0.621945 p_ws/(p − p_ws) (eq. 23)
 *   with p_ws(20 °C) = 2.3392 kPa (Table 3, from memory). (Table 2's 0.014758 kg/kg at 20 °C
 *   includes the enhancement factor, ≈ 0.4 % more, which psychrolib leaves out.)
 */
import { describe, expect, it } from "vitest";
import { airSideCapacity, electricalInputPower, moistAirState } from "@shared/engine/index.ts";

describe("electrical input and air-side capacity", () => {
  it("computes single- and three-phase active power", () => {
    expect(electricalInputPower({ currentA: 10, voltageV: 230, powerFactor: 0.9, phases: 1 })).toBeCloseTo(2.07, 12);
    expect(electricalInputPower({ currentA: 10, voltageV: 400, powerFactor: 0.85, phases: 3 })).toBeCloseTo(5.889, 3);
    expect(() => electricalInputPower({ currentA: 10, voltageV: 400, powerFactor: 1.2, phases: 3 })).toThrow(
      /power factor/,
    );
  });

  it("gives moist-air enthalpy by the ASHRAE formula and the saturation humidity ratio of eq. 23", () => {
    const air = moistAirState(26.7, { wetBulbC: 19.4 }, 101.325);
    expect(air.enthalpyKJPerKgDryAir).toBeCloseTo(1.006 * 26.7 + air.humidityRatio * (2501 + 1.86 * 26.7), 6);
    const saturated = (0.621945 * 2.3392) / (101.325 - 2.3392);
    expect(moistAirState(20, { relativeHumidityPercent: 100 }, 101.325).humidityRatio).toBeCloseTo(saturated, 5);
    // a wet bulb equal to the dry bulb is saturated air
    expect(moistAirState(20, { wetBulbC: 20 }, 101.325).humidityRatio).toBeCloseTo(saturated, 5);
  });

  it("gives total capacity from the enthalpy drop and sensible capacity at the return humidity", () => {
    const input = {
      airflowM3PerS: 0.4,
      returnDryBulbC: 26.7,
      returnWetBulbC: 19.4,
      supplyDryBulbC: 14,
      supplyWetBulbC: 13,
      atmosphericKPa: 101.325,
    };
    const result = airSideCapacity(input);
    const returnAir = moistAirState(26.7, { wetBulbC: 19.4 }, 101.325);
    const supplyAir = moistAirState(14, { wetBulbC: 13 }, 101.325);
    const massFlow = 0.4 / returnAir.specificVolumeM3PerKgDryAir;
    expect(result.dryAirMassFlowKgPerS).toBeCloseTo(massFlow, 12);
    expect(result.totalKW).toBeCloseTo(
      massFlow * (returnAir.enthalpyKJPerKgDryAir - supplyAir.enthalpyKJPerKgDryAir),
      9,
    );
    expect(result.sensibleKW).toBeCloseTo(massFlow * (1.006 + 1.86 * returnAir.humidityRatio) * (26.7 - 14), 6);
    expect(result.totalKW!).toBeGreaterThan(result.sensibleKW);
    expect(airSideCapacity({ ...input, supplyWetBulbC: undefined }).totalKW).toBeNull();
  });
});
