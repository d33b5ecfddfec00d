/**
 * Vapour–liquid equilibrium of a pure fluid at fixed temperature: equal pressure
 * and equal molar Gibbs energy of the coexisting phases (reference README §4.1),
 * solved by Newton's method in (ln δ', ln δ''). Only α^r, α^r_δ and α^r_δδ are
 * needed; the T-only parts of α^0 cancel.
 */
import { createResidualDerivatives } from "./residual-helmholtz.ts";
import type { HelmholtzEos } from "./helmholtz-eos.ts";

export interface CoexistingDensities {
  /** saturated liquid density ρ' in mol/m³ */
  liquidDensity: number;
  /** saturated vapour density ρ'' in mol/m³ */
  vapourDensity: number;
  /** saturation pressure in Pa (evaluated on the vapour side, the better-conditioned one) */
  pressure: number;
  iterations: number;
}

const liquidScratch = createResidualDerivatives();
const vapourScratch = createResidualDerivatives();

/**
 * @param eos the fluid's equation of state
 * @param T temperature in K, below the EOS critical temperature
 * @param liquidGuess starting ρ' (mol/m³), e.g. from the superancillary or the rhoL ancillary
 * @param vapourGuess starting ρ'' (mol/m³)
 * @returns coexisting densities and pressure
 * @throws Error when Newton does not converge or the phases collapse onto one density
 * @example solvePhaseEquilibrium(eos, 273.15, 21000, 300)
 */
export function solvePhaseEquilibrium(
  eos: HelmholtzEos,
  T: number,
  liquidGuess: number,
  vapourGuess: number,
): CoexistingDensities {
  const tau = eos.reducingTemperature / T;
  const rhor = eos.reducingDensity;
  let xL = Math.log(liquidGuess / rhor);
  let xV = Math.log(vapourGuess / rhor);
  for (let iteration = 1; iteration <= 60; iteration++) {
    const dL = Math.exp(xL);
    const dV = Math.exp(xV);
    const rL = eos.residual.evaluateDelta(tau, dL, liquidScratch);
    const rV = eos.residual.evaluateDelta(tau, dV, vapourScratch);
    // reduced pressure p/(ρ_r R T) and reduced Gibbs energy (T-only parts dropped)
    const pL = dL * (1 + dL * rL.dDelta);
    const pV = dV * (1 + dV * rV.dDelta);
    const gL = rL.alphar + dL * rL.dDelta + Math.log(dL);
    const gV = rV.alphar + dV * rV.dDelta + Math.log(dV);
    const jL = 1 + 2 * dL * rL.dDelta + dL * dL * rL.dDelta2;
    const jV = 1 + 2 * dV * rV.dDelta + dV * dV * rV.dDelta2;
    if (!(jL > 0) || !(jV > 0)) {
      throw new Error(`${eos.designation}: phase equilibrium at ${T} K reached a mechanically unstable density`);
    }
    const f1 = pL - pV;
    const f2 = gL - gV;
    // Jacobian in x = ln δ: ∂(δ(1+δα_δ))/∂x = δ·J, ∂(α+δα_δ+ln δ)/∂x = J
    const a11 = dL * jL,
      a12 = -dV * jV,
      a21 = jL,
      a22 = -jV;
    const det = a11 * a22 - a12 * a21;
    let stepL = (f1 * a22 - a12 * f2) / det;
    let stepV = (a11 * f2 - a21 * f1) / det;
    const largest = Math.max(Math.abs(stepL), Math.abs(stepV));
    if (largest > 0.2) {
      stepL *= 0.2 / largest;
      stepV *= 0.2 / largest;
    }
    xL -= stepL;
    xV -= stepV;
    // Converged when the step is negligible or, close to T_c where the system is
    // ill-conditioned, when both residuals sit at rounding level.
    const residualsAtRounding = Math.abs(f1) <= 1e-12 * Math.abs(pV) && Math.abs(f2) <= 1e-12;
    if (largest < 1e-12 || residualsAtRounding) {
      const liquidDensity = Math.exp(xL) * rhor;
      const vapourDensity = Math.exp(xV) * rhor;
      if (!(liquidDensity > vapourDensity * (1 + 1e-9))) {
        throw new Error(`${eos.designation}: phase equilibrium at ${T} K collapsed to a single phase`);
      }
      return { liquidDensity, vapourDensity, pressure: eos.pressure(T, vapourDensity), iterations: iteration };
    }
  }
  throw new Error(`${eos.designation}: phase equilibrium at ${T} K did not converge`);
}
