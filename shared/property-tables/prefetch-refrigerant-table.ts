import { SATURATION_TABLE_IMPORTS } from "../engine/properties/saturation-table-imports.ts";

/**
 * Starts downloading one refrigerant's saturation table without the engine: the first screen
 * learns its refrigerant (from the visit) before the engine's script has arrived on a slow link,
 * and the table need not wait for it. `loadRefrigerant` later imports the same module, which
 * the browser then already holds, and registers it; that stays the only way a table reaches the
 * engine. An id without a table does nothing; a failed download is left for `loadRefrigerant`
 * to report.
 *
 * @param id ASHRAE designation, e.g. "R410A"
 * @example prefetchRefrigerantTable("R32"); … await loadRefrigerant("R32") // no second download
 */
export function prefetchRefrigerantTable(id: string): void {
  // Own keys only: an id such as "toString" has no table.
  const load = Object.hasOwn(SATURATION_TABLE_IMPORTS, id) ? SATURATION_TABLE_IMPORTS[id] : undefined;
  load?.().catch(() => undefined);
}
