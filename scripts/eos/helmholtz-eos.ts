/**
 * Pure-fluid (or pseudo-pure) Helmholtz equation of state: α = α^0 + α^r in
 * τ = T_r/T, δ = ρ/ρ_r with the file's own reducing values, R and M
 * (reference README §3.1 — the reducing point is not always the critical point).
 * Molar SI units throughout: K, Pa, mol/m³, J/mol, J/(mol·K).
 */
import { compileIdealHelmholtz, type IdealHelmholtz } from "./ideal-helmholtz.ts";
import {
  compileResidualHelmholtz,
  createResidualDerivatives,
  type ResidualHelmholtz,
} from "./residual-helmholtz.ts";
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
   * Density at (T, p) on the branch of `rhoGuess` by Newton in ln ρ; rejects steps
   * where ∂p/∂ρ ≤ 0 (README §4.2).
   * @throws Error when it does not converge
   */
  densityFromPressure(T: number, p: number, rhoGuess: number): number;
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
    densityFromPressure(T, p, rhoGuess) {
      const tau = Tr / T;
      let lnRho = Math.log(rhoGuess);
      for (let iteration = 0; iteration < 100; iteration++) {
        const rho = Math.exp(lnRho);
        const delta = rho / rhor;
        const r = residual.evaluateDelta(tau, delta, scratch);
        const RT = R * T;
        const pCalc = rho * RT * (1 + delta * r.dDelta);
        const dpdrho = RT * (1 + 2 * delta * r.dDelta + delta * delta * r.dDelta2);
        if (!(dpdrho > 0)) throw new Error(`${file.designation}: density solve at ${T} K, ${p} Pa entered an unstable region`);
        // Newton in ln ρ on ln p (d ln p / d ln ρ = ρ/p · ∂p/∂ρ); on p itself while the
        // liquid-side guess still gives a negative pressure
        const step =
          pCalc > 0 ? (Math.log(pCalc / p) * pCalc) / (rho * dpdrho) : (pCalc - p) / (rho * dpdrho);
        const limited = Math.max(-0.5, Math.min(0.5, step));
        lnRho -= limited;
        if (Math.abs(limited) < 1e-14) return Math.exp(lnRho);
      }
      throw new Error(`${file.designation}: density solve at ${T} K, ${p} Pa did not converge`);
    },
  };
  return model;
}
