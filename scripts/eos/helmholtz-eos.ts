/**
 * Pure-fluid (or pseudo-pure) Helmholtz equation of state: α = α^0 + α^r in
 * τ = T_r/T, δ = ρ/ρ_r with the file's own reducing values, R and M
 * (reference README §3.1 — the reducing point is not always the critical point).
 * Molar SI units throughout: K, Pa, mol/m³, J/mol, J/(mol·K).
 */
import { compileIdealHelmholtz, type IdealHelmholtz } from "./ideal-helmholtz.ts";
import { compileResidualHelmholtz, createResidualDerivatives, type ResidualHelmholtz } from "./residual-helmholtz.ts";
import type { ReferenceFluidFile } from "./reference-types.ts";

export interface EosState {
  T: number;
  rho: number;
  p: number;
  h: number;
  s: number;
  g: number;
  /** (∂p/∂ρ)_T in Pa·m³/mol */
  dpdrho: number;
}

export interface HelmholtzEos {
  readonly designation: string;
  readonly gasConstant: number;
  readonly molarMass: number;
  readonly reducingTemperature: number;
  readonly reducingDensity: number;
  readonly residual: ResidualHelmholtz;
  readonly ideal: IdealHelmholtz;
  /** Molar enthalpy / entropy shifts added to every h and s (used for the IIR reference). */
  enthalpyOffset: number;
  entropyOffset: number;
  pressure(T: number, rho: number): number;
  state(T: number, rho: number): EosState;
  /**
   * Density at (T, p) on the liquid or vapour branch (default: the branch of `rhoGuess`
   * relative to ρ_r); only roots with ∂p/∂ρ > 0 are returned (README §4.2).
   * @throws Error when the branch has no root at this pressure or the solve does not converge
   */
  densityFromPressure(T: number, p: number, rhoGuess: number, branch?: "liquid" | "vapour"): number;
}

export function createHelmholtzEos(file: ReferenceFluidFile): HelmholtzEos {
  const eos = file.EOS[0];
  const R = eos.gas_constant;
  const Tr = eos.STATES.reducing.T;
  const rhor = eos.STATES.reducing.rhomolar;
  const residual = compileResidualHelmholtz(eos.alphar);
  const ideal = compileIdealHelmholtz(eos.alpha0);
  const scratch = createResidualDerivatives();

  const model: HelmholtzEos = {
    designation: file.designation,
    gasConstant: R,
    molarMass: eos.molar_mass,
    reducingTemperature: Tr,
    reducingDensity: rhor,
    residual,
    ideal,
    enthalpyOffset: 0,
    entropyOffset: 0,
    pressure(T, rho) {
      const r = residual.evaluateDelta(Tr / T, rho / rhor, scratch);
      return rho * R * T * (1 + (rho / rhor) * r.dDelta);
    },
    state(T, rho) {
      const tau = Tr / T;
      const delta = rho / rhor;
      const r = residual.evaluate(tau, delta, scratch);
      const i = ideal.evaluate(tau, delta);
      const RT = R * T;
      const p = rho * RT * (1 + delta * r.dDelta);
      const h = RT * (1 + tau * (i.dTau + r.dTau) + delta * r.dDelta) + model.enthalpyOffset;
      const s = R * (tau * (i.dTau + r.dTau) - i.alpha0 - r.alphar) + model.entropyOffset;
      return {
        T,
        rho,
        p,
        h,
        s,
        g: h - T * s,
        dpdrho: RT * (1 + 2 * delta * r.dDelta + delta * delta * r.dDelta2),
      };
    },
    densityFromPressure(T, p, rhoGuess, branch = rhoGuess > rhor ? "liquid" : "vapour") {
      // Bracket the root on the requested branch (p rises with ρ on both stable branches),
      // then Newton safeguarded by bisection. Near the critical point the roots sit close to
      // the spinodals, where a plain Newton step easily jumps into the unstable region.
      const pressureAt = (rho: number) => {
        const delta = rho / rhor;
        const r = residual.evaluateDelta(Tr / T, delta, scratch);
        const RT = R * T;
        return {
          p: rho * RT * (1 + delta * r.dDelta),
          dpdrho: RT * (1 + 2 * delta * r.dDelta + delta * delta * r.dDelta2),
        };
      };
      const fail = (why: string) => new Error(`${file.designation}: no ${branch} density at ${T} K, ${p} Pa (${why})`);
      let below: number; // ρ with p(ρ) < target
      let above: number; // ρ with p(ρ) > target
      if (branch === "liquid") {
        above = rhoGuess;
        for (let k = 0; pressureAt(above).p < p; k++) {
          if (k > 200) throw fail("no pressure above target");
          above *= 1.05;
        }
        below = above;
        for (let k = 0; ; k++) {
          const at = pressureAt(below);
          if (at.p < p) break;
          if (!(at.dpdrho > 0) || k > 400) throw fail("reached the liquid spinodal");
          above = below;
          below /= 1.01;
        }
      } else {
        below = rhoGuess;
        for (let k = 0; pressureAt(below).p > p; k++) {
          if (k > 400) throw fail("no pressure below target");
          below /= 1.05;
        }
        above = below;
        for (let k = 0; ; k++) {
          const at = pressureAt(above);
          if (at.p > p) break;
          if (!(at.dpdrho > 0) || k > 400) throw fail("reached the vapour spinodal");
          below = above;
          above *= 1.01;
        }
      }
      let rho = 0.5 * (below + above);
      for (let iteration = 0; iteration < 200; iteration++) {
        const at = pressureAt(rho);
        if (at.p < p) below = rho;
        else above = rho;
        let next = rho - (at.p - p) / at.dpdrho;
        if (!(at.dpdrho > 0) || !(next > Math.min(below, above) && next < Math.max(below, above))) {
          next = 0.5 * (below + above);
        }
        // Regression (issue 18): when p(ρ) already hits the target, ρ is the root; the step may
        // then have fallen back to bisection, whose midpoint is not (it gave a wrong liquid
        // density whenever the pressure matched exactly, e.g. R32 at 306.096 K and 2308 kPa).
        const root = Math.abs(at.p - p) <= 1e-15 * p ? rho : Math.abs(next - rho) <= 1e-14 * rho ? next : null;
        if (root !== null) {
          if (!(pressureAt(root).dpdrho > 0)) throw fail("root is mechanically unstable");
          return root;
        }
        rho = next;
      }
      throw fail("did not converge");
    },
  };
  return model;
}
