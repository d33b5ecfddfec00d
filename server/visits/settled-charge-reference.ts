/**
 * A circuit's charge reference point from its run log after a full weigh-in: once the readings
 * have settled (the run log's own rule, assessTrend), the mean of the settled window is the
 * circuit at its correct charge, which the virtual refrigerant charge method measures later
 * deviations from (Li & Braun 2009). Averaging the window rather than taking one reading halves
 * the scatter of single probe readings (about ±0.6 K each; common practice).
 *
 * Pure: the caller loads the run log (server/db/weigh-in-run-log.ts).
 */
import { assessTrend, DiagnosisInputError, lastAtEachInstant, SETTLED_WINDOW_MINUTES } from "@shared/engine/index.ts";
import { ChargeReferenceSchema, type ChargeReference, type TrendReading } from "@shared/schemas/diagnosis.ts";
import type { WeighInRunLog } from "../db/weigh-in-run-log.ts";

export interface SettledChargeReference {
  values: ChargeReference;
  /** The last reading of the settled window. */
  readingId: string;
  readingCount: number;
}

const MINUTE_MS = 60_000;

/** Mean of the numbers present, or null when there are none. */
function meanOf(values: readonly (number | null | undefined)[]): number | null {
  const present = values.filter((value): value is number => typeof value === "number" && Number.isFinite(value));
  if (present.length === 0) return null;
  return present.reduce((sum, value) => sum + value, 0) / present.length;
}

/** Rounds to 0.1, the resolution the reference is shown and entered in. */
const tenths = (value: number) => Math.round(value * 10) / 10;

/** @returns the reference point, or null while the circuit has not settled since the weigh-in */
export function settledChargeReference(runLog: WeighInRunLog): SettledChargeReference | null {
  const logged = lastAtEachInstant(runLog.readings, (reading) => reading.takenAt.getTime());
  if (logged.length === 0) return null;
  // An adjustment marks the first reading after it, so settling is judged from there (as on the run log).
  let nextAdjustment = 0;
  const series: TrendReading[] = logged.map((reading) => {
    let adjustment: string | undefined;
    let due = runLog.adjustments[nextAdjustment];
    while (due && due.at.getTime() <= reading.takenAt.getTime()) {
      adjustment = due.description;
      nextAdjustment += 1;
      due = runLog.adjustments[nextAdjustment];
    }
    return {
      takenAt: reading.takenAt.toISOString(),
      input: reading.input,
      result: reading.result,
      ...(adjustment ? { adjustment } : {}),
    };
  });
  let settledAt: number;
  let settled: (typeof logged)[number] | undefined;
  try {
    const trend = assessTrend(series);
    if (!trend.lastSettled) return null;
    settledAt = trend.lastSettled.index;
    settled = logged[settledAt]; // a reading of `series`, which has one per logged reading
  } catch (error) {
    // Stored readings were valid when saved; a run log the trend cannot read gives no reference.
    if (error instanceof DiagnosisInputError) return null;
    throw error;
  }

  // The settled window, as the trend judged it: back to the reading at or before one window
  // earlier, never before the last adjustment.
  if (!settled) return null;
  const settledMs = settled.takenAt.getTime();
  const adjustedAt = series.findLastIndex((reading, index) => index <= settledAt && reading.adjustment !== undefined);
  const sinceAdjustment = Math.max(0, adjustedAt);
  const windowStart = logged.findLastIndex(
    (reading, index) =>
      index >= sinceAdjustment &&
      index <= settledAt &&
      settledMs - reading.takenAt.getTime() >= SETTLED_WINDOW_MINUTES * MINUTE_MS,
  );
  const first = windowStart === -1 ? sinceAdjustment : windowStart;
  const window = logged.slice(first, settledAt + 1);
  const subcoolingK = meanOf(window.map((reading) => reading.result.subcoolingK));
  const superheatK = meanOf(window.map((reading) => reading.result.superheatK));
  const evaporatingTempC = meanOf(window.map((reading) => reading.result.evaporatingTempC));
  const condensingTempC = meanOf(window.map((reading) => reading.result.condensingTempC));
  if (subcoolingK === null || superheatK === null || evaporatingTempC === null || condensingTempC === null) return null;
  const outdoorAirDryBulbC = meanOf(window.map((reading) => reading.input.outdoorAirDryBulbC));
  const returnAirDryBulbC = meanOf(window.map((reading) => reading.input.returnAirDryBulbC));
  // The engine's own bounds for a reference point: a settled window outside them is not one.
  const parsed = ChargeReferenceSchema.safeParse({
    subcoolingK: tenths(subcoolingK),
    superheatK: tenths(superheatK),
    evaporatingTempC: tenths(evaporatingTempC),
    condensingTempC: tenths(condensingTempC),
    outdoorAirDryBulbC: outdoorAirDryBulbC === null ? null : tenths(outdoorAirDryBulbC),
    returnAirDryBulbC: returnAirDryBulbC === null ? null : tenths(returnAirDryBulbC),
  });
  if (!parsed.success) return null;
  return { values: parsed.data, readingId: settled.id, readingCount: window.length };
}
