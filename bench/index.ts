/**
 * `npm run bench`: runs every bench module in turn. Add a module with one import line.
 */
import "./properties.bench.ts";
import "./single-phase.bench.ts";
import "./diagnose.bench.ts";
import "./trend.bench.ts";
import "./procedures.bench.ts";
import "./import.bench.ts";
import { runRegisteredBenches } from "./bench-registry.ts";
import { loadAllRefrigerants } from "../shared/engine/index.ts";

// The benches look up any refrigerant synchronously, as the server does after loading them all.
await loadAllRefrigerants();
await runRegisteredBenches();
