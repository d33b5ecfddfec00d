import { formatTime } from "@shared/format/date-time.ts";

/** Tick spacings, minutes, that fall on round clock times (:05, :10, :15, :30, the hour…). */
const TICK_STEPS_MINUTES = [1, 2, 5, 10, 15, 20, 30, 60, 120, 180, 240, 360, 720] as const;

const minutesSinceMidnight = (time: Date) => time.getHours() * 60 + time.getMinutes();

/**
 * Ticks for a time axis whose values are minutes since `originIso`: the smallest round spacing
 * giving at most `maxTicks` ticks, placed on whole local clock minutes divisible by it, so a
 * technician reads "14:05 14:10 14:15" off the chart instead of "4.41 min".
 *
 * Units: minutes in (relative to the origin), minutes out (same basis).
 *
 * @throws {Error} when the range is not finite or maxTicks is below 2
 * @example clockTicks("2026-01-05T14:03:20", 0, 11, 6) // minutes of 14:05, 14:10 → [1.67, 6.67, …]
 */
export function clockTicks(originIso: string, fromMinutes: number, toMinutes: number, maxTicks: number): number[] {
  if (!Number.isFinite(fromMinutes) || !Number.isFinite(toMinutes) || toMinutes < fromMinutes) {
    throw new Error("clockTicks requires a finite range with from ≤ to");
  }
  if (maxTicks < 2) throw new Error("clockTicks requires at least 2 ticks");
  const origin = Date.parse(originIso);
  const span = toMinutes - fromMinutes;
  const step = TICK_STEPS_MINUTES.find((candidate) => span / candidate < maxTicks) ?? TICK_STEPS_MINUTES.at(-1)!;
  // The first whole minute at or after the start, moved on to the next multiple of the step in local time.
  const startMs = Math.ceil((origin + fromMinutes * 60_000) / 60_000) * 60_000;
  const offset = (step - (minutesSinceMidnight(new Date(startMs)) % step)) % step;
  const ticks: number[] = [];
  for (let at = startMs + offset * 60_000; at <= origin + toMinutes * 60_000 + 1e-6; at += step * 60_000) {
    ticks.push((at - origin) / 60_000);
  }
  // A range shorter than a minute (one reading) still gets its one label.
  return ticks.length > 0 ? ticks : [fromMinutes];
}

/** A chart's time value as a 24-hour clock time ("14:05"), minutes after `originIso`. */
export function clockLabel(originIso: string, minutes: number): string {
  return formatTime(Date.parse(originIso) + minutes * 60_000);
}
