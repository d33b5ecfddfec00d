/**
 * Where the service worker keeps the refrigerant tables (vite.config.ts, `installableApp`): the
 * chunk files named by the build (`refrigerant-R32-[hash].js`, `single-phase-R32-[hash].js`)
 * and the cache that holds them. Shared by the build and the page that warms the cache.
 */
export const TABLE_CACHE = "satura-refrigerant-tables";
export const TABLE_URL = /\/assets\/(refrigerant|single-phase)-[^/]+\.js$/;
