import { importRefrigerantTable } from "./import-refrigerant-table.ts";
import { REFRIGERANT_IDS } from "./resolve-refrigerant.ts";

/**
 * Loads every saturation table (31 refrigerants, ≈ 1 MB of JSON): for the server and the tests,
 * which must judge any refrigerant synchronously, never for a screen (it loads its own with
 * `loadRefrigerant`). Each table is checked against its schema on its first lookup.
 *
 * @returns a promise resolved once every table is registered
 * @throws PropertyRangeError INVALID_TABLE (rejected promise) when a file fails its schema
 * @example await loadAllRefrigerants(); listRefrigerants().length // 31
 */
export async function loadAllRefrigerants(): Promise<void> {
  await Promise.all(REFRIGERANT_IDS.map((id) => importRefrigerantTable(id)));
}
