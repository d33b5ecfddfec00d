import {
  isKnownRefrigerantId,
  isRefrigerantTableLoaded,
  registerRefrigerantTable,
  unknownRefrigerantError,
} from "./resolve-refrigerant.ts";
import { SATURATION_TABLE_IMPORTS } from "./saturation-table-imports.ts";

const pending = new Map<string, Promise<void>>();

/**
 * Imports one refrigerant's saturation table and registers it (unchecked until its first lookup),
 * once: concurrent calls share one import, and a registered table is not imported again.
 *
 * @param id ASHRAE designation, e.g. "R410A"
 * @returns a promise resolved once the table is registered
 * @throws PropertyRangeError UNKNOWN_REFRIGERANT (rejected promise) for an id without a table
 * @example await importRefrigerantTable("R32")
 */
export function importRefrigerantTable(id: string): Promise<void> {
  if (isRefrigerantTableLoaded(id)) return Promise.resolve();
  const inFlight = pending.get(id);
  if (inFlight) return inFlight;
  const load = isKnownRefrigerantId(id) ? SATURATION_TABLE_IMPORTS[id] : undefined;
  if (!load) return Promise.reject(unknownRefrigerantError(id));
  const loading = load()
    .then((module) => {
      registerRefrigerantTable(module.default);
    })
    .finally(() => pending.delete(id));
  pending.set(id, loading);
  return loading;
}
