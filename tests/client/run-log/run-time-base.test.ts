import { describe, expect, it } from "vitest";
import { RUN_CLOCK_STALE_MINUTES, runMinutesAt } from "@/features/run-log/utils/run-time-base.ts";

const MINUTE = 60_000;

describe("run-time clock of a circuit", () => {
  it("counts on from the last reading's run time", () => {
    expect(runMinutesAt({ minutes: 20, at: 0 }, 7 * MINUTE)).toBe(27);
  });

  it("restarts from an adjustment", () => {
    expect(runMinutesAt({ minutes: 0, at: 10 * MINUTE }, 14 * MINUTE)).toBe(4);
  });

  it("stops counting after a long gap, when the unit has most likely been stopped (regression: a day-old visit showed 1390 min)", () => {
    expect(runMinutesAt({ minutes: 27, at: 0 }, (RUN_CLOCK_STALE_MINUTES + 1) * MINUTE)).toBeNull();
    expect(runMinutesAt(null, 0)).toBeNull();
  });
});
