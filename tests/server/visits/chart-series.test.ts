import { describe, expect, it } from "vitest";
import { MAX_SERIES_POINTS, type ChartPoint } from "@shared/schemas/visits.ts";
import { chartSeries, EXACT_TAIL_POINTS } from "@server/visits/chart-series.ts";

/** A logger's series every 2 s: gentle waves, one spike of superheat, one dip of subcooling, a gap of nulls. */
const series = (count: number): ChartPoint[] =>
  Array.from({ length: count }, (_, index) => ({
    x: index / 30,
    takenAt: new Date(Date.UTC(2026, 11, 2) + index * 2_000).toISOString(),
    superheatK: index === 4_321 ? 40 : 6 + Math.sin(index / 50),
    subcoolingK: index === 7_654 ? -3 : 5 + Math.cos(index / 40),
    evaporatingTempC: index % 1_000 === 0 ? null : 6,
    condensingTempC: 42 + index / 10_000,
  }));

describe("chartSeries", () => {
  it("returns a short series whole", () => {
    const points = series(MAX_SERIES_POINTS);
    expect(chartSeries(points)).toEqual(points);
  });

  it("reduces 10,000 points to at most MAX_SERIES_POINTS, keeping each line's extremes, the first point and the latest exactly", () => {
    const points = series(10_000);
    const kept = chartSeries(points);
    expect(kept.length).toBeLessThanOrEqual(MAX_SERIES_POINTS);
    expect(kept[0]).toBe(points[0]);
    expect(kept.slice(-EXACT_TAIL_POINTS)).toEqual(points.slice(-EXACT_TAIL_POINTS));
    expect(kept).toContain(points[4_321]);
    expect(kept).toContain(points[7_654]);
    const extreme = (values: (number | null)[], pick: (...numbers: number[]) => number) =>
      pick(...values.filter((value): value is number => value !== null));
    expect(
      extreme(
        kept.map((point) => point.condensingTempC),
        Math.max,
      ),
    ).toBe(
      extreme(
        points.map((point) => point.condensingTempC),
        Math.max,
      ),
    );
    expect(
      extreme(
        kept.map((point) => point.superheatK),
        Math.min,
      ),
    ).toBe(
      extreme(
        points.map((point) => point.superheatK),
        Math.min,
      ),
    );
    // Real readings, in time order.
    expect(kept.map((point) => point.x)).toEqual([...kept].map((point) => point.x).sort((a, b) => a - b));
  });
});
