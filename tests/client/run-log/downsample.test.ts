import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { downsample } from "@/features/run-log/utils/downsample.ts";

const series = (values: number[]) => values.map((value, index) => ({ x: index, value }));
const y = (point: { value: number }) => point.value;

describe("downsample (largest-triangle-three-buckets, Steinarsson 2013)", () => {
  it("returns short series unchanged", () => {
    const points = series([1, 2, 3]);
    expect(downsample(points, 10, y)).toEqual(points);
  });

  it("keeps the first and last points and exactly the threshold count", () => {
    const points = series(Array.from({ length: 5000 }, (_, index) => Math.sin(index / 50)));
    const kept = downsample(points, 400, y);
    expect(kept).toHaveLength(400);
    expect(kept[0]).toBe(points[0]);
    expect(kept.at(-1)).toBe(points.at(-1));
  });

  it("keeps a one-sample spike that plain decimation would drop", () => {
    const values = Array.from({ length: 3000 }, () => 5);
    values[1234] = 25; // a superheat spike after an adjustment
    const kept = downsample(series(values), 100, y);
    expect(kept.some((point) => point.value === 25)).toBe(true);
  });

  it("never invents points and keeps time order", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -50, max: 50, noNaN: true }), { minLength: 3, maxLength: 600 }),
        fc.integer({ min: 3, max: 200 }),
        (values, threshold) => {
          const points = series(values);
          const kept = downsample(points, threshold, y);
          expect(kept.length).toBe(Math.min(points.length, threshold));
          for (let index = 1; index < kept.length; index++) expect(kept[index]!.x).toBeGreaterThan(kept[index - 1]!.x);
          for (const point of kept) expect(points).toContain(point);
        },
      ),
    );
  });
});
