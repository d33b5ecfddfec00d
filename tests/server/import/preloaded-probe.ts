/**
 * A module preloaded into the server's process with `node --import`, written in TypeScript like
 * bench/api/memory-probe.ts: a worker thread that inherited the preload could not load it
 * (tsx is not registered there yet). Used by csv-import-pool.test.ts.
 */
const marker: string = "preloaded";
(globalThis as Record<string, unknown>).preloadedProbe = marker;
