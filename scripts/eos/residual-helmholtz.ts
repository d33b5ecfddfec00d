/**
 * Residual Helmholtz energy α^r(τ, δ) of one pure fluid, with all derivatives up
 * to second order in τ and δ.
 *
 * This is the building block a multi-fluid (GERG-type) mixture model reuses: it
 * evaluates α^r_i of component i at the mixture's τ and δ (reference README §7.3).
 * Term forms: reference README §3.2 (CoolProp fluid-file layout, Bell et al. 2014).
 *
 * Separable terms (Power, Lemmon2005, Gaussian, GaoB) share the form
 *   α_k = n δ^d τ^t exp(u1(δ) + u2(τ))
 * and are evaluated with the derivative recipe of README §3.2. NonAnalytic terms
 * (Span & Wagner 1996, CO2) go through hyper-dual numbers so no hand-derived
 * second derivative can carry a typo.
 */
import type { ResidualBlock, ResidualNonAnalyticBlock } from "./reference-types.ts";
import { HyperDual } from "./hyper-dual.ts";

/** α^r and its partial derivatives at one (τ, δ). Subscripts as in the README: dDelta = ∂α^r/∂δ at constant τ. */
export interface ResidualDerivatives {
  alphar: number;
  dDelta: number;
  dTau: number;
  dDelta2: number;
  dDeltaTau: number;
  dTau2: number;
}

export function createResidualDerivatives(): ResidualDerivatives {
  return { alphar: 0, dDelta: 0, dTau: 0, dDelta2: 0, dDeltaTau: 0, dTau2: 0 };
}

/** Compiled residual Helmholtz function of one fluid. */
export interface ResidualHelmholtz {
  /** Number of terms (for information). */
  readonly termCount: number;
  /** Writes α^r and its derivatives at (τ, δ) into `out` and returns it (no allocation unless NonAnalytic terms exist). */
  evaluate(tau: number, delta: number, out?: ResidualDerivatives): ResidualDerivatives;
  /** α^r and ∂α^r/∂δ, ∂²α^r/∂δ² only (what density and phase-equilibrium Newton steps need). */
  evaluateDelta(tau: number, delta: number, out: ResidualDerivatives): ResidualDerivatives;
}

// Exponent kinds for the δ part u1(δ) and the τ part u2(τ).
const NONE = 0;
const NEG_POWER = 1; // u = -x^l
const QUADRATIC = 2; // u = c (x - centre)^2
const GAO_RECIPROCAL = 3; // u = 1 / (β (τ - γ)^2 + b)

interface SeparableTerms {
  n: Float64Array;
  d: Float64Array;
  t: Float64Array;
  deltaKind: Uint8Array;
  deltaA: Float64Array; // l, or the quadratic coefficient c
  deltaB: Float64Array; // quadratic centre ε
  tauKind: Uint8Array;
  tauA: Float64Array; // m, quadratic coefficient, or GaoB β
  tauB: Float64Array; // quadratic centre γ
  tauC: Float64Array; // GaoB b
  count: number;
}

function compileSeparable(blocks: ResidualBlock[]): SeparableTerms {
  const rows: Array<[number, number, number, number, number, number, number, number, number, number]> = [];
  for (const block of blocks) {
    switch (block.type) {
      case "ResidualHelmholtzPower":
        block.n.forEach((n, k) => {
          const l = block.l[k] ?? 0;
          rows.push([n, block.d[k]!, block.t[k]!, l > 0 ? NEG_POWER : NONE, l, 0, NONE, 0, 0, 0]);
        });
        break;
      case "ResidualHelmholtzLemmon2005":
        block.n.forEach((n, k) => {
          const l = block.l[k]!;
          const m = block.m[k]!;
          rows.push([n, block.d[k]!, block.t[k]!, l > 0 ? NEG_POWER : NONE, l, 0, m > 0 ? NEG_POWER : NONE, m, 0, 0]);
        });
        break;
      case "ResidualHelmholtzGaussian":
        block.n.forEach((n, k) => {
          rows.push([
            n,
            block.d[k]!,
            block.t[k]!,
            QUADRATIC,
            -block.eta[k]!,
            block.epsilon[k]!,
            QUADRATIC,
            -block.beta[k]!,
            block.gamma[k]!,
            0,
          ]);
        });
        break;
      case "ResidualHelmholtzGaoB":
        // Gao et al. 2020: exp[η(δ-ε)² + 1/(β(τ-γ)² + b)], stored η negative (README §3.2).
        block.n.forEach((n, k) => {
          rows.push([
            n,
            block.d[k]!,
            block.t[k]!,
            QUADRATIC,
            block.eta[k]!,
            block.epsilon[k]!,
            GAO_RECIPROCAL,
            block.beta[k]!,
            block.gamma[k]!,
            block.b[k]!,
          ]);
        });
        break;
      case "ResidualHelmholtzNonAnalytic":
        break;
      default: {
        const unknown: never = block;
        throw new Error(`residual Helmholtz term type ${(unknown as { type: string }).type} is not supported`);
      }
    }
  }
  const column = (i: number) => Float64Array.from(rows, (r) => r[i]!);
  return {
    n: column(0),
    d: column(1),
    t: column(2),
    deltaKind: Uint8Array.from(rows, (r) => r[3]),
    deltaA: column(4),
    deltaB: column(5),
    tauKind: Uint8Array.from(rows, (r) => r[6]),
    tauA: column(7),
    tauB: column(8),
    tauC: column(9),
    count: rows.length,
  };
}

interface NonAnalyticTerm {
  n: number;
  a: number;
  b: number;
  beta: number;
  A: number;
  B: number;
  C: number;
  D: number;
}

function compileNonAnalytic(blocks: ResidualBlock[]): NonAnalyticTerm[] {
  const terms: NonAnalyticTerm[] = [];
  for (const block of blocks) {
    if (block.type !== "ResidualHelmholtzNonAnalytic") continue;
    const b = block as ResidualNonAnalyticBlock;
    b.n.forEach((n, k) => {
      terms.push({ n, a: b.a[k]!, b: b.b[k]!, beta: b.beta[k]!, A: b.A[k]!, B: b.B[k]!, C: b.C[k]!, D: b.D[k]! });
    });
  }
  return terms;
}

/**
 * One NonAnalytic term n Δ^b δ ψ (Span & Wagner 1996, eq. 6.1) on hyper-dual numbers.
 * Δ = θ² + B[(δ-1)²]^a, θ = (1-τ) + A[(δ-1)²]^(1/(2β)), ψ = exp[-C(δ-1)² - D(τ-1)²].
 */
function nonAnalyticValue(term: NonAnalyticTerm, tau: HyperDual, delta: HyperDual): HyperDual {
  const dm1 = delta.addReal(-1);
  const dm1Squared = dm1.mul(dm1);
  const theta = tau
    .scale(-1)
    .addReal(1)
    .add(dm1Squared.pow(1 / (2 * term.beta)).scale(term.A));
  const bigDelta = theta.mul(theta).add(dm1Squared.pow(term.a).scale(term.B));
  const tm1 = tau.addReal(-1);
  const psi = dm1Squared.scale(-term.C).add(tm1.mul(tm1).scale(-term.D)).exp();
  return bigDelta.pow(term.b).mul(delta).mul(psi).scale(term.n);
}

/** Nudge away from exactly 1, where the NonAnalytic terms' higher derivatives are singular (README §3.2). */
function nudgeFromOne(x: number): number {
  const gap = 8 * Number.EPSILON;
  return Math.abs(x - 1) < gap ? (x >= 1 ? 1 + gap : 1 - gap) : x;
}

/**
 * Compiles the `alphar` blocks of a fluid file into a fast evaluator.
 *
 * @param blocks `EOS[0].alphar` of a reference fluid file (any mix of the five supported term types)
 * @returns evaluator of α^r(τ, δ) with first and second derivatives
 * @throws Error when a block has an unsupported `type`
 * @example
 *   const residual = compileResidualHelmholtz(fluid.EOS[0].alphar);
 *   residual.evaluate(1.2, 0.5).dDelta;
 */
export function compileResidualHelmholtz(blocks: ResidualBlock[]): ResidualHelmholtz {
  const s = compileSeparable(blocks);
  const nonAnalytic = compileNonAnalytic(blocks);

  function separable(tau: number, delta: number, out: ResidualDerivatives, withTau: boolean): void {
    let a = 0,
      ad = 0,
      at = 0,
      add = 0,
      adt = 0,
      att = 0;
    const lnDelta = Math.log(delta);
    const lnTau = Math.log(tau);
    for (let k = 0; k < s.count; k++) {
      const d = s.d[k]!;
      const t = s.t[k]!;
      let u = 0,
        ud = 0,
        udd = 0,
        ut = 0,
        utt = 0;
      const dk = s.deltaKind[k];
      if (dk === NEG_POWER) {
        const l = s.deltaA[k]!;
        const dl = Math.exp(l * lnDelta);
        u = -dl;
        ud = (-l * dl) / delta;
        udd = (-l * (l - 1) * dl) / (delta * delta);
      } else if (dk === QUADRATIC) {
        const c = s.deltaA[k]!;
        const x = delta - s.deltaB[k]!;
        u = c * x * x;
        ud = 2 * c * x;
        udd = 2 * c;
      }
      const tk = s.tauKind[k];
      if (tk === NEG_POWER) {
        const m = s.tauA[k]!;
        const tm = Math.exp(m * lnTau);
        u -= tm;
        ut = (-m * tm) / tau;
        utt = (-m * (m - 1) * tm) / (tau * tau);
      } else if (tk === QUADRATIC) {
        const c = s.tauA[k]!;
        const x = tau - s.tauB[k]!;
        u += c * x * x;
        ut = 2 * c * x;
        utt = 2 * c;
      } else if (tk === GAO_RECIPROCAL) {
        const beta = s.tauA[k]!;
        const x = tau - s.tauB[k]!;
        const q = beta * x * x + s.tauC[k]!;
        u += 1 / q;
        ut = (-2 * beta * x) / (q * q);
        utt = (-2 * beta) / (q * q) + (8 * beta * beta * x * x) / (q * q * q);
      }
      const value = s.n[k]! * Math.exp(d * lnDelta + t * lnTau + u);
      const Dd = d / delta + ud;
      a += value;
      ad += value * Dd;
      add += value * (Dd * Dd - d / (delta * delta) + udd);
      if (withTau) {
        const Dt = t / tau + ut;
        at += value * Dt;
        adt += value * Dd * Dt;
        att += value * (Dt * Dt - t / (tau * tau) + utt);
      }
    }
    out.alphar = a;
    out.dDelta = ad;
    out.dDelta2 = add;
    out.dTau = at;
    out.dDeltaTau = adt;
    out.dTau2 = att;
  }

  function addNonAnalytic(tau: number, delta: number, out: ResidualDerivatives, withTau: boolean): void {
    if (nonAnalytic.length === 0) return;
    const t = nudgeFromOne(tau);
    const d = nudgeFromOne(delta);
    for (const term of nonAnalytic) {
      // δ,δ direction: value, ∂δ and ∂δδ
      const dd = nonAnalyticValue(term, HyperDual.constant(t), HyperDual.variable(d, 1, 1));
      out.alphar += dd.value;
      out.dDelta += dd.first;
      out.dDelta2 += dd.cross;
      if (withTau) {
        const tt = nonAnalyticValue(term, HyperDual.variable(t, 1, 1), HyperDual.constant(d));
        const dt = nonAnalyticValue(term, HyperDual.variable(t, 0, 1), HyperDual.variable(d, 1, 0));
        out.dTau += tt.first;
        out.dTau2 += tt.cross;
        out.dDeltaTau += dt.cross;
      }
    }
  }

  return {
    termCount: s.count + nonAnalytic.length,
    evaluate(tau, delta, out = createResidualDerivatives()) {
      separable(tau, delta, out, true);
      addNonAnalytic(tau, delta, out, true);
      return out;
    },
    evaluateDelta(tau, delta, out) {
      separable(tau, delta, out, false);
      addNonAnalytic(tau, delta, out, false);
      return out;
    },
  };
}
