import { PropertyRangeError } from "./property-range-error.ts";
import { resolveRefrigerant } from "./resolve-refrigerant.ts";
import { SINGLE_PHASE_TABLES, type CompiledSinglePhaseTable } from "./single-phase-registry.ts";

/**
 * The registered single-phase table of a refrigerant, or a clear error saying it was not
 * loaded (a program error: load it first, see shared/property-tables/load-single-phase-table.ts).
 *
 * @param id ASHRAE designation as in the table file names, e.g. "R32"
 * @returns the compiled table
 * @throws PropertyRangeError UNKNOWN_REFRIGERANT for an id without a saturation table;
 *   TABLE_NOT_LOADED when the single-phase table has not been registered
 * @example resolveSinglePhaseTable("R32").vapour.rows // 34 (after loading R32)
 */
export function resolveSinglePhaseTable(id: string): CompiledSinglePhaseTable {
  const table = SINGLE_PHASE_TABLES.get(id);
  if (table) return table;
  resolveRefrigerant(id); // unknown ids get the usual message
  throw new PropertyRangeError(
    "TABLE_NOT_LOADED",
    id,
    `The ${id} single-phase table is not loaded yet: load it (loadSinglePhaseTable) before asking for superheated or subcooled states`,
  );
}
