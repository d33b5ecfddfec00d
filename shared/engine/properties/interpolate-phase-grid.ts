import { findInterval } from "./find-interval.ts";
import type { PhaseGridRows } from "./phase-grid-rows.ts";
import type { CompiledPhaseGrid } from "./single-phase-registry.ts";

export interface PhaseGridValues {
  enthalpy: number;
  entropy: number;
  logDensity: number;
}

/**
 * Enthalpy, entropy and ln density of one phase at (ln p, r) from its single-phase grid:
 * cubic Hermite in the reduced temperature r along each of the four nearest rows (exact
 * (∂/∂T)_p derivatives from the equation of state stored at every node), combined by cubic
 * Lagrange weights in the row coordinate (≈ ln p). Error: measured by the generator at off-grid points and stored in
 * the table's `accuracy` (docs/properties.md, "Single-phase tables").
 * Source: cubic Hermite spline, https://en.wikipedia.org/wiki/Cubic_Hermite_spline.
 *
 * @param grid compiled phase grid
 * @param rows window and weights from phaseGridRows at the query pressure
 * @param reduced r in [0, 1] (0 on the saturation curve, 1 at the far temperature bound)
 * @returns h in kJ/kg, s in kJ/(kg·K), ln(ρ / (kg/m³))
 * @throws never (the caller checks the ranges)
 * @example interpolatePhaseGrid(r32.vapour, phaseGridRows(r32.vapour, 1000), 0.2).enthalpy // ≈ 552.30 (kJ/kg, R32 at 1000 kPa, 43.2 °C)
 */
export function interpolatePhaseGrid(grid: CompiledPhaseGrid, rows: PhaseGridRows, reduced: number): PhaseGridValues {
  const { nodes, columns } = grid;
  const j = findInterval(nodes, reduced);
  // Hot path, no checks: findInterval returns j ≤ nodes.length − 2, so j and j + 1 are nodes.
  const width = nodes[j + 1]! - nodes[j]!;
  const t = (reduced - nodes[j]!) / width;
  const t2 = t * t;
  const t3 = t2 * t;
  // Hermite basis: value at j, slope at j, value at j+1, slope at j+1 (slopes per unit r)
  const h00 = 2 * t3 - 3 * t2 + 1;
  const h10 = (t3 - 2 * t2 + t) * width;
  const h01 = -2 * t3 + 3 * t2;
  const h11 = (t3 - t2) * width;
  let enthalpy = 0;
  let entropy = 0;
  let logDensity = 0;
  // Rows start … start + 3 are in the grid (phaseGridRows keeps start ≤ rows − 4) and j + 1 < columns.
  for (let m = 0; m < 4; m++) {
    const w = rows.weights[m]!;
    const k = (rows.start + m) * columns + j;
    enthalpy +=
      w *
      (h00 * grid.enthalpy[k]! +
        h10 * grid.enthalpyByR[k]! +
        h01 * grid.enthalpy[k + 1]! +
        h11 * grid.enthalpyByR[k + 1]!);
    entropy +=
      w *
      (h00 * grid.entropy[k]! + h10 * grid.entropyByR[k]! + h01 * grid.entropy[k + 1]! + h11 * grid.entropyByR[k + 1]!);
    logDensity +=
      w *
      (h00 * grid.logDensity[k]! +
        h10 * grid.logDensityByR[k]! +
        h01 * grid.logDensity[k + 1]! +
        h11 * grid.logDensityByR[k + 1]!);
  }
  return { enthalpy, entropy, logDensity };
}
