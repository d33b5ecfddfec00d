/**
 * Property engine benchmark: ns per saturationPressure / saturationTemperature call
 * (table lookups, shared/engine) and the same points solved directly from the
 * equation of state (scripts/eos: phase equilibrium started from the ancillaries,
 * as a program without tables would do; for saturation temperature an outer Newton
 * iteration on T around it). Needs ../shared/reference for the direct solves.
 */
import { listRefrigerants, saturationPressure, saturationTemperature } from "../shared/engine/index.ts";
import {
  createFluidModel,
  readReferenceFluid,
  referencePackExists,
  saturationStateAt,
  saturationTemperatureAt,
  type FluidModel,
} from "../scripts/eos/index.ts";
import {
  coldStart,
  createBlendModel,
  readBinaryPairs,
  readBlends,
  readDepartureFunctions,
  solveEnvelopePoint,
  type BlendModel,
} from "../scripts/eos/mixture/index.ts";
import { nanosecondsPerCall, pseudoRandomSequence, registerBench, reportLookup } from "./bench-registry.ts";

function mixtureBlend(id: string): BlendModel {
  const record = readBlends().find((blend) => blend.designation === id);
  if (!record) throw new Error(`blends.tsv has no ${id}`);
  return createBlendModel(record, readBinaryPairs(), readDepartureFunctions());
}

const POINTS = 4096;

interface Point {
  id: string;
  temperatureC: number;
  pressureKPa: number;
  point: "bubble" | "dew";
}

function makePoints(ids: string[], seed: number): Point[] {
  const random = pseudoRandomSequence(seed);
  const infos = listRefrigerants().filter((r) => ids.includes(r.id));
  return Array.from({ length: POINTS }, () => {
    const info = infos[Math.floor(random() * infos.length)]!;
    // technician range: −40 °C … 60 °C, clipped to the table
    const low = Math.max(info.validRange.minimumC, -40);
    const high = Math.min(info.validRange.maximumC - 1, 60);
    const temperatureC = low + random() * (high - low);
    const point = random() < 0.5 ? "bubble" : "dew";
    return { id: info.id, temperatureC, point, pressureKPa: saturationPressure(info.id, temperatureC, point) };
  });
}

registerBench("refrigerant properties", () => {
  const all = listRefrigerants();
  const pureIds = all.filter((r) => r.kind === "pure").map((r) => r.id);
  const blendIds = all.filter((r) => r.kind === "blend" && r.source.model !== "multi-fluid").map((r) => r.id);
  const mixtureIds = all.filter((r) => r.source.model === "multi-fluid").map((r) => r.id);
  const haveEos = referencePackExists();
  const models = new Map<string, FluidModel>();
  if (haveEos) for (const id of [...pureIds, ...blendIds]) models.set(id, createFluidModel(readReferenceFluid(id)));
  else console.log("(../shared/reference absent: direct EOS solves skipped)");

  for (const [group, ids] of [
    ["pure fluids", pureIds],
    ["pseudo-pure blends", blendIds],
    ["multi-fluid blends", mixtureIds],
    ["R410A only", ["R410A"]],
  ] as const) {
    const points = makePoints([...ids], 7);
    const pressureNs = nanosecondsPerCall((i) => {
      const p = points[i & (POINTS - 1)]!;
      return saturationPressure(p.id, p.temperatureC, p.point);
    }, 2_000_000);
    const temperatureNs = nanosecondsPerCall((i) => {
      const p = points[i & (POINTS - 1)]!;
      return saturationTemperature(p.id, p.pressureKPa, p.point);
    }, 2_000_000);
    let directPressureNs: number | undefined;
    let directTemperatureNs: number | undefined;
    if (haveEos && group === "multi-fluid blends") {
      // direct solve: Raoult/Wilson cold start, successive substitution and Newton on the mixture model
      const blends = new Map(mixtureIds.map((id) => [id, mixtureBlend(id)]));
      directPressureNs = nanosecondsPerCall(
        (i) => {
          const p = points[i % POINTS]!;
          const blend = blends.get(p.id)!;
          const T = p.temperatureC + 273.15;
          const start = coldStart(blend.model, blend.moleFractions, p.point, T);
          return solveEnvelopePoint(blend.model, blend.moleFractions, p.point, { temperature: T }, start).p;
        },
        200,
        3,
      );
    } else if (haveEos) {
      const count = group === "pure fluids" ? 2000 : 20000;
      directPressureNs = nanosecondsPerCall(
        (i) => {
          const p = points[i % POINTS]!;
          const state = saturationStateAt(models.get(p.id)!, p.temperatureC + 273.15, { guess: "ancillary" });
          return p.point === "bubble" ? state.bubblePressure : state.dewPressure;
        },
        count,
        3,
      );
      directTemperatureNs = nanosecondsPerCall(
        (i) => {
          const p = points[i % POINTS]!;
          return saturationTemperatureAt(models.get(p.id)!, p.pressureKPa * 1000, p.point);
        },
        Math.max(200, count / 10),
        3,
      );
    }
    reportLookup(`saturationPressure, ${group}`, pressureNs, directPressureNs);
    reportLookup(`saturationTemperature, ${group}`, temperatureNs, directTemperatureNs);
  }
  console.log("(direct EOS for pseudo-pure blends = evaluating / inverting the published pL, pV equations;");
  console.log(" for multi-fluid blends = a cold-started bubble/dew solve of the mixture model, pressure only)");
});
