import { REFRIGERANT_IDS, resolveRefrigerant, type RefrigerantInfo } from "./resolve-refrigerant.ts";

const byDesignation = (a: string, b: string) => a.localeCompare(b, "en", { numeric: true });

/**
 * Metadata of every refrigerant with a table, ordered by designation number
 * (R12, R22, R32, R123, R134a, …, R1234ze(E)). Needs every table loaded
 * (`loadAllRefrigerants`, as the server and tests do); a screen that only lists or picks
 * refrigerants reads shared/property-tables/refrigerant-catalogue.ts instead.
 *
 * @returns array of frozen metadata objects, each with `id` (its designation)
 * @throws PropertyRangeError TABLE_NOT_LOADED while any table is not loaded
 * @example (await loadAllRefrigerants(), listRefrigerants().length) // 31
 */
export function listRefrigerants(): RefrigerantInfo[] {
  return [...REFRIGERANT_IDS].sort(byDesignation).map((id) => resolveRefrigerant(id).info);
}
