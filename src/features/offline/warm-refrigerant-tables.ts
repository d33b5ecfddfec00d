import { SATURATION_TABLE_IMPORTS } from "@shared/engine/properties/saturation-table-imports.ts";
import { SINGLE_PHASE_TABLE_IMPORTS } from "@shared/property-tables/single-phase-table-imports.ts";
import { TABLE_CACHE, TABLE_URL } from "./table-cache.ts";

/**
 * Puts the saturation and single-phase tables of each refrigerant into the service worker's
 * table cache before the technician loses the signal.
 *
 * A table goes through the worker only on a page the worker controls, and a module the page has
 * already imported is never fetched again; on the first visit neither holds. So each table is
 * imported (fetched from the network or the worker), and then every table file this page has
 * loaded is added to the cache by its URL, which the browser's own cache answers (the files are
 * immutable). A failed fetch is skipped, to be tried at the next start.
 *
 * @returns the number of table files now in the cache
 */
export async function warmRefrigerantTables(ids: readonly string[]): Promise<number> {
  for (const id of ids) {
    for (const imports of [SATURATION_TABLE_IMPORTS, SINGLE_PHASE_TABLE_IMPORTS]) {
      if (!Object.hasOwn(imports, id)) continue;
      await imports[id]!().catch(() => undefined);
    }
  }
  if (!("caches" in window)) return 0;
  const cache = await caches.open(TABLE_CACHE);
  const loaded = new Set(
    performance
      .getEntriesByType("resource")
      .map((entry) => entry.name)
      .filter((url) => TABLE_URL.test(new URL(url).pathname)),
  );
  for (const url of loaded) {
    if (await cache.match(url)) continue;
    await cache.add(url).catch(() => undefined);
  }
  return (await cache.keys()).length;
}
