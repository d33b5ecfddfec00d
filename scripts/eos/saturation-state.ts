/**
 * Saturated liquid and vapour at one temperature, from the equation of state.
 *
 * Pure fluids: phase equilibrium (equal p and g, README §4.1) started from the
 * superancillary (default) or the density ancillaries; every solved point can be
 * checked against the superancillary (`checkTolerance`).
 * Pseudo-pure blends: bubble pressure from the published pL equation, dew pressure
 * from pV (Lemmon 2003); ρ' at (T, p_bubble) on the liquid branch, ρ'' at
 * (T, p_dew) on the vapour branch (README §5.3). No equal-Gibbs construction.
 */
import type { FluidModel } from "./fluid-model.ts";
import { solvePhaseEquilibrium } from "./phase-equilibrium.ts";

export interface SaturationState {
  /** K */
  T: number;
  /** Pa */
  bubblePressure: number;
  /** Pa */
  dewPressure: number;
  /** dp/dT along the bubble and dew curves, Pa/K */
  bubbleSlope: number;
  dewSlope: number;
  /** mol/m³ */
  liquidDensity: number;
  vapourDensity: number;
  /** J/mol */
  liquidEnthalpy: number;
  vapourEnthalpy: number;
  /** J/(mol·K) */
  liquidEntropy: number;
  vapourEntropy: number;
}

export interface SaturationOptions {
  /** Starting guess for pure fluids: the superancillary (fast, default) or the ancillaries (a "cold" solve). */
  guess?: "superancillary" | "ancillary";
  /** Explicit starting densities (mol/m³) for pure fluids, e.g. continued from a neighbouring temperature; overrides `guess`. */
  startingDensities?: { liquid: number; vapour: number };
  /** If set, throw when p, ρ' or ρ'' differ from the superancillary by more than this relative amount. */
  checkTolerance?: number;
}

export class SuperancillaryMismatchError extends Error {}

/**
 * @param model fluid model from createFluidModel
 * @param T temperature in K, from model.minimumTemperature to just below model.criticalTemperature
 * @returns both saturated phases with Clausius–Clapeyron slopes (pure) or the analytic pL/pV slopes (blends)
 * @throws SuperancillaryMismatchError when `checkTolerance` is exceeded; Error when a solve fails
 * @example saturationStateAt(createFluidModel(readReferenceFluid("R32")), 273.15).dewPressure // ≈ 813101 Pa
 */
export function saturationStateAt(model: FluidModel, T: number, options: SaturationOptions = {}): SaturationState {
  const { eos } = model;
  if (model.kind === "pure") {
    const sa = model.superancillary!;
    const useSa = (options.guess ?? "superancillary") === "superancillary";
    const liquidGuess =
      options.startingDensities?.liquid ?? (useSa ? sa.liquidDensity(T) : model.liquidDensityCurve.value(T));
    const vapourGuess =
      options.startingDensities?.vapour ?? (useSa ? sa.vapourDensity(T) : model.vapourDensityCurve.value(T));
    const solved = solvePhaseEquilibrium(eos, T, liquidGuess, vapourGuess);
    if (options.checkTolerance !== undefined) {
      const checks: Array<[string, number, number]> = [
        ["p", solved.pressure, sa.pressure(T)],
        ["rho'", solved.liquidDensity, sa.liquidDensity(T)],
        ["rho''", solved.vapourDensity, sa.vapourDensity(T)],
      ];
      for (const [name, value, expected] of checks) {
        const relative = Math.abs(value / expected - 1);
        if (!(relative <= options.checkTolerance)) {
          throw new SuperancillaryMismatchError(
            `${model.designation} at ${T} K: ${name} = ${value} differs from the superancillary ${expected} by ${relative.toExponential(2)} (limit ${options.checkTolerance})`,
          );
        }
      }
    }
    const liquid = eos.state(T, solved.liquidDensity);
    const vapour = eos.state(T, solved.vapourDensity);
    // Clausius–Clapeyron, exact at the EOS equilibrium: dp/dT = Δs / Δv
    const slope = (vapour.s - liquid.s) / (1 / solved.vapourDensity - 1 / solved.liquidDensity);
    return {
      T,
      bubblePressure: solved.pressure,
      dewPressure: solved.pressure,
      bubbleSlope: slope,
      dewSlope: slope,
      liquidDensity: solved.liquidDensity,
      vapourDensity: solved.vapourDensity,
      liquidEnthalpy: liquid.h,
      vapourEnthalpy: vapour.h,
      liquidEntropy: liquid.s,
      vapourEntropy: vapour.s,
    };
  }
  const bubblePressure = model.bubblePressureCurve.value(T);
  const dewPressure = model.dewPressureCurve.value(T);
  const liquidDensity = eos.densityFromPressure(T, bubblePressure, model.liquidDensityCurve.value(T));
  const vapourDensity = eos.densityFromPressure(T, dewPressure, model.vapourDensityCurve.value(T));
  if (!(liquidDensity > vapourDensity)) {
    throw new Error(
      `${model.designation} at ${T} K: liquid and vapour density solves met (${liquidDensity}, ${vapourDensity})`,
    );
  }
  const liquid = eos.state(T, liquidDensity);
  const vapour = eos.state(T, vapourDensity);
  return {
    T,
    bubblePressure,
    dewPressure,
    bubbleSlope: model.bubblePressureCurve.derivative(T),
    dewSlope: model.dewPressureCurve.derivative(T),
    liquidDensity,
    vapourDensity,
    liquidEnthalpy: liquid.h,
    vapourEnthalpy: vapour.h,
    liquidEntropy: liquid.s,
    vapourEntropy: vapour.s,
  };
}

/**
 * Saturation temperature at a given pressure straight from the EOS (no table):
 * Newton on ln p(T) with the Clausius–Clapeyron slope, each step a full phase
 * equilibrium solve started from the ancillaries (pure), or Newton on the pL/pV
 * equation (blends). This is the "direct solve" the benchmark compares against.
 *
 * @param model fluid model
 * @param pressure Pa, between the saturation pressures at the ends of the curve
 * @param point "bubble" or "dew" (the same for pure fluids)
 * @returns temperature in K
 * @throws Error when it does not converge
 * @example saturationTemperatureAt(model, 813101, "dew") // ≈ 273.15 K for R32
 */
export function saturationTemperatureAt(model: FluidModel, pressure: number, point: "bubble" | "dew" = "dew"): number {
  const curve = point === "bubble" ? model.bubblePressureCurve : model.dewPressureCurve;
  // Starting guess: straight line in ln p vs 1/T between 0.7 Tc and 0.95 Tc of the ancillary
  const T1 = 0.7 * model.criticalTemperature;
  const T2 = 0.95 * model.criticalTemperature;
  const slope = (Math.log(curve.value(T2)) - Math.log(curve.value(T1))) / (1 / T2 - 1 / T1);
  let T = 1 / (1 / T1 + (Math.log(pressure) - Math.log(curve.value(T1))) / slope);
  T = Math.min(Math.max(T, model.minimumTemperature), model.criticalTemperature - 1e-3);
  for (let iteration = 0; iteration < 50; iteration++) {
    let p: number;
    let dpdT: number;
    if (model.kind === "pure") {
      const state = saturationStateAt(model, T, { guess: "ancillary" });
      p = state.dewPressure;
      dpdT = state.dewSlope;
    } else {
      p = curve.value(T);
      dpdT = curve.derivative(T);
    }
    const step = (Math.log(p / pressure) * p) / dpdT;
    T -= Math.max(-10, Math.min(10, step));
    T = Math.min(Math.max(T, model.minimumTemperature), model.criticalTemperature - 1e-4);
    if (Math.abs(step) < 1e-10 * T) return T;
  }
  throw new Error(`${model.designation}: saturation temperature at ${pressure} Pa did not converge`);
}
