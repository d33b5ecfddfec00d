/**
 * Bubble and dew curves of a blend along a temperature grid, its critical point and
 * its saturation states in the generator's SaturationState shape (same columns as
 * the pure and pseudo-pure tables).
 *
 * Each curve is traced upward in T: the first row from a cold start (Raoult/Wilson
 * plus successive substitution), every later row from the previous two rows
 * (linear extrapolation of ln T, ln ρ and ln w), falling back to a cold start if
 * that fails. The critical point is the end of the phase envelope: from the last
 * bubble row the density ratio s = ln(ρ'/ρ'') is specified and driven towards 0
 * (README §7.4), and T, p, ρ are extrapolated linearly in s to s = 0.
 */
import type { SaturationState } from "../saturation-state.ts";
import type { BlendModel } from "./blend-model.ts";
import {
  coldStart,
  envelopeSlope,
  envelopeUnknowns,
  solveEnvelopePoint,
  type EnvelopeKind,
  type EnvelopePoint,
  type EnvelopeStart,
} from "./envelope-point.ts";

/** Residual accepted while walking the envelope to the critical point (ill-conditioned there). */
const CRITICAL_REGION_TOLERANCE = 1e-9;

/** Continues from the previous one or two converged points to temperature T. */
function continuedStart(previous: readonly EnvelopePoint[], T: number): EnvelopeStart | null {
  if (previous.length === 0) return null;
  const last = previous[previous.length - 1]!;
  if (previous.length === 1) return { ...last, T };
  const a = envelopeUnknowns(previous[previous.length - 2]!);
  const b = envelopeUnknowns(last);
  const fraction = (Math.log(T) - b[0]!) / (b[0]! - a[0]!);
  const u = b.map((value, k) => value + fraction * (value - a[k]!));
  return { T, bulkDensity: Math.exp(u[1]!), incipientDensity: Math.exp(u[2]!), incipient: u.slice(3).map(Math.exp) };
}

/**
 * @param blend blend model
 * @param kind "bubble" or "dew"
 * @param temperatures increasing temperatures in K
 * @param previous converged points of the same curve just below the first temperature (continuation)
 * @returns the converged points, in order; stops at the first temperature where neither
 *   continuation nor a cold start converges (or the pressure stops rising)
 */
export function traceSaturationCurve(
  blend: BlendModel,
  kind: EnvelopeKind,
  temperatures: readonly number[],
  previous: readonly EnvelopePoint[] = [],
): EnvelopePoint[] {
  const z = blend.moleFractions;
  const points: EnvelopePoint[] = [];
  for (const T of temperatures) {
    const attempts: Array<() => EnvelopeStart> = [];
    const continued = continuedStart([...previous, ...points].slice(-2), T);
    if (continued) attempts.push(() => continued);
    attempts.push(() => coldStart(blend.model, z, kind, T));
    let solved: EnvelopePoint | null = null;
    for (const attempt of attempts) {
      try {
        solved = solveEnvelopePoint(blend.model, z, kind, { temperature: T }, attempt());
        break;
      } catch {
        // next attempt
      }
    }
    if (!solved) break;
    const last = points[points.length - 1] ?? previous[previous.length - 1];
    if (last && !(solved.p > last.p)) break;
    points.push(solved);
  }
  return points;
}

export interface BlendCriticalPoint {
  /** K */
  T: number;
  /** Pa */
  p: number;
  /** mol/m³ */
  rho: number;
  /** |T(s = 1e-3) − T(s = 5e-4)| in K: the size of the last extrapolation step */
  spread: number;
}

/**
 * Critical point of the blend at its nominal composition: the end of the bubble
 * curve, where the incipient vapour becomes identical to the liquid.
 *
 * @param blend blend model
 * @param lastBubble a converged bubble point close to the critical point (s ≲ 0.5)
 * @returns T, p and ρ extrapolated to s = 0
 * @throws Error when the envelope cannot be followed down to s = 5e-4
 */
export function blendCriticalPoint(blend: BlendModel, lastBubble: EnvelopePoint): BlendCriticalPoint {
  const z = blend.moleFractions;
  let s = Math.log(lastBubble.bulkDensity / lastBubble.incipientDensity);
  let point = lastBubble;
  const targets: number[] = [];
  while (s > 1.5e-3) {
    s *= 0.6;
    targets.push(s);
  }
  targets.push(1e-3, 5e-4);
  const solved: EnvelopePoint[] = [];
  for (const target of targets) {
    point = solveEnvelopePoint(blend.model, z, "bubble", { densityRatio: target }, point, CRITICAL_REGION_TOLERANCE);
    solved.push(point);
  }
  const [a, b] = solved.slice(-2) as [EnvelopePoint, EnvelopePoint];
  // linear extrapolation in s from s = 1e-3 (a) and 5e-4 (b) to s = 0: value(0) = 2 b − a
  const extrapolate = (va: number, vb: number) => 2 * vb - va;
  const rhoA = Math.sqrt(a.bulkDensity * a.incipientDensity);
  const rhoB = Math.sqrt(b.bulkDensity * b.incipientDensity);
  return {
    T: extrapolate(a.T, b.T),
    p: extrapolate(a.p, b.p),
    rho: extrapolate(rhoA, rhoB),
    spread: Math.abs(a.T - b.T),
  };
}

/**
 * Table row from a bubble point and a dew point at the same temperature: bubble
 * pressure, ρ', h', s' of the bulk liquid; dew pressure, ρ'', h'', s'' of the bulk
 * vapour (the incipient phases have other compositions and are not the blend).
 */
export function blendSaturationState(blend: BlendModel, bubble: EnvelopePoint, dew: EnvelopePoint): SaturationState {
  if (Math.abs(bubble.T - dew.T) > 1e-9 * bubble.T) {
    throw new Error(`blendSaturationState requires bubble and dew points at one temperature (${bubble.T}, ${dew.T} K)`);
  }
  const z = blend.moleFractions;
  const liquid = blend.model.caloric(bubble.T, bubble.bulkDensity, z);
  const vapour = blend.model.caloric(dew.T, dew.bulkDensity, z);
  return {
    T: bubble.T,
    bubblePressure: bubble.p,
    dewPressure: dew.p,
    bubbleSlope: envelopeSlope(blend.model, z, bubble),
    dewSlope: envelopeSlope(blend.model, z, dew),
    liquidDensity: bubble.bulkDensity,
    vapourDensity: dew.bulkDensity,
    liquidEnthalpy: liquid.h,
    vapourEnthalpy: vapour.h,
    liquidEntropy: liquid.s,
    vapourEntropy: vapour.s,
  };
}

/**
 * Bubble or dew temperature at a given pressure (normal boiling points, glide):
 * Newton with the pressure specified, started from the nearest traced point.
 *
 * @param blend blend model
 * @param kind "bubble" or "dew"
 * @param pressure Pa, inside the traced range
 * @param curve points of the same kind from traceSaturationCurve
 * @returns the converged point (its T is the answer)
 * @throws Error when the pressure lies outside the traced curve or Newton fails
 */
export function blendPointAtPressure(
  blend: BlendModel,
  kind: EnvelopeKind,
  pressure: number,
  curve: readonly EnvelopePoint[],
): EnvelopePoint {
  if (curve.length === 0 || pressure < curve[0]!.p || pressure > curve[curve.length - 1]!.p) {
    throw new Error(`blendPointAtPressure: ${pressure} Pa is outside the traced ${kind} curve`);
  }
  let nearest = curve[0]!;
  for (const point of curve)
    if (Math.abs(Math.log(point.p / pressure)) < Math.abs(Math.log(nearest.p / pressure))) nearest = point;
  return solveEnvelopePoint(blend.model, blend.moleFractions, kind, { pressure }, nearest);
}

/**
 * Puts the blend on the IIR reference (README §6): h' = 200 kJ/kg and s' = 1 kJ/(kg·K)
 * for the bubble-point liquid at 0 °C. Component references alone do not do this
 * (mixing terms), so one blend-level shift is applied to every h and s.
 *
 * @param blend blend model (its model's enthalpyOffset / entropyOffset are set)
 * @param bubbleAtZero converged bubble point at 273.15 K
 * @returns the applied shifts in kJ/kg and kJ/(kg·K) (R410A ≈ −1.214 and −0.0707)
 */
export function applyBlendIirReference(
  blend: BlendModel,
  bubbleAtZero: EnvelopePoint,
): { enthalpyShiftKJPerKg: number; entropyShiftKJPerKgK: number } {
  if (bubbleAtZero.kind !== "bubble" || Math.abs(bubbleAtZero.T - 273.15) > 1e-9) {
    throw new Error("applyBlendIirReference requires the bubble point at 273.15 K");
  }
  const M = blend.molarMass;
  blend.model.enthalpyOffset = 0;
  blend.model.entropyOffset = 0;
  const liquid = blend.model.caloric(bubbleAtZero.T, bubbleAtZero.bulkDensity, blend.moleFractions);
  blend.model.enthalpyOffset = 200_000 * M - liquid.h;
  blend.model.entropyOffset = 1_000 * M - liquid.s;
  return {
    enthalpyShiftKJPerKg: blend.model.enthalpyOffset / M / 1000,
    entropyShiftKJPerKgK: blend.model.entropyOffset / M / 1000,
  };
}
