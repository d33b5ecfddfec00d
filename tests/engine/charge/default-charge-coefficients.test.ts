/**
 * Default coefficients of the virtual charge relation from the rated subcooling, charge and
 * liquid line length (the later Purdue evaluations set default parameters from these, Kim &
 * Braun, from memory): k_ch = max(SC_ref, 4 K) / (0.25 · (m − m_line)/m), m_line = 0.05 kg/m
 * × length, at most half the charge. The 0.25 share and 0.05 kg/m are common practice (a 3/8 in
 * line of a high-pressure blend holds about 50 g/m, TRADE.md §6 line-set adjustments: 57 g/m for 3/8 in R410A).
 */
import { describe, expect, it } from "vitest";
import { defaultChargeCoefficients } from "@shared/engine/index";
// The limits module itself, not a namespace on the engine's index (which need not re-export it).
import * as CHARGE_DEVIATION_LIMITS from "@shared/engine/charge/charge-deviation-limits";

describe("defaultChargeCoefficients", () => {
  it("works the doc example: 6 K, 3 kg, 7.5 m → 6 / (0.25 × (3 − 0.375)/3) = 27.43 K", () => {
    // line 7.5 m × 0.05 kg/m = 0.375 kg; share 0.25 × 2.625/3 = 0.21875; 6 / 0.21875 = 27.428…
    expect(defaultChargeCoefficients("expansion-valve", 6, 3, 7.5).kChK).toBeCloseTo(27.4286, 3);
  });

  it("takes a short line set as no line charge: k_ch = SC_ref / 0.25 (common practice: 1 K per 4–5 % of charge at 5–6 K target)", () => {
    expect(defaultChargeCoefficients("expansion-valve", 5, 2.5, undefined).kChK).toBeCloseTo(20, 12);
    expect(defaultChargeCoefficients("expansion-valve", 5, 2.5, 0).kChK).toBeCloseTo(20, 12);
  });

  it("never takes a reference subcooling below 4 K (a 1 K target would make each kelvin a quarter of the charge)", () => {
    expect(CHARGE_DEVIATION_LIMITS.MIN_REFERENCE_SUBCOOLING_K).toBe(4);
    expect(defaultChargeCoefficients("expansion-valve", 1, 2, 0).kChK).toBeCloseTo(16, 12);
  });

  it("caps the line-set charge at half the circuit's charge (a very long line on a small unit)", () => {
    // 60 m × 0.05 = 3 kg > 1 kg → 1 kg; share 0.25 × (2 − 1)/2 = 0.125; 5 / 0.125 = 40 K.
    expect(defaultChargeCoefficients("expansion-valve", 5, 2, 60).kChK).toBeCloseTo(40, 12);
  });

  it("weights the superheat only for a fixed device, by the tuned ratio −0.1 (Li & Braun fit it per unit; sized on the inventory model)", () => {
    expect(defaultChargeCoefficients("fixed", 5, 2, 0).superheatToSubcooling).toBe(-0.1);
    expect(CHARGE_DEVIATION_LIMITS.SUPERHEAT_TO_SUBCOOLING_RATIO).toBe(-0.1);
    expect(defaultChargeCoefficients("expansion-valve", 5, 2, 0).superheatToSubcooling).toBe(0);
  });
});
