/**
 * Direct equation-of-state solve of one homogeneous (single-phase) state at a given
 * temperature and pressure, for every refrigerant Satura has tables for: the
 * "reference" the single-phase tables are generated from and checked against.
 *
 * - Pure fluids: the Helmholtz EOS of the fluid file; the density at (T, p) on the liquid or
 *   vapour branch (`densityFromPressure`), then h, s from α (reference README §3.1); the
 *   saturation temperature at p by inverting the superancillary p_sat(T) (README §4.3), which
 *   agrees with the EOS's own phase equilibrium to about 1e-12.
 * - Pseudo-pure blends (R410A, R404A, R407C, R507A): the same with the pseudo-pure EOS of
 *   Lemmon (2003); bubble and dew temperatures at p by inverting that paper's pL and pV equations.
 * - Multi-fluid blends: the mixture model at the nominal composition (scripts/eos/mixture);
 *   bubble and dew temperatures at p from the equal-fugacity solve.
 *
 * h and s are on the IIR reference (h = 200 kJ/kg, s = 1 kJ/(kg·K) for saturated liquid at
 * 0 °C, bubble point for blends), exactly as the saturation tables.
 * Generation time, tests and benchmarks only; never bundled into the app.
 */
import {
  applyIirReference,
  createFluidModel,
  listReferenceDesignations,
  readReferenceFluid,
  saturationTemperatureAt,
  type FluidModel,
} from "../eos/index.ts";
import {
  applyBlendIirReference,
  blendPointAtPressure,
  createBlendModel,
  readBinaryPairs,
  readBlends,
  readDepartureFunctions,
  traceSaturationCurve,
  type BlendModel,
  type EnvelopePoint,
} from "../eos/mixture/index.ts";

export type SinglePhase = "liquid" | "vapour";
export type SaturationKind = "bubble" | "dew";

/** One homogeneous state in mass units: J/kg, J/(kg·K), kg/m³. */
export interface SinglePhaseEosState {
  enthalpy: number;
  entropy: number;
  density: number;
}

export interface SinglePhaseSolver {
  readonly designation: string;
  readonly model: "pure-fluid" | "pseudo-pure" | "multi-fluid";
  /** kg/mol */
  readonly molarMass: number;
  /** lowest temperature of the EOS (triple point, 200 K pseudo-pure limit, highest component triple point), K */
  readonly minimumTemperature: number;
  /** highest temperature the EOS is stated valid to (`EOS[0].T_max`; lowest of the components for a mixture), K */
  readonly maximumTemperature: number;
  /** end of the saturation curve (critical point, or the pseudo-pure T_r), K */
  readonly criticalTemperature: number;
  /** BibTeX keys of the equations used */
  readonly bibtexKeys: readonly string[];
  /** Saturation pressure (bubble or dew) at T, Pa. */
  saturationPressure(T: number, kind: SaturationKind): number;
  /** Saturation temperature (bubble or dew) at p, K. */
  saturationTemperature(p: number, kind: SaturationKind): number;
  /** Homogeneous state at (T, p) on the given branch; throws if that branch has no root. */
  state(T: number, p: number, phase: SinglePhase): SinglePhaseEosState;
}

const CELSIUS = 273.15;

function pureSolver(designation: string): SinglePhaseSolver {
  const model: FluidModel = createFluidModel(readReferenceFluid(designation));
  applyIirReference(model);
  const { eos } = model;
  const M = eos.molarMass;
  const file = model.file.EOS[0];
  const R = eos.gasConstant;
  const sa = model.superancillary;
  const saturationPressure = (T: number, kind: SaturationKind) =>
    sa ? sa.pressure(T) : (kind === "bubble" ? model.bubblePressureCurve : model.dewPressureCurve).value(T);
  const saturationTemperature = (p: number, kind: SaturationKind): number => {
    if (!sa) return saturationTemperatureAt(model, p, kind);
    // Newton on ln p_sat(T) of the superancillary, safeguarded by bisection.
    let low = sa.minimumTemperature;
    let high = sa.criticalTemperature;
    let T = 0.5 * (low + high);
    for (let iteration = 0; iteration < 100; iteration++) {
      const f = Math.log(sa.pressure(T) / p);
      if (f > 0) high = T;
      else low = T;
      const dT = 1e-4;
      const slope =
        (Math.log(sa.pressure(Math.min(T + dT, sa.criticalTemperature))) - Math.log(sa.pressure(T - dT))) / (2 * dT);
      let next = T - f / slope;
      if (!(next > low && next < high)) next = 0.5 * (low + high);
      if (Math.abs(next - T) < 1e-11) return next;
      T = next;
    }
    throw new Error(`${designation}: saturation temperature at ${p} Pa did not converge`);
  };
  return {
    designation,
    model: model.kind === "pure" ? "pure-fluid" : "pseudo-pure",
    molarMass: M,
    minimumTemperature: model.minimumTemperature,
    maximumTemperature: file.T_max,
    criticalTemperature: model.criticalTemperature,
    bibtexKeys: [file.BibTeX_EOS, ...(file.BibTeX_CP0 && file.BibTeX_CP0 !== file.BibTeX_EOS ? [file.BibTeX_CP0] : [])],
    saturationPressure,
    saturationTemperature,
    state(T, p, phase) {
      let guess: number;
      if (phase === "vapour") guess = p / (R * T);
      else {
        // the saturated liquid at T (or at the highest temperature of the curve) is a density
        // at or below the compressed liquid's
        const Tl = Math.min(T, model.criticalTemperature - 0.5);
        guess = sa ? sa.liquidDensity(Math.max(Tl, sa.minimumTemperature)) : model.liquidDensityCurve.value(Tl);
      }
      const rho = eos.densityFromPressure(T, p, guess, phase);
      const state = eos.state(T, rho);
      return { enthalpy: state.h / M, entropy: state.s / M, density: rho * M };
    },
  };
}

function blendSolver(blend: BlendModel): SinglePhaseSolver {
  const z = blend.moleFractions;
  const M = blend.molarMass;
  // Trace both curves on a 1 K grid: starting points for the bubble/dew solves at a pressure,
  // and the 0 °C bubble point for the IIR reference (as the saturation tables).
  const grid: number[] = [blend.minimumTemperature];
  for (let T = Math.floor(blend.minimumTemperature) + 1; T < 500; T += 1) grid.push(T);
  if (!grid.includes(CELSIUS)) grid.push(CELSIUS);
  grid.sort((a, b) => a - b);
  const curves: Record<SaturationKind, EnvelopePoint[]> = {
    bubble: traceSaturationCurve(blend, "bubble", grid),
    dew: traceSaturationCurve(blend, "dew", grid),
  };
  const zero = curves.bubble.find((point) => Math.abs(point.T - CELSIUS) < 1e-9);
  if (!zero) throw new Error(`${blend.designation}: no bubble point at 0 °C`);
  applyBlendIirReference(blend, zero);
  const last = Math.min(curves.bubble.at(-1)!.T, curves.dew.at(-1)!.T);
  const files = blend.record.components.map((c) => readReferenceFluid(c));
  const saturationCache = new Map<string, number>();
  return {
    designation: blend.designation,
    model: "multi-fluid",
    molarMass: M,
    minimumTemperature: blend.minimumTemperature,
    maximumTemperature: Math.min(...files.map((file) => file.EOS[0].T_max)),
    criticalTemperature: last,
    bibtexKeys: [
      ...new Set([...files.map((file) => file.EOS[0].BibTeX_EOS), ...blend.pairs.map((pair) => pair.bibtex)]),
    ],
    saturationPressure(T, kind) {
      // continue from the traced points just below T (continuation runs upward in T)
      const below = curves[kind].filter((point) => point.T < T - 1e-9).slice(-2);
      const solved = traceSaturationCurve(blend, kind, [T], below).at(0);
      if (!solved) throw new Error(`${blend.designation}: no ${kind} point at ${T} K`);
      return solved.p;
    },
    saturationTemperature(p, kind) {
      // the generator asks for the same pressures many times (every column of a row)
      const key = `${kind} ${p}`;
      let T = saturationCache.get(key);
      if (T === undefined) {
        T = blendPointAtPressure(blend, kind, p, curves[kind]).T;
        saturationCache.set(key, T);
      }
      return T;
    },
    state(T, p, phase) {
      const rho = blend.model.density(T, p, z, phase);
      const { h, s } = blend.model.caloric(T, rho, z);
      return { enthalpy: h / M, entropy: s / M, density: rho * M };
    },
  };
}

let blendRecords: ReturnType<typeof readBlends> | null = null;

/**
 * @param designation a refrigerant with a saturation table: a pure or pseudo-pure fluid file of
 *   the reference pack, or a blend of blends.tsv modelled with the mixture model
 * @returns its direct single-phase solver on the IIR reference
 * @throws Error when the pack has neither a fluid file nor a blend of that name
 * @example createSinglePhaseSolver("R32").state(323.15, 1e6, "vapour").enthalpy // ≈ 537 kJ/kg × 1000
 */
export function createSinglePhaseSolver(designation: string): SinglePhaseSolver {
  if (listReferenceDesignations().includes(designation)) return pureSolver(designation);
  blendRecords ??= readBlends();
  const record = blendRecords.find((blend) => blend.designation === designation);
  if (!record) throw new Error(`${designation}: neither a fluid file nor a blend in the reference pack`);
  return blendSolver(createBlendModel(record, readBinaryPairs(), readDepartureFunctions()));
}
