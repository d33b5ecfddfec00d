/**
 * A small slice of the charge-inventory model behind `npm run validate:charge`
 * (scripts/charge-inventory): the model holds its design point at the correct charge, stores
 * more refrigerant as its subcooled zone grows, and moves subcooling and superheat the way the
 * symptom table says (TRADE.md §2: short of charge, subcooling falls; a fixed orifice's superheat
 * rises). The estimate against the circuit's own reference point must contain the model's true
 * deviation. Noise-free readings, a few circuits: the full run prints the figures.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { diagnose, seededRandom } from "@shared/engine/index";
import { loadSinglePhaseTable } from "@shared/property-tables/load-single-phase-table";
import type { ChargeReference } from "@shared/schemas/diagnosis";
import { DESIGN_CONDITIONS, type ChargeCircuit } from "../../../scripts/charge-inventory/charge-circuit.ts";
import { designFlowOf } from "../../../scripts/charge-inventory/design-flow-of.ts";
import { drawChargeCircuit } from "../../../scripts/charge-inventory/draw-charge-circuit.ts";
import { inventoryReadings } from "../../../scripts/charge-inventory/inventory-readings.ts";
import { meanTwoPhaseDensity } from "../../../scripts/charge-inventory/mean-two-phase-density.ts";
import { operatingPointAt } from "../../../scripts/charge-inventory/operating-point-at.ts";
import { solveOperatingPoint } from "../../../scripts/charge-inventory/solve-operating-point.ts";
import { homogeneousVoidFraction } from "../../../scripts/charge-inventory/homogeneous-void-fraction.ts";
import { ziviVoidFraction } from "../../../scripts/charge-inventory/zivi-void-fraction.ts";

/** The estimate is rounded to 0.05 kg: a truth within half a step of the range's end is inside it. */
const ROUNDING_KG = 0.025;

describe("charge inventory model", () => {
  beforeAll(async () => {
    await Promise.all(["R410A", "R32", "R407C"].map((id) => loadSinglePhaseTable(id)));
  });

  it("takes the Zivi void fraction α = 1/(1 + ((1 − x)/x)(ρv/ρl)^(2/3)) (Zivi 1964, from memory): x 0.5, ρ 100/1000 → 0.823", () => {
    expect(ziviVoidFraction(0.5, 100, 1000)).toBeCloseTo(1 / (1 + Math.pow(0.1, 2 / 3)), 12);
    expect(ziviVoidFraction(0, 100, 1000)).toBe(0);
    expect(ziviVoidFraction(1, 100, 1000)).toBe(1);
  });

  it("takes the homogeneous void fraction α = 1/(1 + ((1 − x)/x)(ρv/ρl)) (no slip, textbook): x 0.5, ρ 100/1000 → 1/1.1, above Zivi's", () => {
    expect(homogeneousVoidFraction(0.5, 100, 1000)).toBeCloseTo(1 / 1.1, 12);
    expect(homogeneousVoidFraction(0.5, 100, 1000)).toBeGreaterThan(ziviVoidFraction(0.5, 100, 1000));
    // No slip over x 0–1: ∫ dx / (x/100 + (1 − x)/1000) = ln(10)/0.009 = 255.8 kg/m³.
    expect(meanTwoPhaseDensity(0, 1, 100, 1000, homogeneousVoidFraction)).toBeCloseTo(Math.log(10) / 0.009, 0);
  });

  it("averages a two-phase zone between its liquid and vapour densities, holding more liquid than the zone's mean quality suggests (Zivi slip)", () => {
    const mean = meanTwoPhaseDensity(0, 1, 100, 1000);
    // Homogeneous (no slip) over x 0–1: ∫ dx / (x/100 + (1 − x)/1000) = ln(10)/0.009 = 255.8 kg/m³.
    // Zivi's slip lets the vapour run ahead, so the zone holds more liquid: 336.4 kg/m³ (Simpson, 64 panels).
    expect(mean).toBeGreaterThan(Math.log(10) / 0.009);
    expect(mean).toBeCloseTo(336.4, 1);
    // A zone at one quality takes that quality's local density: α 0.823 → 0.823 × 100 + 0.177 × 1000 ≈ 259 kg/m³.
    const alpha = ziviVoidFraction(0.5, 100, 1000);
    expect(meanTwoPhaseDensity(0.5, 0.5, 100, 1000)).toBeCloseTo(alpha * 100 + (1 - alpha) * 1000, 9);
  });

  function circuitFor(refrigerant: string, device: ChargeCircuit["meteringDevice"], seed: number) {
    const circuit = drawChargeCircuit(refrigerant, device, seededRandom(seed));
    const design = designFlowOf(circuit, DESIGN_CONDITIONS);
    const correct = operatingPointAt(circuit, DESIGN_CONDITIONS, circuit.designSubcooledShare, design);
    return { circuit, design, correct };
  }

  it("holds its design subcooling and superheat at the correct charge", () => {
    for (const device of ["txv", "fixed-orifice"] as const) {
      const { circuit, design, correct } = circuitFor("R410A", device, 11);
      const solved = solveOperatingPoint(circuit, DESIGN_CONDITIONS, correct.inventory.totalKg, design)!;
      expect(solved.subcoolingK).toBeCloseTo(circuit.designSubcoolingK, 2);
      expect(solved.superheatK).toBeCloseTo(circuit.designSuperheatK, 2);
    }
  });

  it("loses subcooling when short and gains it when over; a fixed orifice's superheat rises when short (TRADE.md §2)", () => {
    const { circuit, design, correct } = circuitFor("R32", "fixed-orifice", 5);
    const at = (share: number) =>
      solveOperatingPoint(circuit, DESIGN_CONDITIONS, correct.inventory.totalKg * (1 + share), design)!;
    const short = at(-0.1);
    const over = at(0.1);
    expect(short.subcoolingK).toBeLessThan(correct.subcoolingK);
    expect(over.subcoolingK).toBeGreaterThan(correct.subcoolingK);
    expect(short.superheatK).toBeGreaterThan(correct.superheatK);
    expect(over.superheatK).toBeLessThan(correct.superheatK);
  });

  it("stores more refrigerant as the condenser's subcooled zone grows (the solver's search needs it)", () => {
    const { circuit, design } = circuitFor("R407C", "txv", 3);
    let previous = -Infinity;
    for (const coordinate of [-0.3, -0.1, 0, 0.05, 0.1, 0.2, 0.3]) {
      const held = operatingPointAt(circuit, DESIGN_CONDITIONS, coordinate, design).inventory.totalKg;
      expect(held).toBeGreaterThan(previous);
      previous = held;
    }
  });

  it("gets an estimate whose range contains the model's true deviation against the circuit's own reference point (a few cases; the full run in `npm run validate:charge`)", () => {
    const cases: string[] = [];
    for (const [refrigerant, device, seed] of [
      ["R410A", "txv", 1],
      ["R32", "eev", 2],
      ["R407C", "fixed-orifice", 3],
    ] as const) {
      const { circuit, design, correct } = circuitFor(refrigerant, device, seed);
      const correctKg = correct.inventory.totalKg;
      const chargeReference: ChargeReference = {
        subcoolingK: correct.subcoolingK,
        superheatK: correct.superheatK,
        evaporatingTempC: correct.evaporatingDewC,
        condensingTempC: correct.condensingBubbleC,
        outdoorAirDryBulbC: DESIGN_CONDITIONS.outdoorAirC,
        returnAirDryBulbC: DESIGN_CONDITIONS.returnAirC,
      };
      for (const outdoorAirC of [30, 40]) {
        for (const deviation of [-0.2, -0.1, 0.1, 0.2]) {
          const conditions = { ...DESIGN_CONDITIONS, outdoorAirC };
          const trueKg = correctKg * deviation;
          const point = solveOperatingPoint(circuit, conditions, correctKg + trueKg, design)!;
          const estimate = diagnose({
            ...inventoryReadings(circuit, conditions, point, correctKg, null),
            chargeReference,
          }).chargeDeviation!;
          expect(estimate.basis).toBe("unit-reference");
          const inside = trueKg >= estimate.lowKg - ROUNDING_KG && trueKg <= estimate.highKg + ROUNDING_KG;
          if (!inside)
            cases.push(
              `${refrigerant} ${device} ${outdoorAirC} °C ${deviation * 100} %: true ${trueKg.toFixed(2)} kg, estimate ${estimate.kg} (${estimate.lowKg} to ${estimate.highKg})`,
            );
          // Short reads short, over reads over.
          expect(Math.sign(estimate.kg)).toBe(Math.sign(trueKg));
        }
      }
    }
    expect(cases).toEqual([]);
  });
});
