import { interpolatePhaseGrid } from "./interpolate-phase-grid.ts";
import type { PhaseGridRows } from "./phase-grid-rows.ts";
import type { CompiledPhaseGrid, SinglePhase } from "./single-phase-registry.ts";

/** A superheated-vapour or subcooled-liquid state, IIR reference (h = 200 kJ/kg, s = 1 kJ/(kg·K) for saturated liquid at 0 °C). */
export interface SinglePhaseState {
  phase: SinglePhase;
  /** kPa absolute */
  pressureKPa: number;
  /** °C */
  temperatureC: number;
  /** kJ/kg */
  enthalpyKJPerKg: number;
  /** kJ/(kg·K) */
  entropyKJPerKgK: number;
  /** kg/m³ */
  densityKgPerM3: number;
}

/**
 * The single-phase state of one grid at a pressure and reduced temperature: the values of
 * interpolatePhaseGrid turned into the public SinglePhaseState (°C, kPa absolute, kJ/kg,
 * kJ/(kg·K), kg/m³).
 *
 * @param grid compiled phase grid
 * @param rows window and weights from phaseGridRows at the pressure
 * @param pressureKPa kPa absolute
 * @param saturationC saturation temperature at the pressure (dew for vapour, bubble for liquid), °C
 * @param reduced r in [0, 1]
 * @returns the state
 * @throws never
 * @example phaseGridState(r32.vapour, phaseGridRows(r32.vapour, 1000), 1000, 6.62, 0.1).phase // "vapour"
 */
export function phaseGridState(
  grid: CompiledPhaseGrid,
  rows: PhaseGridRows,
  pressureKPa: number,
  saturationC: number,
  reduced: number,
): SinglePhaseState {
  const values = interpolatePhaseGrid(grid, rows, reduced);
  return {
    phase: grid.phase,
    pressureKPa,
    temperatureC: saturationC + reduced * (grid.boundC - saturationC),
    enthalpyKJPerKg: values.enthalpy,
    entropyKJPerKgK: values.entropy,
    densityKgPerM3: Math.exp(values.logDensity),
  };
}
