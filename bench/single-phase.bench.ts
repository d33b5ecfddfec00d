/**
 * Single-phase benchmark: ns per singlePhaseState and singlePhaseStateFromEnthalpy call (table
 * lookups, shared/engine) and µs for the same states solved directly from the equation of state
 * (scripts/single-phase: the density at (T, p) on the right branch, then h, s; for T from
 * (p, h) a secant iteration on T around it), and µs per measuredCycle(). Needs
 * ../shared/reference for the direct solves.
 */
import {
  listRefrigerants,
  measuredCycle,
  saturationTemperature,
  singlePhaseState,
  singlePhaseStateFromEnthalpy,
  STANDARD_ATMOSPHERE_KPA,
} from "../shared/engine/index.ts";
import { loadSinglePhaseTable } from "../shared/property-tables/load-single-phase-table.ts";
import { referencePackExists } from "../scripts/eos/index.ts";
import { createSinglePhaseSolver, type SinglePhaseSolver } from "../scripts/single-phase/index.ts";
import { resolveSinglePhaseTable } from "../shared/engine/properties/resolve-single-phase-table.ts";
import { R410A_FIELD_READING } from "../tests/fixtures/field-reading.ts";
import { nanosecondsPerCall, pseudoRandomSequence, registerBench, reportLookup } from "./bench-registry.ts";

const POINTS = 4096;

interface Point {
  id: string;
  pressureKPa: number;
  temperatureC: number;
  enthalpy: number;
  phase: "liquid" | "vapour";
}

/** Technician states: vapour 0–60 K above its dew point, liquid 0–20 K below its bubble point, −30…55 °C saturation. */
function makePoints(ids: readonly string[], seed: number): Point[] {
  const random = pseudoRandomSequence(seed);
  const points: Point[] = [];
  while (points.length < POINTS) {
    const id = ids[Math.floor(random() * ids.length)]!;
    const vapour = random() < 0.5;
    const table = resolveSinglePhaseTable(id);
    const grid = vapour ? table.vapour : table.liquid;
    const pressureKPa =
      grid.minimumPressureKPa * Math.pow(grid.maximumPressureKPa / grid.minimumPressureKPa, 0.15 + 0.6 * random());
    const saturationC = saturationTemperature(id, pressureKPa, vapour ? "dew" : "bubble");
    if (saturationC < -30 || saturationC > 55) continue;
    const temperatureC = vapour ? saturationC + 0.5 + 60 * random() : saturationC - 0.5 - 20 * random();
    if (temperatureC > table.vapour.boundC) continue;
    const state = singlePhaseState(id, pressureKPa, temperatureC);
    points.push({ id, pressureKPa, temperatureC, enthalpy: state.enthalpyKJPerKg, phase: state.phase });
  }
  return points;
}

/** T at (p, h) straight from the EOS: secant on T with a direct (T, p) solve at each step. */
function directTemperature(solver: SinglePhaseSolver, point: Point): number {
  const p = point.pressureKPa * 1000;
  const target = point.enthalpy * 1000;
  let a = point.temperatureC + 273.15 + (point.phase === "vapour" ? 3 : -3);
  let b = a + (point.phase === "vapour" ? 1 : -1);
  let fa = solver.state(a, p, point.phase).enthalpy - target;
  for (let iteration = 0; iteration < 30; iteration++) {
    const fb = solver.state(b, p, point.phase).enthalpy - target;
    const next = b - (fb * (b - a)) / (fb - fa);
    if (Math.abs(next - b) < 1e-7) return next;
    [a, fa, b] = [b, fb, next];
  }
  return b;
}

registerBench("single-phase states and the measured cycle", async () => {
  const all = listRefrigerants();
  await Promise.all(all.map((r) => loadSinglePhaseTable(r.id)));
  const haveEos = referencePackExists();
  if (!haveEos) console.log("(../shared/reference absent: direct EOS solves skipped)");
  for (const [group, ids] of [
    ["pure fluids", all.filter((r) => r.kind === "pure").map((r) => r.id)],
    ["pseudo-pure blends", all.filter((r) => r.source.model === "pseudo-pure").map((r) => r.id)],
    ["multi-fluid blends", all.filter((r) => r.source.model === "multi-fluid").map((r) => r.id)],
  ] as const) {
    const points = makePoints(ids, 11);
    const stateNs = nanosecondsPerCall((i) => {
      const p = points[i & (POINTS - 1)]!;
      return singlePhaseState(p.id, p.pressureKPa, p.temperatureC).enthalpyKJPerKg;
    }, 1_000_000);
    const inverseNs = nanosecondsPerCall((i) => {
      const p = points[i & (POINTS - 1)]!;
      return singlePhaseStateFromEnthalpy(p.id, p.pressureKPa, p.enthalpy).temperatureC;
    }, 500_000);
    let directStateNs: number | undefined;
    let directInverseNs: number | undefined;
    if (haveEos) {
      const solvers = new Map(ids.map((id) => [id, createSinglePhaseSolver(id)]));
      const count = group === "multi-fluid blends" ? 300 : 3000;
      directStateNs = nanosecondsPerCall(
        (i) => {
          const p = points[i % POINTS]!;
          return solvers.get(p.id)!.state(p.temperatureC + 273.15, p.pressureKPa * 1000, p.phase).enthalpy;
        },
        count,
        3,
      );
      directInverseNs = nanosecondsPerCall(
        (i) => directTemperature(solvers.get(points[i % POINTS]!.id)!, points[i % POINTS]!),
        count / 10,
        3,
      );
    }
    reportLookup(`singlePhaseState, ${group}`, stateNs, directStateNs, 48);
    reportLookup(`singlePhaseStateFromEnthalpy, ${group}`, inverseNs, directInverseNs, 48);
  }
  const input = { ...R410A_FIELD_READING, atmosphericPressureKPa: STANDARD_ATMOSPHERE_KPA };
  const cycleNs = nanosecondsPerCall(
    (i) => measuredCycle({ ...input, suctionLineTempC: 10 + (i & 7) }).refrigeratingEffectKJPerKg ?? 0,
    50_000,
  );
  const withAirNs = nanosecondsPerCall(
    (i) =>
      measuredCycle(
        { ...input, suctionLineTempC: 10 + (i & 7) },
        { voltageV: 230, phases: 1, powerFactor: 0.9, airflowM3PerS: 0.45, supplyAirWetBulbC: 13 },
      ).capacityKW ?? 0,
    20_000,
  );
  console.log(`${"measuredCycle (R410A reading)".padEnd(48)} ${(cycleNs / 1000).toFixed(1).padStart(6)} µs per call`);
  console.log(
    `${"measuredCycle with electrical and air side".padEnd(48)} ${(withAirNs / 1000).toFixed(1).padStart(6)} µs per call`,
  );
  console.log(
    "(direct EOS = density at (T, p) on the liquid or vapour branch of the refrigerant's own equation of state, then h and s;",
  );
  console.log(" from enthalpy = a secant iteration on T around it; multi-fluid blends solve the mixture model)");
});
