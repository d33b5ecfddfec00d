/**
 * Bubble and dew points of a blend of fixed overall composition z with the
 * multi-fluid model (reference README §7.4): equal T, equal p and equal fugacity of
 * every component in the bulk phase (composition z) and the incipient phase
 * (composition w):
 *
 *   ln(z_i ρ_B) + (∂nα^r/∂n_i)_B = ln(w_i ρ_I) + (∂nα^r/∂n_i)_I   (ln f_i = ln(x_i ρRT) + ∂nα^r/∂n_i)
 *   p(T, ρ_B, z) = p(T, ρ_I, w),   Σ w_i = 1,   one specification.
 *
 * Bubble point: bulk = liquid, incipient = vapour; dew point the reverse. Unknowns
 * u = (ln T, ln ρ_B, ln ρ_I, ln w_1 … ln w_n); the specification fixes T, p, or the
 * density ratio s = ln(ρ_B/ρ_I) (the latter walks the envelope up to the critical
 * point, where s → 0). Newton's method on this full system, Jacobian by central
 * differences of the residuals (each residual is the exact model), damped steps that
 * keep both phases mechanically stable. Cold starts come from Raoult's law with the
 * components' superancillary vapour pressures (Wilson K-factors above a component's
 * critical temperature) refined by successive substitution K_i = φ_i^L/φ_i^V.
 */
import type { MixtureModel } from "./mixture-model.ts";
import { solveLinearSystem } from "./solve-linear-system.ts";

export type EnvelopeKind = "bubble" | "dew";

export type EnvelopeSpecification =
  | { temperature: number }
  | { pressure: number }
  /** ln(ρ_bulk/ρ_incipient); positive on the bubble curve, negative on the dew curve */
  | { densityRatio: number };

export interface EnvelopePoint {
  kind: EnvelopeKind;
  /** K */
  T: number;
  /** Pa */
  p: number;
  /** mol/m³, bulk phase (composition z) */
  bulkDensity: number;
  /** mol/m³, incipient phase */
  incipientDensity: number;
  /** mole fractions of the incipient phase */
  incipient: Float64Array;
  /** largest fugacity residual at the solution (ln units) */
  residual: number;
  iterations: number;
}

/** Largest |residual| accepted as converged (ln-fugacity and relative pressure units). */
export const ENVELOPE_TOLERANCE = 1e-11;

const LIQUID_OR_VAPOUR = { bubble: ["liquid", "vapour"], dew: ["vapour", "liquid"] } as const;

function residuals(
  model: MixtureModel,
  z: ArrayLike<number>,
  kind: EnvelopeKind,
  spec: EnvelopeSpecification,
  u: readonly number[],
): number[] | null {
  const n = z.length;
  const T = Math.exp(u[0]!);
  const rhoB = Math.exp(u[1]!);
  const rhoI = Math.exp(u[2]!);
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++) w[i] = Math.exp(u[3 + i]!);
  const bulk = model.phase(T, rhoB, z);
  const incipient = model.phase(T, rhoI, w);
  if (!(bulk.dpdrho > 0) || !(incipient.dpdrho > 0)) return null;
  const vapourPressure = kind === "bubble" ? incipient.p : bulk.p;
  if (!(vapourPressure > 0)) return null;
  const out: number[] = [];
  let sum = -1;
  for (let i = 0; i < n; i++) {
    out.push(
      Math.log(z[i]!) +
        u[1]! +
        bulk.residualChemicalPotential[i]! -
        u[3 + i]! -
        u[2]! -
        incipient.residualChemicalPotential[i]!,
    );
    sum += w[i]!;
  }
  // Pressure balance scaled by ρRT of the denser phase: a residual r then shifts that phase's
  // ln f by about r, so it is judged on the same scale as the fugacity residuals.
  out.push((bulk.p - incipient.p) / (model.gasConstant * T * Math.max(rhoB, rhoI)));
  out.push(sum);
  if ("temperature" in spec) out.push(u[0]! - Math.log(spec.temperature));
  else if ("pressure" in spec) out.push(Math.log(vapourPressure / spec.pressure));
  else out.push(u[1]! - u[2]! - spec.densityRatio);
  return out.every(Number.isFinite) ? out : null;
}

function jacobian(
  model: MixtureModel,
  z: ArrayLike<number>,
  kind: EnvelopeKind,
  spec: EnvelopeSpecification,
  u: readonly number[],
): number[][] | null {
  const size = u.length;
  const columns: number[][] = [];
  for (let k = 0; k < size; k++) {
    const h = 1e-6;
    const plus = [...u];
    const minus = [...u];
    plus[k] = plus[k]! + h;
    minus[k] = minus[k]! - h;
    const fPlus = residuals(model, z, kind, spec, plus);
    const fMinus = residuals(model, z, kind, spec, minus);
    if (!fPlus || !fMinus) return null;
    columns.push(fPlus.map((value, row) => (value - fMinus[row]!) / (2 * h)));
  }
  return Array.from({ length: size }, (_, row) => columns.map((column) => column[row]!));
}

const largest = (values: readonly number[]) => values.reduce((m, v) => Math.max(m, Math.abs(v)), 0);

export interface EnvelopeStart {
  T: number;
  bulkDensity: number;
  incipientDensity: number;
  incipient: ArrayLike<number>;
}

/** Packs a start (or a solved point) into the unknown vector u. */
export function envelopeUnknowns(start: EnvelopeStart): number[] {
  return [
    Math.log(start.T),
    Math.log(start.bulkDensity),
    Math.log(start.incipientDensity),
    ...Array.from(start.incipient, (w) => Math.log(w)),
  ];
}

/**
 * One bubble or dew point by Newton's method on the full model.
 *
 * @param model mixture model
 * @param z overall (bulk) mole fractions, Σ = 1
 * @param kind "bubble" (bulk liquid) or "dew" (bulk vapour)
 * @param spec the fixed temperature (K), pressure (Pa) or density ratio
 * @param start starting T, densities and incipient composition (continuation or coldStart)
 * @param tolerance largest accepted residual (default ENVELOPE_TOLERANCE; looser only next to the
 *   critical point, where the system is ill-conditioned)
 * @returns the converged point
 * @throws Error when Newton does not converge or converges to the trivial solution (w = z)
 * @example solveEnvelopePoint(model, z, "bubble", { temperature: 273.15 }, coldStart(model, z, "bubble", 273.15)).p
 */
export function solveEnvelopePoint(
  model: MixtureModel,
  z: ArrayLike<number>,
  kind: EnvelopeKind,
  spec: EnvelopeSpecification,
  start: EnvelopeStart,
  tolerance = ENVELOPE_TOLERANCE,
): EnvelopePoint {
  const n = z.length;
  let u = envelopeUnknowns(start);
  let f = residuals(model, z, kind, spec, u);
  if (!f) throw new Error(`${kind} point: the starting state is mechanically unstable`);
  for (let iteration = 1; iteration <= 60; iteration++) {
    const J = jacobian(model, z, kind, spec, u);
    if (!J) throw new Error(`${kind} point: the Jacobian reached an unstable state`);
    let step = solveLinearSystem(
      J,
      f.map((value) => -value),
    );
    const size = largest(step);
    if (size > 0.25) step = step.map((value) => (value * 0.25) / size);
    let accepted: number[] | null = null;
    let acceptedF: number[] | null = null;
    for (let halving = 0; halving < 30; halving++) {
      const trial = u.map((value, k) => value + step[k]!);
      const trialF = residuals(model, z, kind, spec, trial);
      if (trialF && largest(trialF) < Math.max(2 * largest(f), 1e-10)) {
        accepted = trial;
        acceptedF = trialF;
        break;
      }
      step = step.map((value) => value / 2);
    }
    if (!accepted || !acceptedF) throw new Error(`${kind} point: no acceptable Newton step`);
    u = accepted;
    f = acceptedF;
    const residual = largest(f);
    if ((largest(step) < 1e-12 && residual < tolerance) || residual < tolerance * 1e-2) {
      return finish(iteration, residual);
    }
    if (largest(step) < 1e-13) break;
  }
  const residual = largest(f);
  if (residual < tolerance) return finish(60, residual);
  throw new Error(`${kind} point did not converge (residual ${residual.toExponential(2)})`);

  function finish(iterations: number, residual: number): EnvelopePoint {
    const T = Math.exp(u[0]!);
    const bulkDensity = Math.exp(u[1]!);
    const incipientDensity = Math.exp(u[2]!);
    const incipient = Float64Array.from(u.slice(3), Math.exp);
    let compositionGap = 0;
    for (let i = 0; i < n; i++) compositionGap = Math.max(compositionGap, Math.abs(incipient[i]! - z[i]!));
    if (Math.abs(u[1]! - u[2]!) < 1e-6 && compositionGap < 1e-6) {
      throw new Error(`${kind} point collapsed onto the trivial solution (incipient phase = bulk phase)`);
    }
    const p = model.pressure(
      T,
      kind === "bubble" ? incipientDensity : bulkDensity,
      kind === "bubble" ? incipient : z,
    ).p;
    return { kind, T, p, bulkDensity, incipientDensity, incipient, residual, iterations };
  }
}

/**
 * dp/dT along the bubble or dew curve at a converged point (Pa/K), by implicit
 * differentiation of the equilibrium conditions: du/d(ln T) = J⁻¹ e_spec, then a
 * central difference of p(u) along that direction.
 */
export function envelopeSlope(model: MixtureModel, z: ArrayLike<number>, point: EnvelopePoint): number {
  const spec = { temperature: point.T };
  const u = envelopeUnknowns(point);
  const J = jacobian(model, z, point.kind, spec, u);
  if (!J) throw new Error(`${point.kind} slope: unstable state`);
  const unit = new Array<number>(u.length).fill(0);
  unit[u.length - 1] = 1;
  const direction = solveLinearSystem(J, unit);
  const pressureAt = (scale: number) => {
    const v = u.map((value, k) => value + scale * direction[k]!);
    return model.pressure(Math.exp(v[0]!), Math.exp(v[1]!), z).p;
  };
  const h = 1e-5;
  return (pressureAt(h) - pressureAt(-h)) / (2 * h * point.T);
}

/** Vapour-pressure estimate of one component: its superancillary inside its range, else Wilson's correlation. */
function componentVapourPressure(model: MixtureModel, index: number, T: number): number {
  const c = model.components[index]!;
  const sa = c.superancillary;
  if (sa && T >= sa.minimumTemperature && T < sa.criticalTemperature) return sa.pressure(T);
  return c.criticalPressure * Math.exp(5.373 * (1 + c.acentricFactor) * (1 - c.reducingTemperature / T));
}

/**
 * Cold start at temperature T: Raoult's law (ideal K_i = p_sat,i/p), then successive
 * substitution with the model's fugacity coefficients, updating p ← p·Σ K_i z_i
 * (bubble) or p ← p/Σ(z_i/K_i) (dew).
 *
 * @returns a start for solveEnvelopePoint
 * @throws Error when a phase density cannot be found during the substitution
 */
export function coldStart(model: MixtureModel, z: ArrayLike<number>, kind: EnvelopeKind, T: number): EnvelopeStart {
  const n = z.length;
  const saturation = Array.from({ length: n }, (_, i) => componentVapourPressure(model, i, T));
  let p: number;
  const w = new Float64Array(n);
  if (kind === "bubble") {
    p = 0;
    for (let i = 0; i < n; i++) p += z[i]! * saturation[i]!;
    for (let i = 0; i < n; i++) w[i] = (z[i]! * saturation[i]!) / p;
  } else {
    let inverse = 0;
    for (let i = 0; i < n; i++) inverse += z[i]! / saturation[i]!;
    p = 1 / inverse;
    for (let i = 0; i < n; i++) w[i] = (z[i]! * p) / saturation[i]!;
  }
  const [bulkBranch, incipientBranch] = LIQUID_OR_VAPOUR[kind];
  let bulkDensity = model.density(T, p, z, bulkBranch);
  let incipientDensity = model.density(T, p, w, incipientBranch);
  for (let iteration = 0; iteration < 200; iteration++) {
    const bulk = model.phase(T, bulkDensity, z);
    const incipient = model.phase(T, incipientDensity, w);
    let sum = 0;
    for (let i = 0; i < n; i++) {
      // bubble: w = K z with K = φ_L(z)/φ_V(w); dew: w = z/K with K = φ_L(w)/φ_V(z)
      const lnK = bulk.lnFugacityCoefficient[i]! - incipient.lnFugacityCoefficient[i]!;
      w[i] = z[i]! * Math.exp(lnK);
      sum += w[i]!;
    }
    for (let i = 0; i < n; i++) w[i] = w[i]! / sum;
    const change = Math.abs(sum - 1);
    p = kind === "bubble" ? p * sum : p / sum;
    bulkDensity = model.density(T, p, z, bulkBranch, bulkDensity);
    incipientDensity = model.density(T, p, w, incipientBranch, incipientDensity);
    if (change < 1e-9) break;
  }
  return { T, bulkDensity, incipientDensity, incipient: w };
}
