/**
 * The single-phase tables as committed (data/refrigerants/single-phase) and the engine's
 * lookups on them, without the reference pack: every refrigerant has a table that passes its
 * schema and promises no more error than SINGLE_PHASE_TOLERANCES (the generator's check,
 * stored in the table); lookups are consistent with each other and with the saturation tables;
 * and every refusal is a PropertyRangeError with a readable message.
 */
import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import {
  listRefrigerants,
  registerSinglePhaseTable,
  saturatedPhasesAtPressure,
  saturatedState,
  saturationPressure,
  saturationTemperature,
  SINGLE_PHASE_TOLERANCES,
  singlePhaseState,
  singlePhaseStateFromEnthalpy,
  singlePhaseStateFromEntropy,
  twoPhaseStateFromEnthalpy,
} from "@shared/engine/index.ts";
import { resolveSinglePhaseTable } from "@shared/engine/properties/resolve-single-phase-table.ts";
import { loadSinglePhaseTable } from "@shared/property-tables/load-single-phase-table.ts";
import { SINGLE_PHASE_TABLE_IMPORTS } from "@shared/property-tables/single-phase-table-imports.ts";
import { thrownPropertyError } from "./thrown-property-error.ts";

const ids = listRefrigerants().map((refrigerant) => refrigerant.id);
const directory = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../../data/refrigerants/single-phase");

const rangeError = thrownPropertyError;

describe("single-phase tables and lookups", () => {
  beforeAll(async () => {
    await Promise.all(ids.map((id) => loadSinglePhaseTable(id)));
  });

  it("has one table and one dynamic import per refrigerant with a saturation table", () => {
    expect(Object.keys(SINGLE_PHASE_TABLE_IMPORTS).sort()).toEqual([...ids].sort());
    const files = readdirSync(directory).filter((name) => name.endsWith(".json"));
    expect(files).toHaveLength(ids.length);
    // sensible sizes: each table under 200 kB, all of them under 2.5 MB
    const sizes = files.map((name) => statSync(path.join(directory, name)).size);
    expect(Math.max(...sizes)).toBeLessThan(200 * 1024);
    expect(sizes.reduce((a, b) => a + b, 0)).toBeLessThan(2.5 * 1024 * 1024);
  });

  it.each(ids)("%s: the generator's measured error is within the promise", (id) => {
    const { accuracy } = resolveSinglePhaseTable(id);
    expect(accuracy.enthalpyKJPerKg.value).toBeLessThanOrEqual(SINGLE_PHASE_TOLERANCES.enthalpyKJPerKg);
    expect(accuracy.entropyKJPerKgK.value).toBeLessThanOrEqual(SINGLE_PHASE_TOLERANCES.entropyKJPerKgK);
    expect(accuracy.densityRelative.value).toBeLessThanOrEqual(SINGLE_PHASE_TOLERANCES.densityRelative);
    expect(accuracy.temperatureFromEnthalpyK.value).toBeLessThanOrEqual(SINGLE_PHASE_TOLERANCES.temperatureK);
    expect(accuracy.temperatureFromEntropyK.value).toBeLessThanOrEqual(SINGLE_PHASE_TOLERANCES.temperatureK);
    expect(accuracy.checkedPoints).toBeGreaterThan(1000);
  });

  it.each(ids)("%s: the saturated edges meet the saturation table (h′, h″ within 0.05 kJ/kg)", (id) => {
    const table = resolveSinglePhaseTable(id);
    const top = Math.min(table.vapour.maximumPressureKPa, table.liquid.maximumPressureKPa);
    const bottom = Math.max(table.vapour.minimumPressureKPa, table.liquid.minimumPressureKPa);
    for (const fraction of [0.1, 0.37, 0.5, 0.81, 0.95]) {
      const pressureKPa = bottom * Math.pow(top / bottom, fraction);
      const edges = saturatedPhasesAtPressure(id, pressureKPa);
      // saturation table: linear in T between rows 0.5 K apart (its own interpolation)
      const vapour = saturatedState(id, saturationTemperature(id, pressureKPa, "dew"));
      const liquid = saturatedState(id, saturationTemperature(id, pressureKPa, "bubble"));
      expect(Math.abs(edges.vapour.enthalpyKJPerKg - vapour.vapourEnthalpyKJPerKg)).toBeLessThan(0.05);
      expect(Math.abs(edges.liquid.enthalpyKJPerKg - liquid.liquidEnthalpyKJPerKg)).toBeLessThan(0.05);
      expect(edges.vapour.enthalpyKJPerKg).toBeGreaterThan(edges.liquid.enthalpyKJPerKg);
    }
  });

  it("finds the temperature back from h and from s (round trip within 1 mK), fast-check over R32, R410A, R454B and R717", () => {
    for (const id of ["R32", "R410A", "R454B", "R717"]) {
      const table = resolveSinglePhaseTable(id);
      fc.assert(
        fc.property(
          fc.noBias(fc.integer({ min: 50, max: 950 })).map((n) => n / 1000),
          fc.noBias(fc.integer({ min: 1, max: 1000 })).map((n) => n / 1000),
          fc.boolean(),
          (along, across, vapour) => {
            const grid = vapour ? table.vapour : table.liquid;
            const pressureKPa =
              grid.minimumPressureKPa * Math.pow(grid.maximumPressureKPa / grid.minimumPressureKPa, along);
            const saturationC = saturationTemperature(id, pressureKPa, vapour ? "dew" : "bubble");
            const temperatureC = saturationC + across * (grid.boundC - saturationC);
            if (Math.abs(temperatureC - saturationC) < 0.05) return;
            const state = singlePhaseState(id, pressureKPa, temperatureC);
            expect(
              Math.abs(
                singlePhaseStateFromEnthalpy(id, pressureKPa, state.enthalpyKJPerKg).temperatureC - temperatureC,
              ),
            ).toBeLessThan(1e-3);
            expect(
              Math.abs(singlePhaseStateFromEntropy(id, pressureKPa, state.entropyKJPerKgK).temperatureC - temperatureC),
            ).toBeLessThan(1e-3);
          },
        ),
        { numRuns: 100, seed: 7 },
      );
    }
  });

  it("rises with temperature along an isobar (c_p > 0) and falls with pressure along an isotherm of the vapour", () => {
    let previous = -Infinity;
    for (let temperatureC = 10; temperatureC <= 150; temperatureC += 0.5) {
      const h = singlePhaseState("R410A", 900, temperatureC).enthalpyKJPerKg;
      expect(h).toBeGreaterThan(previous);
      previous = h;
    }
    expect(singlePhaseState("R32", 1500, 80).enthalpyKJPerKg).toBeLessThan(
      singlePhaseState("R32", 1000, 80).enthalpyKJPerKg,
    );
  });

  it("refuses a state inside the dome, naming the bubble and dew points of a blend", () => {
    const pressureKPa = saturationPressure("R407C", 0, "dew");
    const error = rangeError(() => singlePhaseState("R407C", pressureKPa, -3));
    expect(error.code).toBe("INSIDE_DOME");
    expect(error.message).toMatch(
      /R407C at .* kPa absolute and -3\.00 °C is inside the dome \(between its bubble point -6\.\d\d °C and dew point 0\.00 °C\)/,
    );
    expect(rangeError(() => singlePhaseStateFromEnthalpy("R134a", 500, 300)).code).toBe("INSIDE_DOME");
  });

  it("refuses pressures and temperatures outside the tables with the range in the message", () => {
    expect(rangeError(() => singlePhaseState("R32", 5, 0)).code).toBe("BELOW_RANGE");
    const high = rangeError(() => singlePhaseState("R32", 9000, 120));
    expect(high.code).toBe("ABOVE_RANGE");
    expect(high.message).toMatch(/R32 above \d+ kPa absolute is outside the single-phase table/);
    expect(rangeError(() => singlePhaseState("R1234yf", 500, 150)).message).toMatch(/R1234yf vapour above 136\.85 °C/);
    expect(rangeError(() => singlePhaseState("R32", Number.NaN, 20)).code).toBe("NOT_FINITE");
    expect(rangeError(() => singlePhaseState("R999", 1000, 20)).code).toBe("UNKNOWN_REFRIGERANT");
  });

  it("says so when a table has not been loaded, and loads it once for concurrent callers", async () => {
    // a fresh id-less registry is not possible in one module graph: a damaged copy stands in
    const raw = (await SINGLE_PHASE_TABLE_IMPORTS["R290"]!()).default as Record<string, unknown>;
    expect(
      rangeError(() => registerSinglePhaseTable({ ...raw, vapour: { ...(raw.vapour as object), nodes: [0.5, 1] } }))
        .code,
    ).toBe("INVALID_TABLE");
    await expect(loadSinglePhaseTable("R999")).rejects.toThrow(/R999 has no single-phase table/);
    await Promise.all([loadSinglePhaseTable("R290"), loadSinglePhaseTable("R290")]);
    expect(singlePhaseState("R290", 1000, 60).phase).toBe("vapour");
  });

  it("splits a throttled liquid into its vapour fraction by the lever rule", () => {
    const liquid = singlePhaseState("R134a", 1000, 30);
    const pressureKPa = saturationPressure("R134a", 0);
    const mixture = twoPhaseStateFromEnthalpy("R134a", pressureKPa, liquid.enthalpyKJPerKg);
    const edges = saturatedPhasesAtPressure("R134a", pressureKPa);
    expect(mixture.quality).toBeCloseTo(
      (liquid.enthalpyKJPerKg - edges.liquid.enthalpyKJPerKg) /
        (edges.vapour.enthalpyKJPerKg - edges.liquid.enthalpyKJPerKg),
      12,
    );
    expect(mixture.temperatureC).toBeCloseTo(0, 3);
    expect(rangeError(() => twoPhaseStateFromEnthalpy("R134a", pressureKPa, 500)).code).toBe("INVALID_POINT");
  });
});
