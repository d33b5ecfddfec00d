/**
 * Multi-fluid (GERG-type) Helmholtz mixture model (reference README §7.3–7.4;
 * Kunz & Wagner 2012; Lemmon & Jacobsen 2004 for the HFC pairs; Bell et al. 2016,
 * 2020, 2022, 2023, 2025 for the HFO, CO2 and CF3I pairs):
 *
 *   α^r(τ, δ, x) = Σ x_i α^r_i(τ, δ) + Σ_{i<j} x_i x_j F_ij α^r_ij(τ, δ),
 *   τ = T_r(x)/T, δ = ρ/ρ_r(x),
 *   α^0 = Σ x_i [(R_i/R) α^0_i(T_c,i/T, ρ/ρ_c,i) + ln x_i].
 *
 * Each component's α^r_i is the pure-fluid residual of its own file, evaluated at the
 * mixture's τ and δ. Molar SI units: K, Pa, mol/m³, J/mol, J/(mol·K).
 */
import { compileIdealHelmholtz, type IdealHelmholtz } from "../ideal-helmholtz.ts";
import { createResidualDerivatives, type ResidualDerivatives, type ResidualHelmholtz } from "../residual-helmholtz.ts";
import { compileResidualHelmholtz } from "../residual-helmholtz.ts";
import { createSuperancillary, type SuperancillaryCurve } from "../superancillary.ts";
import type { ReferenceFluidFile } from "../reference-types.ts";
import { compileDepartureFunction } from "./departure-function.ts";
import type { BinaryPairRecord, DepartureFunctionRecord } from "./mixture-data.ts";
import { createReducingFunctions, type PairReducingParameters, type ReducingValues } from "./reducing-functions.ts";

/** Gas constant used for mixtures (CODATA 2018, as in the reference evaluation of README §9.4), J/(mol·K). */
export const MIXTURE_GAS_CONSTANT = 8.31446261815324;

export interface MixtureComponent {
  readonly designation: string;
  readonly cas: string;
  /** kg/mol */
  readonly molarMass: number;
  /** R of the component's own EOS, J/(mol·K) */
  readonly gasConstant: number;
  /** EOS reducing values (K, mol/m³) */
  readonly reducingTemperature: number;
  readonly reducingDensity: number;
  /** STATES.critical.p in Pa and EOS acentric factor (Wilson K-factor estimates) */
  readonly criticalPressure: number;
  readonly acentricFactor: number;
  /** lowest temperature of the component's EOS (triple point), K */
  readonly minimumTemperature: number;
  readonly residual: ResidualHelmholtz;
  readonly ideal: IdealHelmholtz;
  /** pure-fluid saturation curve, for Raoult's-law starting estimates */
  readonly superancillary: SuperancillaryCurve | null;
}

/** A binary pair as the model uses it: GERG-form reducing parameters plus F_ij α^r_ij. */
export interface MixturePair extends PairReducingParameters {
  readonly F: number;
  readonly departure: ResidualHelmholtz | null;
  readonly departureName: string | null;
  readonly bibtex: string;
}

/** Residual Helmholtz energy of the mixture at one (T, ρ, x). */
export interface MixtureResidual extends ResidualDerivatives {
  tau: number;
  delta: number;
  reducing: ReducingValues;
  /** ∂α^r/∂x_k at constant τ, δ and the other fractions (README §7.4) */
  dComposition: Float64Array;
}

/** One homogeneous phase. */
export interface MixturePhase {
  T: number;
  /** mol/m³ */
  rho: number;
  /** Pa */
  p: number;
  /** compressibility factor */
  Z: number;
  /** (∂p/∂ρ)_T,x in Pa·m³/mol */
  dpdrho: number;
  /** (∂(nα^r)/∂n_i)_T,V,n_j */
  residualChemicalPotential: Float64Array;
  /** ln φ_i = (∂(nα^r)/∂n_i) − ln Z */
  lnFugacityCoefficient: Float64Array;
}

export interface MixtureModel {
  readonly components: readonly MixtureComponent[];
  readonly pairs: readonly MixturePair[];
  readonly gasConstant: number;
  /** Molar enthalpy / entropy shifts added to every h and s (blend-level IIR reference). */
  enthalpyOffset: number;
  entropyOffset: number;
  molarMass(x: ArrayLike<number>): number;
  /** α^r with τ and δ derivatives (all if `withTau`, else α^r, α^r_δ, α^r_δδ only) and ∂α^r/∂x_k */
  residual(T: number, rho: number, x: ArrayLike<number>, withTau?: boolean): MixtureResidual;
  /** p and (∂p/∂ρ)_T in Pa and Pa·m³/mol */
  pressure(T: number, rho: number, x: ArrayLike<number>): { p: number; dpdrho: number };
  phase(T: number, rho: number, x: ArrayLike<number>): MixturePhase;
  /** molar enthalpy and entropy, J/mol and J/(mol·K) */
  caloric(T: number, rho: number, x: ArrayLike<number>): { h: number; s: number };
  /**
   * Density at (T, p, x) on one branch; only roots with ∂p/∂ρ > 0 are returned.
   * @throws Error when the branch has no root at this pressure
   */
  density(T: number, p: number, x: ArrayLike<number>, branch: "liquid" | "vapour", guess?: number): number;
}

function gergFromRecord(record: BinaryPairRecord, a: MixtureComponent, b: MixtureComponent) {
  if (record.xi !== undefined && record.zeta !== undefined) {
    // Lemmon–Jacobsen linear form ≡ β = 1 and these γ (README §7.2)
    const va = 1 / a.reducingDensity;
    const vb = 1 / b.reducingDensity;
    return {
      betaT: 1,
      gammaT:
        (a.reducingTemperature + b.reducingTemperature + record.xi) /
        (2 * Math.sqrt(a.reducingTemperature * b.reducingTemperature)),
      betaV: 1,
      gammaV: (va + vb + record.zeta) / (Math.pow(Math.cbrt(va) + Math.cbrt(vb), 3) / 4),
    };
  }
  const { betaT, gammaT, betaV, gammaV } = record;
  if ([betaT, gammaT, betaV, gammaV].some((value) => typeof value !== "number")) {
    throw new Error(`binary pair ${record.Name1}/${record.Name2} has neither β/γ nor ξ/ζ`);
  }
  return { betaT: betaT!, gammaT: gammaT!, betaV: betaV!, gammaV: gammaV! };
}

/** Builds one component from its reference fluid file (shipped reference state, no shift). */
export function createMixtureComponent(file: ReferenceFluidFile): MixtureComponent {
  const eos = file.EOS[0];
  if (eos.pseudo_pure)
    throw new Error(`createMixtureComponent requires a pure fluid (${file.designation} is pseudo-pure)`);
  return {
    designation: file.designation,
    cas: file.INFO.CAS,
    molarMass: eos.molar_mass,
    gasConstant: eos.gas_constant,
    reducingTemperature: eos.STATES.reducing.T,
    reducingDensity: eos.STATES.reducing.rhomolar,
    criticalPressure: file.STATES.critical.p,
    acentricFactor: eos.acentric,
    minimumTemperature: eos.STATES.sat_min_liquid.T,
    residual: compileResidualHelmholtz(eos.alphar),
    ideal: compileIdealHelmholtz(eos.alpha0),
    superancillary: eos.SUPERANCILLARY ? createSuperancillary(eos.SUPERANCILLARY) : null,
  };
}

/**
 * Finds the parameters of every pair of `components` by CAS number (README §7.2: the
 * Name fields are spelled inconsistently), reversing β for the reverse order.
 *
 * @returns the pairs, or the list of missing pairs when some are not covered
 */
export function matchPairs(
  components: readonly MixtureComponent[],
  pairRecords: readonly BinaryPairRecord[],
  departureRecords: readonly DepartureFunctionRecord[],
): { pairs: MixturePair[]; missing: string[] } {
  const pairs: MixturePair[] = [];
  const missing: string[] = [];
  for (let i = 0; i < components.length; i++) {
    for (let j = i + 1; j < components.length; j++) {
      const a = components[i]!;
      const b = components[j]!;
      const forward = pairRecords.find((r) => r.CAS1 === a.cas && r.CAS2 === b.cas);
      const reverse = pairRecords.find((r) => r.CAS1 === b.cas && r.CAS2 === a.cas);
      const record = forward ?? reverse;
      if (!record) {
        missing.push(`${a.designation}/${b.designation}`);
        continue;
      }
      let g = forward ? gergFromRecord(record, a, b) : gergFromRecord(record, b, a);
      if (!forward) g = { betaT: 1 / g.betaT, gammaT: g.gammaT, betaV: 1 / g.betaV, gammaV: g.gammaV };
      let departure: ResidualHelmholtz | null = null;
      if (record.F !== 0) {
        const definition = departureRecords.find((d) => d.Name === record.function);
        if (!definition)
          throw new Error(`departure function ${record.function} of ${a.designation}/${b.designation} is missing`);
        departure = compileDepartureFunction(definition);
      }
      pairs.push({
        i,
        j,
        ...g,
        F: record.F,
        departure,
        departureName: record.F !== 0 ? (record.function ?? null) : null,
        bibtex: record.BibTeX,
      });
    }
  }
  return { pairs, missing };
}

/**
 * @param components the blend's components, in the order of its composition vector
 * @param pairs every pair i < j (from matchPairs)
 * @returns the mixture model
 * @throws Error when a pair is missing
 * @example createMixtureModel(components, matchPairs(components, pairs, departures).pairs).phase(273.15, 500, x).p
 */
export function createMixtureModel(
  components: readonly MixtureComponent[],
  pairs: readonly MixturePair[],
): MixtureModel {
  const count = components.length;
  if (pairs.length !== (count * (count - 1)) / 2) {
    throw new Error(`createMixtureModel requires all ${(count * (count - 1)) / 2} pairs, got ${pairs.length}`);
  }
  const reducing = createReducingFunctions(
    components.map((c) => c.reducingTemperature),
    components.map((c) => c.reducingDensity),
    pairs,
  );
  const R = MIXTURE_GAS_CONSTANT;
  const componentScratch = components.map(() => createResidualDerivatives());
  const pairScratch = createResidualDerivatives();

  function residual(T: number, rho: number, x: ArrayLike<number>, withTau = true): MixtureResidual {
    const red = reducing.evaluate(x);
    const tau = red.temperature / T;
    const delta = rho / red.density;
    const out: MixtureResidual = {
      ...createResidualDerivatives(),
      tau,
      delta,
      reducing: red,
      dComposition: new Float64Array(count),
    };
    for (let k = 0; k < count; k++) {
      const r = withTau
        ? components[k]!.residual.evaluate(tau, delta, componentScratch[k])
        : components[k]!.residual.evaluateDelta(tau, delta, componentScratch[k]!);
      const xk = x[k]!;
      out.alphar += xk * r.alphar;
      out.dDelta += xk * r.dDelta;
      out.dDelta2 += xk * r.dDelta2;
      out.dTau += xk * r.dTau;
      out.dDeltaTau += xk * r.dDeltaTau;
      out.dTau2 += xk * r.dTau2;
      out.dComposition[k] = r.alphar;
    }
    for (const pair of pairs) {
      if (!pair.departure) continue;
      const r = withTau
        ? pair.departure.evaluate(tau, delta, pairScratch)
        : pair.departure.evaluateDelta(tau, delta, pairScratch);
      const xi = x[pair.i]!;
      const xj = x[pair.j]!;
      const w = xi * xj * pair.F;
      out.alphar += w * r.alphar;
      out.dDelta += w * r.dDelta;
      out.dDelta2 += w * r.dDelta2;
      out.dTau += w * r.dTau;
      out.dDeltaTau += w * r.dDeltaTau;
      out.dTau2 += w * r.dTau2;
      out.dComposition[pair.i] = out.dComposition[pair.i]! + xj * pair.F * r.alphar;
      out.dComposition[pair.j] = out.dComposition[pair.j]! + xi * pair.F * r.alphar;
    }
    return out;
  }

  function pressure(T: number, rho: number, x: ArrayLike<number>) {
    const r = residual(T, rho, x, false);
    const RT = R * T;
    return {
      p: rho * RT * (1 + r.delta * r.dDelta),
      dpdrho: RT * (1 + 2 * r.delta * r.dDelta + r.delta * r.delta * r.dDelta2),
    };
  }

  const model: MixtureModel = {
    components,
    pairs,
    gasConstant: R,
    enthalpyOffset: 0,
    entropyOffset: 0,
    molarMass(x) {
      let M = 0;
      for (let k = 0; k < count; k++) M += x[k]! * components[k]!.molarMass;
      return M;
    },
    residual,
    pressure,
    phase(T, rho, x) {
      const r = residual(T, rho, x, true);
      const { tau, delta } = r;
      const red = r.reducing;
      const Z = 1 + delta * r.dDelta;
      // Σ x_k ∂Y/∂x_k for the n·∂/∂n_i projection (README §7.4)
      let sumT = 0,
        sumV = 0,
        sumA = 0;
      for (let k = 0; k < count; k++) {
        sumT += x[k]! * red.dTemperature[k]!;
        sumV += x[k]! * red.dVolume[k]!;
        sumA += x[k]! * r.dComposition[k]!;
      }
      const chemical = new Float64Array(count);
      const lnPhi = new Float64Array(count);
      const lnZ = Math.log(Z);
      for (let i = 0; i < count; i++) {
        // (1/ρ_r) n ∂ρ_r/∂n_i = −ρ_r n ∂(1/ρ_r)/∂n_i
        const densityTerm = -red.density * (red.dVolume[i]! - sumV);
        const temperatureTerm = (red.dTemperature[i]! - sumT) / red.temperature;
        chemical[i] =
          r.alphar + delta * r.dDelta * (1 - densityTerm) + tau * r.dTau * temperatureTerm + r.dComposition[i]! - sumA;
        lnPhi[i] = chemical[i]! - lnZ;
      }
      const RT = R * T;
      return {
        T,
        rho,
        p: rho * RT * Z,
        Z,
        dpdrho: RT * (1 + 2 * delta * r.dDelta + delta * delta * r.dDelta2),
        residualChemicalPotential: chemical,
        lnFugacityCoefficient: lnPhi,
      };
    },
    caloric(T, rho, x) {
      const r = residual(T, rho, x, true);
      let h = R * T * (r.tau * r.dTau + r.delta * r.dDelta);
      let s = R * (r.tau * r.dTau - r.alphar);
      for (let k = 0; k < count; k++) {
        const xk = x[k]!;
        if (xk === 0) continue;
        const c = components[k]!;
        const tauK = c.reducingTemperature / T;
        const ideal = c.ideal.evaluate(tauK, rho / c.reducingDensity);
        h += xk * c.gasConstant * T * (1 + tauK * ideal.dTau);
        s += xk * c.gasConstant * (tauK * ideal.dTau - ideal.alpha0) - R * xk * Math.log(xk);
      }
      return { h: h + model.enthalpyOffset, s: s + model.entropyOffset };
    },
    density(T, p, x, branch, guess) {
      const fail = (why: string) => new Error(`mixture: no ${branch} density at ${T} K, ${p} Pa (${why})`);
      const at = (rho: number) => pressure(T, rho, x);
      let below: number;
      let above: number;
      if (branch === "liquid") {
        above = guess ?? 3.2 * reducing.evaluate(x).density;
        for (let k = 0; at(above).p < p; k++) {
          if (k > 200) throw fail("no pressure above target");
          above *= 1.05;
        }
        below = above;
        for (let k = 0; ; k++) {
          const state = at(below);
          if (state.p < p) break;
          if (!(state.dpdrho > 0) || k > 600) throw fail("reached the liquid spinodal");
          above = below;
          below /= 1.01;
        }
      } else {
        below = guess ?? p / (R * T);
        for (let k = 0; at(below).p > p; k++) {
          if (k > 400) throw fail("no pressure below target");
          below /= 1.05;
        }
        above = below;
        for (let k = 0; ; k++) {
          const state = at(above);
          if (state.p > p) break;
          if (!(state.dpdrho > 0) || k > 600) throw fail("reached the vapour spinodal");
          below = above;
          above *= 1.01;
        }
      }
      let rho = 0.5 * (below + above);
      for (let iteration = 0; iteration < 200; iteration++) {
        const state = at(rho);
        if (state.p < p) below = rho;
        else above = rho;
        let next = rho - (state.p - p) / state.dpdrho;
        if (!(state.dpdrho > 0) || !(next > Math.min(below, above) && next < Math.max(below, above))) {
          next = 0.5 * (below + above);
        }
        // Regression (issue 18): an exact pressure match means ρ is the root, not the bisection
        // midpoint the step may have fallen back to (see helmholtz-eos.ts).
        const root = Math.abs(state.p - p) <= 1e-15 * p ? rho : Math.abs(next - rho) <= 1e-14 * rho ? next : null;
        if (root !== null) {
          if (!(at(root).dpdrho > 0)) throw fail("root is mechanically unstable");
          return root;
        }
        rho = next;
      }
      throw fail("did not converge");
    },
  };
  return model;
}
