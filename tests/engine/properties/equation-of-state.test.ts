/**
 * The generator's Helmholtz EOS against the check values published with the
 * reference pack (../shared/reference/README.md §3.4 and §9.3): stored hs_anchor
 * states, superancillary check points (extended-precision saturation states), and
 * numerical differentiation of the residual Helmholtz energy (all term types).
 */
import { describe, expect, it } from "vitest";
import { referencePackMissingReason, referencePackPresent } from "./reference-pack.ts";
import {
  createFluidModel,
  createResidualDerivatives,
  listReferenceDesignations,
  readReferenceFluid,
  saturationStateAt,
} from "../../../scripts/eos/index.ts";

describe.skipIf(!referencePackPresent)(
  `equation of state (${referencePackPresent ? "reference pack found" : referencePackMissingReason})`,
  () => {
    const designations = referencePackPresent ? listReferenceDesignations() : [];

    it("finds all 20 reference fluids", () => {
      expect(designations).toHaveLength(20);
    });

    it.each(designations)("%s reproduces its stored hs_anchor state (README §3.4: ≈1e-11)", (id) => {
      const file = readReferenceFluid(id);
      const anchor = file.EOS[0].STATES.hs_anchor;
      const state = createFluidModel(file).eos.state(anchor.T, anchor.rhomolar);
      expect(Math.abs(state.p / anchor.p - 1)).toBeLessThan(1e-10);
      expect(Math.abs(state.h - anchor.hmolar)).toBeLessThan(1e-9 * Math.abs(anchor.hmolar) + 1e-6);
      expect(Math.abs(state.s - anchor.smolar)).toBeLessThan(1e-9 * Math.abs(anchor.smolar) + 1e-6);
    });

    it.each(designations.filter((id) => !readReferenceFluid(id).EOS[0].pseudo_pure))(
      "%s matches the superancillary check points (README §3.4: p'' 1e-11, p' 1e-8, Δg 1e-12·RT)",
      (id) => {
        const file = readReferenceFluid(id);
        const model = createFluidModel(file);
        for (const point of file.EOS[0].SUPERANCILLARY!.check_points) {
          const T = point["T / K"];
          const p = point["p(mp) / Pa"];
          const liquid = model.eos.state(T, point["rho'(mp) / mol/m^3"]);
          const vapour = model.eos.state(T, point["rho''(mp) / mol/m^3"]);
          expect(Math.abs(vapour.p / p - 1)).toBeLessThan(1e-10);
          expect(Math.abs(liquid.p / p - 1)).toBeLessThan(2e-8);
          expect(Math.abs(liquid.g - vapour.g) / (model.eos.gasConstant * T)).toBeLessThan(1e-11);
          // Our own phase-equilibrium solution reproduces the extended-precision densities
          const solved = saturationStateAt(model, T, { guess: "ancillary" });
          expect(Math.abs(solved.liquidDensity / point["rho'(mp) / mol/m^3"] - 1)).toBeLessThan(1e-9);
          expect(Math.abs(solved.vapourDensity / point["rho''(mp) / mol/m^3"] - 1)).toBeLessThan(1e-9);
        }
      },
    );

    it.each(designations)("%s residual Helmholtz derivatives agree with central differences", (id) => {
      const model = createFluidModel(readReferenceFluid(id));
      const residual = model.eos.residual;
      const at = (tau: number, delta: number) => residual.evaluate(tau, delta, createResidualDerivatives());
      // states on both sides of the critical density, plus one near δ = 1, τ = 1 (NonAnalytic region)
      for (const [tau, delta] of [
        [1.3, 2.4],
        [1.1, 0.2],
        [1.02, 1.05],
        [0.9, 0.7],
      ] as const) {
        const h = 1e-5;
        const centre = at(tau, delta);
        const dPlus = at(tau, delta + h),
          dMinus = at(tau, delta - h);
        const tPlus = at(tau + h, delta),
          tMinus = at(tau - h, delta);
        const close = (value: number, estimate: number, scale: number) =>
          expect(Math.abs(value - estimate)).toBeLessThan(1e-6 * Math.max(1, Math.abs(scale)));
        close(centre.dDelta, (dPlus.alphar - dMinus.alphar) / (2 * h), centre.dDelta);
        close(centre.dTau, (tPlus.alphar - tMinus.alphar) / (2 * h), centre.dTau);
        close(centre.dDelta2, (dPlus.dDelta - dMinus.dDelta) / (2 * h), centre.dDelta2);
        close(centre.dTau2, (tPlus.dTau - tMinus.dTau) / (2 * h), centre.dTau2);
        close(centre.dDeltaTau, (tPlus.dDelta - tMinus.dDelta) / (2 * h), centre.dDeltaTau);
      }
    });
  },
);
