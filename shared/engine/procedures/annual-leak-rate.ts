import type { AnnualLeakRate } from "../../schemas/procedures.ts";
import { DAYS_PER_YEAR } from "./procedure-limits.ts";

const MILLISECONDS_PER_DAY = 86_400_000;

/**
 * Estimated annual leak rate of one piece of equipment from its refrigerant additions
 * (top-ups replace what leaked out), as kg per year and percent of the full (nameplate)
 * charge per year — the figure leak-repair rules compare with their triggers (e.g. 10 %
 * comfort cooling, 20 % commercial refrigeration, 30 % industrial process [S110][S113]).
 *
 * - With `periodDays`: every event counts; rate = total added × 365 / periodDays. The caller
 *   passes the events inside that period (e.g. the 365 days before the visit).
 * - Without: the period runs from the first event to the last; the additions made at the
 *   first event's time start the period and do not count (they replaced refrigerant lost
 *   before it). This is the time-weighted average of the per-addition "annualizing method"
 *   of US 40 CFR 82.152 (added ÷ full charge × 365 ÷ days since the previous addition) (memory).
 *   The first and last events must be at least one day apart.
 *
 * Dates are ISO 8601 dates (YYYY-MM-DD, read as UTC midnight) or timestamps with an offset;
 * a year is 365 days.
 *
 * @param events additions: ISO date and mass added (kg ≥ 0), in any order
 * @param nameplateKg full charge, kg (> 0)
 * @param periodDays length of the period the events cover, days (> 0), optional
 * @returns kg per year, percent of the charge per year, and the period used (days)
 * @throws RangeError "annualLeakRate requires ..." for no events, a bad date or mass, a charge
 *   or period ≤ 0, or (without a period) first and last events less than a day apart
 * @example annualLeakRate([{ date: "2025-01-10", addedKg: 0.5 }, { date: "2025-07-11", addedKg: 0.6 }], 4)
 *   // { kgPerYear: ≈ 1.203, percentOfChargePerYear: ≈ 30.08, periodDays: 182 }
 */
export function annualLeakRate(
  events: readonly { date: string; addedKg: number }[],
  nameplateKg: number,
  periodDays?: number,
): AnnualLeakRate {
  if (events.length === 0) throw new RangeError("annualLeakRate requires at least one event");
  if (!Number.isFinite(nameplateKg) || !(nameplateKg > 0))
    throw new RangeError("annualLeakRate requires a nameplate charge above zero");
  const timed = events.map((event) => {
    const time = Date.parse(event.date);
    if (Number.isNaN(time)) throw new RangeError("annualLeakRate requires ISO 8601 dates");
    if (!Number.isFinite(event.addedKg) || event.addedKg < 0)
      throw new RangeError("annualLeakRate requires added masses of zero or more");
    return { time, addedKg: event.addedKg };
  });

  let leakedKg: number;
  let days: number;
  if (periodDays !== undefined) {
    if (!Number.isFinite(periodDays) || !(periodDays > 0))
      throw new RangeError("annualLeakRate requires a period above zero days");
    leakedKg = timed.reduce((sum, event) => sum + event.addedKg, 0);
    days = periodDays;
  } else {
    const start = Math.min(...timed.map((event) => event.time));
    const end = Math.max(...timed.map((event) => event.time));
    days = (end - start) / MILLISECONDS_PER_DAY;
    if (days < 1)
      throw new RangeError("annualLeakRate requires a period, or first and last events at least one day apart");
    leakedKg = timed.reduce((sum, event) => (event.time > start ? sum + event.addedKg : sum), 0);
  }
  const kgPerYear = (leakedKg * DAYS_PER_YEAR) / days;
  return { kgPerYear, percentOfChargePerYear: (100 * kgPerYear) / nameplateKg, periodDays: days };
}
