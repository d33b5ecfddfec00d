/**
 * Proof of the single-phase tables' interpolation error against the equations of state they
 * were generated from (../shared/reference): for every refrigerant, random states anywhere in
 * each phase's table — any pressure between its first and last row, any temperature between
 * saturation and the far bound — looked up with the engine and solved directly (density at
 * (T, p) on the right branch, then h and s; scripts/single-phase). The temperature is also
 * found back from (p, h) and (p, s). All must stay within SINGLE_PHASE_TOLERANCES.
 * The points are drawn by fast-check with a fixed seed, uniformly (no bias towards the ends),
 * so they fall between grid nodes.
 */
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  KELVIN_OFFSET,
  listRefrigerants,
  SINGLE_PHASE_TOLERANCES,
  singlePhaseState,
  singlePhaseStateFromEnthalpy,
  singlePhaseStateFromEntropy,
} from "@shared/engine/index.ts";
import { resolveSinglePhaseTable } from "@shared/engine/properties/resolve-single-phase-table.ts";
import { loadSinglePhaseTable } from "@shared/property-tables/load-single-phase-table.ts";
import { createSinglePhaseSolver } from "../../../scripts/single-phase/index.ts";
import { referencePackMissingReason, referencePackPresent } from "./reference-pack.ts";

const ids = listRefrigerants().map((refrigerant) => refrigerant.id);
/** Points per phase: fewer for the multi-fluid blends, whose direct solve takes milliseconds. */
const runsFor = (id: string) => (listRefrigerants().find((r) => r.id === id)?.source.model === "multi-fluid" ? 12 : 40);
/** Uniform in [0, 1] without fast-check's bias towards the ends, so points fall between grid nodes. */
const uniform = fc.noBias(fc.integer({ min: 0, max: 1_000_000 })).map((n) => n / 1_000_000);
/** States this close to saturation may rightly be placed in the dome by the saturation table (0.005 K). */
const EDGE_K = 0.05;

describe.skipIf(!referencePackPresent)(
  `single-phase tables against the equations of state (${referencePackPresent ? "direct solve" : referencePackMissingReason})`,
  () => {
    const worst = new Map<string, string>();
    beforeAll(async () => {
      await Promise.all(ids.map((id) => loadSinglePhaseTable(id)));
    });
    afterAll(() => {
      if (process.env.SHOW_SINGLE_PHASE_ERROR) console.info([...worst].map(([id, text]) => `${id} ${text}`).join("\n"));
    });

    it.each(ids)("%s: h, s, ρ and T from (p, h) and (p, s) match the EOS at random off-grid states", (id) => {
      const solver = createSinglePhaseSolver(id);
      const table = resolveSinglePhaseTable(id);
      let [h, s, rho, t] = [0, 0, 0, 0];
      for (const grid of [table.vapour, table.liquid]) {
        const coordinateEnd = grid.coordinateStart + (grid.rows - 1) * grid.coordinateStep;
        const kind = grid.phase === "vapour" ? "dew" : "bubble";
        fc.assert(
          fc.property(uniform, uniform, (along, across) => {
            const y = grid.coordinateStart + along * (coordinateEnd - grid.coordinateStart);
            const pressureKPa = Math.exp(y) / (1 + Math.exp(y) / grid.pressureScaleKPa);
            const saturationK = solver.saturationTemperature(pressureKPa * 1000, kind);
            const boundK = grid.boundC + KELVIN_OFFSET;
            const temperatureK = saturationK + across * (boundK - saturationK);
            if (Math.abs(temperatureK - saturationK) < EDGE_K) return;
            const temperatureC = temperatureK - KELVIN_OFFSET;
            const exact = solver.state(temperatureK, pressureKPa * 1000, grid.phase);
            const looked = singlePhaseState(id, pressureKPa, temperatureC);
            expect(looked.phase).toBe(grid.phase);
            const errors = {
              h: Math.abs(looked.enthalpyKJPerKg - exact.enthalpy / 1000),
              s: Math.abs(looked.entropyKJPerKgK - exact.entropy / 1000),
              rho: Math.abs(looked.densityKgPerM3 / exact.density - 1),
              fromH: Math.abs(
                singlePhaseStateFromEnthalpy(id, pressureKPa, exact.enthalpy / 1000).temperatureC - temperatureC,
              ),
              fromS: Math.abs(
                singlePhaseStateFromEntropy(id, pressureKPa, exact.entropy / 1000).temperatureC - temperatureC,
              ),
            };
            [h, s, rho, t] = [
              Math.max(h, errors.h),
              Math.max(s, errors.s),
              Math.max(rho, errors.rho),
              Math.max(t, errors.fromH, errors.fromS),
            ];
            expect(errors.h).toBeLessThanOrEqual(SINGLE_PHASE_TOLERANCES.enthalpyKJPerKg);
            expect(errors.s).toBeLessThanOrEqual(SINGLE_PHASE_TOLERANCES.entropyKJPerKgK);
            expect(errors.rho).toBeLessThanOrEqual(SINGLE_PHASE_TOLERANCES.densityRelative);
            expect(errors.fromH).toBeLessThanOrEqual(SINGLE_PHASE_TOLERANCES.temperatureK);
            expect(errors.fromS).toBeLessThanOrEqual(SINGLE_PHASE_TOLERANCES.temperatureK);
          }),
          { numRuns: runsFor(id), seed: 18, endOnFailure: true },
        );
      }
      worst.set(
        id,
        `h ${h.toExponential(1)} kJ/kg, s ${s.toExponential(1)}, ρ ${(rho * 100).toFixed(4)} %, T ${t.toExponential(1)} K`,
      );
    });

    it("the enthalpy of saturated liquid at 0 °C is 200 kJ/kg and its entropy 1 kJ/(kg·K) (IIR reference, as the saturation tables)", async () => {
      for (const id of ids) {
        const solver = createSinglePhaseSolver(id);
        const pressurePa = solver.saturationPressure(KELVIN_OFFSET, "bubble");
        // 0.2 K of subcooling: inside the liquid grid; h and s follow the EOS from there
        const exact = solver.state(KELVIN_OFFSET - 0.2, pressurePa, "liquid");
        const looked = singlePhaseState(id, pressurePa / 1000, -0.2);
        expect(Math.abs(looked.enthalpyKJPerKg - exact.enthalpy / 1000)).toBeLessThanOrEqual(
          SINGLE_PHASE_TOLERANCES.enthalpyKJPerKg,
        );
        // the EOS itself: 200 kJ/kg and 1 kJ/(kg·K) at the bubble point, minus c_p × 0.2 K
        expect(exact.enthalpy / 1000).toBeGreaterThan(199);
        expect(exact.enthalpy / 1000).toBeLessThan(200);
      }
    });
  },
);
