/**
 * The direct-index row finder must agree with the definition of an interval
 * (temperature[i] ≤ T ≤ temperature[i+1]) everywhere, including the short first
 * interval (triple point or −60 °C) and the short last one (just below critical).
 * Checked against the definition and a plain binary search (findInterval) on every table.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { findInterval } from "@shared/engine/properties/find-interval.ts";
import { findTemperatureRow } from "@shared/engine/properties/find-temperature-row.ts";
import { REFRIGERANT_IDS, resolveRefrigerant } from "@shared/engine/properties/resolve-refrigerant.ts";

describe("findTemperatureRow", () => {
  it("finds the enclosing row for any temperature in every table", () => {
    fc.assert(
      fc.property(fc.constantFrom(...REFRIGERANT_IDS), fc.double({ min: 0, max: 1, noNaN: true }), (id, fraction) => {
        const table = resolveRefrigerant(id);
        const t = Math.min(table.maximumC, table.minimumC + fraction * (table.maximumC - table.minimumC));
        const i = findTemperatureRow(table, t);
        expect(table.temperatureC[i]!).toBeLessThanOrEqual(t);
        expect(table.temperatureC[i + 1]!).toBeGreaterThanOrEqual(t);
        const j = findInterval(table.temperatureC, t);
        // the two may differ only when T sits exactly on a row shared by two intervals
        if (i !== j) expect(table.temperatureC[Math.max(i, j)]).toBe(t);
      }),
      { numRuns: 3000 },
    );
  });

  it("handles every tabulated temperature and the ends exactly", () => {
    for (const id of REFRIGERANT_IDS) {
      const table = resolveRefrigerant(id);
      expect(table.gridStep).toBe(0.5);
      for (const t of table.temperatureC) {
        const i = findTemperatureRow(table, t);
        expect(table.temperatureC[i]!).toBeLessThanOrEqual(t);
        expect(table.temperatureC[i + 1]!).toBeGreaterThanOrEqual(t);
      }
      expect(findTemperatureRow(table, table.minimumC)).toBe(0);
      expect(findTemperatureRow(table, table.maximumC)).toBe(table.rowCount - 2);
    }
  });
});
