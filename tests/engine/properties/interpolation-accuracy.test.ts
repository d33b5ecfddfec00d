/**
 * Proof that table interpolation stays within INTERPOLATION_TOLERANCE_K (0.005 K,
 * issue 3) of the equation of state everywhere: at 1/4, 1/2 and 3/4 of every grid
 * interval of every table, the EOS saturation pressure (phase equilibrium for pure
 * fluids, published pL/pV for blends; ../shared/reference) is compared with
 * saturationPressure, and the EOS temperature with saturationTemperature.
 */
import { afterAll, describe, expect, it } from "vitest";
import { resolveRefrigerant } from "@shared/engine/properties/resolve-refrigerant.ts";
import { SATURATED_TABLE_TOLERANCES } from "../../setup/tolerances.ts";
import { referencePackMissingReason, referencePackPresent } from "./reference-pack.ts";
import {
  INTERPOLATION_TOLERANCE_K,
  KELVIN_OFFSET,
  listRefrigerants,
  saturatedState,
  saturationPressure,
  saturationTemperature,
} from "@shared/engine/index.ts";
import {
  applyIirReference,
  createFluidModel,
  listReferenceDesignations,
  readReferenceFluid,
  saturationStateAt,
} from "../../../scripts/eos/index.ts";

const FRACTIONS = [0.25, 0.5, 0.75];

describe.skipIf(!referencePackPresent)(
  `interpolation accuracy (${referencePackPresent ? "against the EOS" : referencePackMissingReason})`,
  () => {
    // Tables with their own fluid file; the multi-fluid blends get the same check in
    // tests/engine/mixture/blend-tables.test.ts.
    const withFluidFile = new Set(referencePackPresent ? listReferenceDesignations() : []);
    const ids = listRefrigerants()
      .map((r) => r.id)
      .filter((id) => withFluidFile.has(id));
    const worst = new Map<string, number>();
    afterAll(() => {
      if (process.env.SHOW_INTERPOLATION_ERROR) {
        console.info([...worst].map(([id, kelvin]) => `${id} ${(kelvin * 1000).toFixed(4)} mK`).join("\n"));
      }
    });

    it.each(ids)("%s: bubble and dew lookups stay within 0.005 K of the EOS between all rows", (id) => {
      const model = createFluidModel(readReferenceFluid(id));
      const rows = Object.freeze(readTemperatures(id));
      let worstPressureAsK = 0;
      let worstTemperatureK = 0;
      for (let i = 0; i + 1 < rows.length; i++) {
        for (const fraction of FRACTIONS) {
          const temperatureC = rows[i]! + fraction * (rows[i + 1]! - rows[i]!);
          const state = saturationStateAt(model, temperatureC + KELVIN_OFFSET);
          for (const point of ["bubble", "dew"] as const) {
            const pressureEos = (point === "bubble" ? state.bubblePressure : state.dewPressure) / 1000;
            const slopeEos = (point === "bubble" ? state.bubbleSlope : state.dewSlope) / 1000;
            const pressureTable = saturationPressure(id, temperatureC, point);
            worstPressureAsK = Math.max(worstPressureAsK, Math.abs(pressureTable - pressureEos) / slopeEos);
            worstTemperatureK = Math.max(
              worstTemperatureK,
              Math.abs(saturationTemperature(id, pressureEos, point) - temperatureC),
            );
          }
        }
      }
      worst.set(id, Math.max(worstPressureAsK, worstTemperatureK));
      expect(worstPressureAsK).toBeLessThan(INTERPOLATION_TOLERANCE_K);
      expect(worstTemperatureK).toBeLessThan(INTERPOLATION_TOLERANCE_K);
    });

    it.each(ids)(
      "%s: interpolated densities and enthalpies stay close to the EOS below 5 K from the end of the table",
      (id) => {
        // Linear interpolation in 0.5 K steps: the liquid/vapour curves bend sharply only
        // in the last kelvins before the critical point, where no tolerance is promised.
        const model = createFluidModel(readReferenceFluid(id));
        applyIirReference(model);
        const M = model.eos.molarMass;
        const rows = readTemperatures(id);
        const end = rows[rows.length - 1]! - 5;
        for (let i = 0; i + 1 < rows.length && rows[i + 1]! < end; i += 7) {
          const temperatureC = 0.5 * (rows[i]! + rows[i + 1]!);
          const eos = saturationStateAt(model, temperatureC + KELVIN_OFFSET);
          const table = saturatedState(id, temperatureC);
          expect(Math.abs(table.liquidDensityKgPerM3 / (eos.liquidDensity * M) - 1)).toBeLessThan(
            SATURATED_TABLE_TOLERANCES.liquidDensityRelative,
          );
          expect(Math.abs(table.vapourDensityKgPerM3 / (eos.vapourDensity * M) - 1)).toBeLessThan(
            SATURATED_TABLE_TOLERANCES.vapourDensityRelative,
          );
          expect(Math.abs(table.liquidEnthalpyKJPerKg - eos.liquidEnthalpy / M / 1000)).toBeLessThan(
            SATURATED_TABLE_TOLERANCES.enthalpyKJPerKg,
          );
          expect(Math.abs(table.vapourEnthalpyKJPerKg - eos.vapourEnthalpy / M / 1000)).toBeLessThan(
            SATURATED_TABLE_TOLERANCES.enthalpyKJPerKg,
          );
        }
      },
    );
  },
);

function readTemperatures(id: string): number[] {
  // Grid rows, where interpolation is exact; the test samples between them.
  return Array.from(resolveRefrigerant(id).temperatureC);
}
