/**
 * `npm run bench`: runs every bench module in turn. Add a module with one import line.
 * Every saturation table is loaded first (some benches build their inputs when imported), as the
 * server loads them all at start; so the modules are imported after it.
 */
import { loadAllRefrigerants } from "../shared/engine/index.ts";

await loadAllRefrigerants();
await import("./properties.bench.ts");
await import("./single-phase.bench.ts");
await import("./diagnose.bench.ts");
await import("./trend.bench.ts");
await import("./procedures.bench.ts");
await import("./import.bench.ts");
await import("./visit-poll.bench.ts");
const { runRegisteredBenches } = await import("./bench-registry.ts");

await runRegisteredBenches();
