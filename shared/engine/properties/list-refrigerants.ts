/**
 * Metadata of every refrigerant with a table, ordered by designation number
 * (R12, R22, R32, R123, R134a, …, R1234ze(E)).
 *
 * @returns array of frozen metadata objects, each with `id` (its designation)
 * @throws PropertyRangeError INVALID_TABLE if a generated table fails its schema
 * @example listRefrigerants().length // 20
 */
import { REFRIGERANT_IDS, resolveRefrigerant, type RefrigerantInfo } from "./resolve-refrigerant.ts";

const byDesignation = (a: string, b: string) => a.localeCompare(b, "en", { numeric: true });

export function listRefrigerants(): RefrigerantInfo[] {
  return [...REFRIGERANT_IDS].sort(byDesignation).map((id) => resolveRefrigerant(id).info);
}
