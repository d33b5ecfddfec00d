import { describe, expect, it } from "vitest";
import { clockLabel, clockTicks } from "@/features/run-log/utils/clock-ticks.ts";

// Times built in local time, so the checks hold in any time zone the tests run in.
const local = (hours: number, minutes: number, seconds = 0) =>
  new Date(2026, 0, 5, hours, minutes, seconds).toISOString();

describe("clockTicks", () => {
  it("puts ticks on round clock minutes, not on the minutes since the first reading", () => {
    // First reading 14:03:20, last 40 min later: ticks every 10 min at 14:10, 14:20, 14:30, 14:40.
    const origin = local(14, 3, 20);
    const ticks = clockTicks(origin, 0, 40, 6);
    expect(ticks.map((tick) => clockLabel(origin, tick))).toEqual(["14:10", "14:20", "14:30", "14:40"]);
  });

  it("picks the smallest round step that keeps within the tick count", () => {
    const origin = local(9, 0);
    // 12 min in at most 6 ticks: 5-min steps (a 2-min step would give 7).
    expect(clockTicks(origin, 0, 12, 6).map((tick) => clockLabel(origin, tick))).toEqual(["09:00", "09:05", "09:10"]);
    // Three hours in at most 6 ticks: 60-min steps (30 min would give 7).
    expect(clockTicks(origin, 0, 180, 6).map((tick) => clockLabel(origin, tick))).toEqual([
      "09:00",
      "10:00",
      "11:00",
      "12:00",
    ]);
  });

  it("labels every tick with a whole minute, never a fraction of one", () => {
    const origin = local(15, 47, 41);
    for (const tick of clockTicks(origin, 0, 57.3, 6)) {
      expect(clockLabel(origin, tick)).toMatch(/^\d{2}:\d{2}$/);
      expect(new Date(Date.parse(origin) + tick * 60_000).getSeconds()).toBe(0);
    }
  });

  it("gives a single reading its own tick", () => {
    const origin = local(14, 3, 20);
    expect(clockTicks(origin, 0, 0, 6)).toEqual([0]);
  });

  it("rejects a reversed or infinite range", () => {
    expect(() => clockTicks(local(9, 0), 5, 1, 6)).toThrow("clockTicks requires");
    expect(() => clockTicks(local(9, 0), 0, Number.POSITIVE_INFINITY, 6)).toThrow("clockTicks requires");
  });
});

describe("clockLabel", () => {
  it("writes a 24-hour clock time, as on a site log sheet", () => {
    expect(clockLabel(local(13, 55), 10)).toBe("14:05");
    expect(clockLabel(local(8, 0), 0)).toBe("08:00");
  });
});
