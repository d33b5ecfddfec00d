/**
 * One refrigerant's single-phase table (data/refrigerants/single-phase/<id>.json) from its
 * direct equation-of-state solver, and the proof of its interpolation error.
 *
 * Each phase is a grid: rows uniform in y = ln(p / (1 − p/p_s)) — ln p at low pressure, closer
 * together towards the critical point, where the saturated states bend fastest (p_s: the
 * critical pressure) — from the saturation pressure at the saturation table's lowest
 * temperature to the saturation pressure CRITICAL_GAP_K below the critical point; columns at reduced temperatures r_j = (j/N)^k between the saturation curve (r = 0)
 * and the phase's far bound (r = 1: the highest vapour temperature, the lowest liquid
 * temperature), denser next to saturation where c_p changes fastest. At every node the EOS
 * gives h, s, ln ρ and, by a five-point central difference in T at constant p, (∂h/∂T)_p and
 * (∂ln ρ/∂T)_p.
 *
 * The table is then registered with the engine and checked by the engine's own lookups at
 * off-grid points: the middle of every node interval on every row, every node on the middle
 * of every row interval, and the centre of every cell — h, s and ρ at (p, T), and T back from
 * (p, h) and (p, s), all against the direct solve. A phase whose error exceeds the budget is
 * rebuilt with a finer grid; the build fails if the finest grid still misses it.
 */
import {
  registerSinglePhaseTable,
  singlePhaseState,
  singlePhaseStateFromEnthalpy,
  singlePhaseStateFromEntropy,
  type RefrigerantTable,
  type SinglePhaseTable,
} from "../../shared/engine/index.ts";
import { INTERPOLATION_TOLERANCE_K, SINGLE_PHASE_BUDGET } from "../../shared/engine/properties/property-tolerances.ts";
import { SinglePhaseTableSchema } from "../../shared/engine/properties/single-phase-table-schema.ts";
import type { SaturationKind, SinglePhase, SinglePhaseSolver } from "./single-phase-solver.ts";

const KELVIN = 273.15;
/** Tables stop this far below the critical temperature (the saturation table's). */
export const CRITICAL_GAP_K = 5;
/** Highest vapour temperature unless the EOS is stated valid to less, °C. */
export const HIGHEST_VAPOUR_C = 180;
/** Points this close to saturation are not inverted (see checkGrid), K. */
const INVERSION_MARGIN_K = 0.05;
/** Temperature step of the central differences for the node slopes, K. */
const SLOPE_STEP_K = 0.02;

export interface GridSpacing {
  /** row step in y = ln(p / (1 − p/p_s)) */
  coordinateStep: number;
  /** number of node intervals in r */
  intervals: number;
  /** node exponent k: r_j = (j/N)^k */
  exponent: number;
}

/** Grids tried in turn, coarse to fine, until the budget is met. */
export const GRID_CANDIDATES: readonly GridSpacing[] = [
  { coordinateStep: 0.2, intervals: 16, exponent: 2 },
  { coordinateStep: 0.15, intervals: 20, exponent: 2 },
  { coordinateStep: 0.1, intervals: 24, exponent: 2 },
  { coordinateStep: 0.075, intervals: 32, exponent: 2 },
  { coordinateStep: 0.05, intervals: 40, exponent: 2.5 },
];

interface PhaseFrame {
  phase: SinglePhase;
  kind: SaturationKind;
  /** kPa absolute */
  lowestPressureKPa: number;
  highestPressureKPa: number;
  /** °C */
  boundC: number;
  /** p_s of the row coordinate, kPa */
  pressureScaleKPa: number;
}

export interface PhaseErrors {
  enthalpyKJPerKg: Worst;
  entropyKJPerKgK: Worst;
  densityRelative: Worst;
  temperatureFromEnthalpyK: Worst;
  temperatureFromEntropyK: Worst;
  checkedPoints: number;
}

interface Worst {
  value: number;
  phase: SinglePhase;
  pressureKPa: number;
  temperatureC: number;
}

/** Row coordinate y = ln(p / (1 − p/p_s)) and its inverse (p in kPa). */
const coordinateOf = (pressureKPa: number, scale: number) => Math.log(pressureKPa) - Math.log1p(-pressureKPa / scale);
const pressureOf = (coordinate: number, scale: number) => Math.exp(coordinate) / (1 + Math.exp(coordinate) / scale);
const round = (value: number, places: number) => Number(value.toFixed(places));
const significant = (value: number, digits: number) => Number(value.toPrecision(digits));

export function phaseFrames(solver: SinglePhaseSolver, saturation: RefrigerantTable): PhaseFrame[] {
  const { columns } = saturation;
  const last = columns.temperature.length - 1;
  const topK = saturation.criticalPoint.temperatureC + KELVIN - CRITICAL_GAP_K;
  // Both grids stay inside the saturation table, which the lookups use for T_sat(p).
  const ceiling = Math.min(columns.bubblePressure[last]!, columns.dewPressure[last]!);
  // The critical pressure, or more where a blend's bubble curve rises above it (cricondenbar).
  const pressureScaleKPa = Math.max(saturation.criticalPoint.pressureKPa, ceiling * 1.02);
  const highestVapourC = Math.floor(Math.min(HIGHEST_VAPOUR_C, solver.maximumTemperature - KELVIN) * 100) / 100;
  return [
    {
      phase: "vapour",
      kind: "dew",
      lowestPressureKPa: columns.dewPressure[0]! * (1 + 1e-7),
      highestPressureKPa: Math.min(solver.saturationPressure(topK, "dew") / 1000, ceiling),
      boundC: highestVapourC,
      pressureScaleKPa,
    },
    {
      phase: "liquid",
      kind: "bubble",
      lowestPressureKPa: columns.bubblePressure[0]! * (1 + 1e-7),
      highestPressureKPa: Math.min(solver.saturationPressure(topK, "bubble") / 1000, ceiling),
      boundC: saturation.validRange.minimumC,
      pressureScaleKPa,
    },
  ];
}

/** h, s, ln ρ and their T-slopes at constant p from the EOS (kJ/kg, kJ/(kg·K), ln kg/m³, per K). */
function nodeValues(solver: SinglePhaseSolver, T: number, pPa: number, phase: SinglePhase) {
  const at = (temperature: number) => solver.state(temperature, pPa, phase);
  const centre = at(T);
  const d = SLOPE_STEP_K;
  let slopes: { h: number; lnRho: number };
  try {
    const [m2, m1, p1, p2] = [at(T - 2 * d), at(T - d), at(T + d), at(T + 2 * d)];
    const five = (f: (s: typeof centre) => number) => (f(m2) - 8 * f(m1) + 8 * f(p1) - f(p2)) / (12 * d);
    slopes = { h: five((s) => s.enthalpy), lnRho: five((s) => Math.log(s.density)) };
  } catch {
    // a metastable neighbour without a root: one-sided, away from saturation
    const sign = phase === "vapour" ? 1 : -1;
    const [a, b, c, e] = [1, 2, 3, 4].map((k) => at(T + sign * k * d)) as [
      typeof centre,
      typeof centre,
      typeof centre,
      typeof centre,
    ];
    const one = (f: (s: typeof centre) => number) =>
      (sign * (-25 * f(centre) + 48 * f(a) - 36 * f(b) + 16 * f(c) - 3 * f(e))) / (12 * d);
    slopes = { h: one((s) => s.enthalpy), lnRho: one((s) => Math.log(s.density)) };
  }
  return {
    enthalpy: centre.enthalpy / 1000,
    entropy: centre.entropy / 1000,
    logDensity: Math.log(centre.density),
    enthalpySlope: slopes.h / 1000,
    logDensitySlope: slopes.lnRho,
  };
}

export function buildGrid(
  solver: SinglePhaseSolver,
  frame: PhaseFrame,
  spacing: GridSpacing,
): SinglePhaseTable["vapour"] {
  const scale = frame.pressureScaleKPa;
  const start = coordinateOf(frame.lowestPressureKPa, scale);
  const end = coordinateOf(frame.highestPressureKPa, scale);
  const rows = Math.max(4, Math.ceil((end - start) / spacing.coordinateStep) + 1);
  const step = (end - start) / (rows - 1);
  const nodes = Array.from({ length: spacing.intervals + 1 }, (_, j) =>
    j === spacing.intervals ? 1 : Math.pow(j / spacing.intervals, spacing.exponent),
  );
  const grid: SinglePhaseTable["vapour"] = {
    pressureScaleKPa: scale,
    coordinateStart: start,
    coordinateStep: step,
    rows,
    saturationC: [],
    boundC: frame.boundC,
    nodes,
    enthalpy: [],
    enthalpySlope: [],
    entropy: [],
    logDensity: [],
    logDensitySlope: [],
  };
  const boundK = frame.boundC + KELVIN;
  for (let i = 0; i < rows; i++) {
    const pPa = pressureOf(start + i * step, scale) * 1000;
    const saturationK = solver.saturationTemperature(pPa, frame.kind);
    grid.saturationC.push(saturationK - KELVIN);
    for (const r of nodes) {
      const values = nodeValues(solver, saturationK + r * (boundK - saturationK), pPa, frame.phase);
      // Stored precision: rounding adds at most 5e-5 kJ/kg, 5e-7 kJ/(kg·K) and 5e-8 in ln ρ,
      // each a few hundred times below the budget.
      grid.enthalpy.push(round(values.enthalpy, 4));
      grid.enthalpySlope.push(significant(values.enthalpySlope, 6));
      grid.entropy.push(round(values.entropy, 6));
      grid.logDensity.push(round(values.logDensity, 7));
      grid.logDensitySlope.push(significant(values.logDensitySlope, 6));
    }
  }
  return grid;
}

function emptyWorst(phase: SinglePhase): Worst {
  return { value: 0, phase, pressureKPa: 0, temperatureC: 0 };
}

/**
 * Checks one registered phase grid against the EOS at off-grid points with the engine's
 * lookups (see the file comment).
 */
function checkGrid(solver: SinglePhaseSolver, frame: PhaseFrame, grid: SinglePhaseTable["vapour"]): PhaseErrors {
  const errors: PhaseErrors = {
    enthalpyKJPerKg: emptyWorst(frame.phase),
    entropyKJPerKgK: emptyWorst(frame.phase),
    densityRelative: emptyWorst(frame.phase),
    temperatureFromEnthalpyK: emptyWorst(frame.phase),
    temperatureFromEntropyK: emptyWorst(frame.phase),
    checkedPoints: 0,
  };
  const note = (worst: Worst, value: number, pressureKPa: number, temperatureC: number) => {
    if (!(value <= worst.value)) Object.assign(worst, { value, pressureKPa, temperatureC });
  };
  const boundK = frame.boundC + KELVIN;
  const { nodes } = grid;
  const check = (coordinate: number, reduced: number) => {
    const pressureKPa = pressureOf(coordinate, grid.pressureScaleKPa);
    const saturationK = solver.saturationTemperature(pressureKPa * 1000, frame.kind);
    const temperatureK = saturationK + reduced * (boundK - saturationK);
    const temperatureC = temperatureK - KELVIN;
    // The lookups take the phase from the saturation table (within 0.005 K of the EOS): points
    // closer than that to saturation (the liquid's lowest rows, where the grid narrows to a
    // point) may rightly be placed in the other phase or the dome, and are left out.
    if (Math.abs(temperatureK - saturationK) < 2 * INTERPOLATION_TOLERANCE_K) return;
    const exact = solver.state(temperatureK, pressureKPa * 1000, frame.phase);
    const h = exact.enthalpy / 1000;
    const s = exact.entropy / 1000;
    const looked = singlePhaseState(solver.designation, pressureKPa, temperatureC);
    if (looked.phase !== frame.phase)
      throw new Error(`${solver.designation}: ${frame.phase} point looked up as ${looked.phase}`);
    note(errors.enthalpyKJPerKg, Math.abs(looked.enthalpyKJPerKg - h), pressureKPa, temperatureC);
    note(errors.entropyKJPerKgK, Math.abs(looked.entropyKJPerKgK - s), pressureKPa, temperatureC);
    note(errors.densityRelative, Math.abs(looked.densityKgPerM3 / exact.density - 1), pressureKPa, temperatureC);
    // An inversion that lands in the dome (the interpolated saturation value is off by more than
    // the distance to saturation) counts as an infinite error: the grid must be refined.
    const back = (find: () => { temperatureC: number }) => {
      try {
        return Math.abs(find().temperatureC - temperatureC);
      } catch {
        return Infinity;
      }
    };
    // Within a few hundredths of a kelvin of saturation the value differs from the saturated one
    // by less than the promised error, so inverting it may rightly land in the dome: not checked.
    if (Math.abs(temperatureK - saturationK) < INVERSION_MARGIN_K) {
      errors.checkedPoints++;
      return;
    }
    note(
      errors.temperatureFromEnthalpyK,
      back(() => singlePhaseStateFromEnthalpy(solver.designation, pressureKPa, h)),
      pressureKPa,
      temperatureC,
    );
    note(
      errors.temperatureFromEntropyK,
      back(() => singlePhaseStateFromEntropy(solver.designation, pressureKPa, s)),
      pressureKPa,
      temperatureC,
    );
    errors.checkedPoints++;
  };
  // Next to saturation the looked-up dew/bubble point (saturation table, ≤ 0.005 K) decides the
  // phase, so the first checks sit a little inside the phase rather than on its edge.
  const firstInside = nodes[1]! * 0.05;
  for (let i = 0; i < grid.rows; i++) {
    const rowCoordinate = grid.coordinateStart + i * grid.coordinateStep;
    const middleCoordinate = rowCoordinate + 0.5 * grid.coordinateStep;
    for (let j = 0; j + 1 < nodes.length; j++) {
      const middle = 0.5 * (nodes[j]! + nodes[j + 1]!);
      check(rowCoordinate, middle);
      if (i + 1 < grid.rows) {
        check(middleCoordinate, j === 0 ? firstInside : nodes[j]!);
        check(middleCoordinate, middle);
      }
    }
  }
  return errors;
}

function withinBudget(errors: PhaseErrors): boolean {
  return (
    errors.enthalpyKJPerKg.value <= SINGLE_PHASE_BUDGET.enthalpyKJPerKg &&
    errors.entropyKJPerKgK.value <= SINGLE_PHASE_BUDGET.entropyKJPerKgK &&
    errors.densityRelative.value <= SINGLE_PHASE_BUDGET.densityRelative &&
    errors.temperatureFromEnthalpyK.value <= SINGLE_PHASE_BUDGET.temperatureK &&
    errors.temperatureFromEntropyK.value <= SINGLE_PHASE_BUDGET.temperatureK
  );
}

export interface SinglePhaseBuild {
  table: SinglePhaseTable;
  spacing: Record<SinglePhase, GridSpacing>;
  errors: Record<SinglePhase, PhaseErrors>;
}

/**
 * @param solver direct single-phase solver of the refrigerant (IIR reference applied)
 * @param saturation the refrigerant's saturation table (its range, critical point and the
 *   saturation temperatures the engine's lookups use must already be registered: the generator
 *   writes the saturation tables first)
 * @param meta generation date and data provenance note
 * @returns the table (validated), the grid spacing chosen per phase and the measured errors
 * @throws Error when no candidate grid meets SINGLE_PHASE_BUDGET
 */
export function buildSinglePhaseTable(
  solver: SinglePhaseSolver,
  saturation: RefrigerantTable,
  meta: { generated: string; dataNote: string; equationOfState: string; bibtexKeys: string[] },
): SinglePhaseBuild {
  const frames = phaseFrames(solver, saturation);
  const grids = {} as Record<SinglePhase, SinglePhaseTable["vapour"]>;
  const spacing = {} as Record<SinglePhase, GridSpacing>;
  const errors = {} as Record<SinglePhase, PhaseErrors>;
  // Start both phases on the coarsest grid; refine each phase on its own until it fits.
  for (const frame of frames) grids[frame.phase] = buildGrid(solver, frame, GRID_CANDIDATES[0]!);
  const assemble = (accuracy: SinglePhaseTable["accuracy"]): SinglePhaseTable => ({
    format: "satura-single-phase",
    version: 1,
    id: solver.designation,
    generated: meta.generated,
    referenceState: "IIR: h = 200 kJ/kg and s = 1 kJ/(kg·K) for saturated liquid at 0 °C (bubble point for blends)",
    source: {
      model: solver.model,
      equationOfState: meta.equationOfState,
      bibtexKeys: meta.bibtexKeys,
      data: meta.dataNote,
      method: `computed by scripts/build-tables.ts (scripts/single-phase): direct density solve at (T, p) on the liquid or vapour branch at every node, (∂/∂T)_p by five-point central differences; stops ${CRITICAL_GAP_K} K below the critical point`,
    },
    interpolation:
      "rows uniform in y = ln(p / (1 − p/p_s)) (cubic Lagrange over four rows); columns in r = (T − T_sat(p))/(T_bound − T_sat(p)) (cubic Hermite with the stored (∂/∂T)_p slopes; (∂s/∂T)_p = c_p/T)",
    units: {
      pressure: "kPa absolute (rows: ln p)",
      temperature: "°C",
      enthalpy: "kJ/kg (IIR reference)",
      enthalpySlope: "kJ/(kg·K) (c_p)",
      entropy: "kJ/(kg·K) (IIR reference)",
      logDensity: "ln(ρ / (kg/m³))",
      logDensitySlope: "1/K",
    },
    accuracy,
    vapour: grids.vapour,
    liquid: grids.liquid,
  });
  const placeholder: SinglePhaseTable["accuracy"] = {
    checkedPoints: 1,
    enthalpyKJPerKg: emptyWorst("vapour"),
    entropyKJPerKgK: emptyWorst("vapour"),
    densityRelative: emptyWorst("vapour"),
    temperatureFromEnthalpyK: emptyWorst("vapour"),
    temperatureFromEntropyK: emptyWorst("vapour"),
  };
  for (const frame of frames) {
    for (let candidate = 0; ; candidate++) {
      const chosen = GRID_CANDIDATES[candidate]!;
      if (candidate > 0) grids[frame.phase] = buildGrid(solver, frame, chosen);
      registerSinglePhaseTable(assemble(placeholder));
      const measured = checkGrid(solver, frame, grids[frame.phase]);
      if (withinBudget(measured) || candidate === GRID_CANDIDATES.length - 1) {
        if (!withinBudget(measured)) {
          throw new Error(
            `${solver.designation} ${frame.phase}: the finest grid still misses the budget (h ${measured.enthalpyKJPerKg.value.toExponential(2)} kJ/kg, T(p,h) ${measured.temperatureFromEnthalpyK.value.toExponential(2)} K, T(p,s) ${measured.temperatureFromEntropyK.value.toExponential(2)} K, ρ ${measured.densityRelative.value.toExponential(2)})`,
          );
        }
        spacing[frame.phase] = chosen;
        errors[frame.phase] = measured;
        break;
      }
    }
  }
  const worse = (key: Exclude<keyof PhaseErrors, "checkedPoints">, digits: number): Worst => {
    const pick = errors.vapour[key].value >= errors.liquid[key].value ? errors.vapour[key] : errors.liquid[key];
    return {
      value: significant(pick.value, digits),
      phase: pick.phase,
      pressureKPa: significant(pick.pressureKPa, 6),
      temperatureC: round(pick.temperatureC, 3),
    };
  };
  const table = SinglePhaseTableSchema.parse(
    assemble({
      checkedPoints: errors.vapour.checkedPoints + errors.liquid.checkedPoints,
      enthalpyKJPerKg: worse("enthalpyKJPerKg", 2),
      entropyKJPerKgK: worse("entropyKJPerKgK", 2),
      densityRelative: worse("densityRelative", 2),
      temperatureFromEnthalpyK: worse("temperatureFromEnthalpyK", 2),
      temperatureFromEntropyK: worse("temperatureFromEntropyK", 2),
    }),
  );
  registerSinglePhaseTable(table);
  return { table, spacing, errors };
}
