/**
 * Property-based checks (fast-check) of the saturation lookups: physical laws and
 * internal consistency that must hold at every input, not only at tabulated points.
 * - Clausius–Clapeyron: saturation pressure rises strictly with temperature.
 * - p → T → p and T → p → T round trips within INTERPOLATION_TOLERANCE_K.
 * - Zeotropic blends: bubble pressure ≥ dew pressure at one temperature (the liquid
 *   side boils first), i.e. T_bubble ≤ T_dew at one pressure (TRADE.md §1.1 definitions).
 * - Any number either gives a finite result or throws PropertyRangeError — never NaN.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  INTERPOLATION_TOLERANCE_K,
  listRefrigerants,
  PropertyRangeError,
  saturationPressure,
  saturationTemperature,
} from "@shared/engine/index.ts";

const refrigerants = listRefrigerants();
const blends = refrigerants.filter((r) => r.kind === "blend");
const anyPoint = fc.constantFrom("bubble" as const, "dew" as const);

/** A refrigerant and a temperature inside its table. */
const refrigerantAndTemperature = fc
  .constantFrom(...refrigerants)
  .chain((info) =>
    fc.tuple(
      fc.constant(info),
      fc.double({ min: info.validRange.minimumC, max: info.validRange.maximumC, noNaN: true }),
    ),
  );

describe("saturation lookups (property-based)", () => {
  it("rise strictly with temperature", () => {
    fc.assert(
      fc.property(
        refrigerantAndTemperature,
        fc.double({ min: 1e-4, max: 5, noNaN: true }),
        anyPoint,
        ([info, t], step, point) => {
          const higher = Math.min(t + step, info.validRange.maximumC);
          fc.pre(higher - t >= 1e-4);
          expect(saturationPressure(info.id, higher, point)).toBeGreaterThan(saturationPressure(info.id, t, point));
        },
      ),
      { numRuns: 2000 },
    );
  });

  it("round-trip T → p → T within the interpolation tolerance", () => {
    fc.assert(
      fc.property(refrigerantAndTemperature, anyPoint, ([info, t], point) => {
        const back = saturationTemperature(info.id, saturationPressure(info.id, t, point), point);
        expect(Math.abs(back - t)).toBeLessThan(INTERPOLATION_TOLERANCE_K);
      }),
      { numRuns: 2000 },
    );
  });

  it("round-trip p → T → p within the interpolation tolerance (expressed in kelvin)", () => {
    fc.assert(
      fc.property(refrigerantAndTemperature, anyPoint, ([info, t], point) => {
        const pressure = saturationPressure(info.id, t, point);
        const back = saturationPressure(info.id, saturationTemperature(info.id, pressure, point), point);
        // convert the pressure difference to kelvin with a local slope
        const probe = t + 0.01 <= info.validRange.maximumC ? t + 0.01 : t - 0.01;
        const slope = (saturationPressure(info.id, probe, point) - pressure) / (probe - t);
        expect(Math.abs(back - pressure) / slope).toBeLessThan(INTERPOLATION_TOLERANCE_K);
      }),
      { numRuns: 2000 },
    );
  });

  it("give bubble pressure ≥ dew pressure for blends, and bubble temperature ≤ dew temperature", () => {
    const blendAndTemperature = fc
      .constantFrom(...blends)
      .chain((info) =>
        fc.tuple(
          fc.constant(info),
          fc.double({ min: info.validRange.minimumC, max: info.validRange.maximumC, noNaN: true }),
        ),
      );
    fc.assert(
      fc.property(blendAndTemperature, fc.double({ min: 0, max: 1, noNaN: true }), ([info, t], fraction) => {
        expect(saturationPressure(info.id, t, "bubble")).toBeGreaterThanOrEqual(saturationPressure(info.id, t, "dew"));
        // a pressure both curves cover: from the bubble pressure at the lowest row to the dew pressure at the highest
        const low = saturationPressure(info.id, info.validRange.minimumC, "bubble");
        const high = saturationPressure(info.id, info.validRange.maximumC, "dew");
        const p = Math.min(high, Math.max(low, low * Math.pow(high / low, fraction)));
        expect(saturationTemperature(info.id, p, "bubble")).toBeLessThanOrEqual(
          saturationTemperature(info.id, p, "dew") + 1e-9,
        );
      }),
      { numRuns: 1000 },
    );
  });

  it("give the same value for bubble and dew for pure fluids", () => {
    const pure = refrigerants.filter((r) => r.kind === "pure");
    fc.assert(
      fc.property(fc.constantFrom(...pure), fc.double({ min: 0, max: 1, noNaN: true }), (info, fraction) => {
        // Clamped: min + 1 × (max − min) can round one ulp above max (fast-check found it for R134a).
        const t = Math.min(
          info.validRange.maximumC,
          info.validRange.minimumC + fraction * (info.validRange.maximumC - info.validRange.minimumC),
        );
        expect(saturationPressure(info.id, t, "bubble")).toBe(saturationPressure(info.id, t, "dew"));
      }),
    );
  });

  it("never return NaN: any number gives a finite answer or a PropertyRangeError", () => {
    fc.assert(
      fc.property(fc.constantFrom(...refrigerants), fc.double(), anyPoint, (info, value, point) => {
        for (const lookup of [
          () => saturationPressure(info.id, value, point),
          () => saturationTemperature(info.id, value, point),
        ]) {
          try {
            expect(Number.isFinite(lookup())).toBe(true);
          } catch (error) {
            expect(error).toBeInstanceOf(PropertyRangeError);
          }
        }
      }),
      { numRuns: 3000 },
    );
  });
});
