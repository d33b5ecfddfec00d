/**
 * Single-phase tables (superheated vapour, subcooled liquid): the direct solver on every
 * refrigerant's equation of state and the table builder with its error check. Generation time,
 * tests and benchmarks only; never bundled.
 */
export { createSinglePhaseSolver } from "./single-phase-solver.ts";
export type { SinglePhaseEosState, SinglePhaseSolver, SaturationKind } from "./single-phase-solver.ts";
export {
  buildSinglePhaseTable,
  CRITICAL_GAP_K,
  GRID_CANDIDATES,
  HIGHEST_VAPOUR_C,
} from "./build-single-phase-table.ts";
export type { GridSpacing, PhaseErrors, SinglePhaseBuild } from "./build-single-phase-table.ts";
