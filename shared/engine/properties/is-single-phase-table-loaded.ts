import { SINGLE_PHASE_TABLES } from "./single-phase-registry.ts";

/**
 * Whether a refrigerant's single-phase table has been registered, so that singlePhaseState
 * and measuredCycle can run synchronously.
 *
 * @param id ASHRAE designation, e.g. "R410A"
 * @returns true once registerSinglePhaseTable has accepted its table
 * @throws never
 * @example isSinglePhaseTableLoaded("R410A") // false until its table is loaded
 */
export function isSinglePhaseTableLoaded(id: string): boolean {
  return SINGLE_PHASE_TABLES.has(id);
}
