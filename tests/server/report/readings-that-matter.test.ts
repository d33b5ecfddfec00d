import { describe, expect, it } from "vitest";
import type { Reading } from "@shared/schemas/visits.ts";
import { REPORT_ALL_READINGS_UP_TO, REPORT_LATEST_READINGS } from "@shared/schemas/visits.ts";
import { readingsThatMatter } from "@server/report/readings-that-matter.ts";

const START = Date.parse("2026-12-02T01:00:00.000Z");
/** One reading a minute; only the id and time matter here. */
const series = (count: number) =>
  Array.from(
    { length: count },
    (_, minute) => ({ id: `r${minute}`, takenAt: new Date(START + minute * 60_000).toISOString() }) as Reading,
  );
const at = (minute: number) => new Date(START + minute * 60_000 - 30_000).toISOString();

describe("readingsThatMatter", () => {
  it("lists a short series whole", () => {
    const readings = series(REPORT_ALL_READINGS_UP_TO);
    expect(readingsThatMatter(readings, [at(10)])).toEqual({ readings, leftOut: 0 });
  });

  it("keeps the first, the latest and the readings either side of each adjustment of a long series, in order", () => {
    const result = readingsThatMatter(series(10_000), [at(500), at(7_000)]);
    const latest = Array.from(
      { length: REPORT_LATEST_READINGS },
      (_, index) => `r${10_000 - REPORT_LATEST_READINGS + index}`,
    );
    expect(result.readings.map((reading) => reading.id)).toEqual(["r0", "r499", "r500", "r6999", "r7000", ...latest]);
    expect(result.leftOut).toBe(10_000 - 5 - REPORT_LATEST_READINGS);
  });

  it("keeps the last reading for an adjustment made after it", () => {
    const result = readingsThatMatter(series(100), [at(200)]);
    expect(result.readings.at(-1)!.id).toBe("r99");
    expect(result.readings).toHaveLength(1 + REPORT_LATEST_READINGS);
  });
});
