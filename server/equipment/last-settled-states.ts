/**
 * The equipment page's last settled state of each circuit: the most recent settled reading of
 * the unit's latest visit, judged by the run log's own trend rule (assessTrend).
 *
 * Only the tail of the visit is read. A reading's settling window is the 5 minutes before it
 * (SETTLED_WINDOW_MINUTES), and a reading whose window runs past the start of the tail is judged
 * not settled ("only n min of readings"); so a settled reading found in a tail has its whole
 * window inside it and the same verdict as in the whole log, and every later reading was judged
 * on a whole window too. When the tail holds none, a longer tail is read, up to
 * MAX_TAIL_READINGS: a circuit that has not settled in that many readings (34 minutes of a
 * logger at one reading every 2 s, days of hand-entered ones) shows as not settled rather than
 * the request reading the whole series. Only the figures the rule reads come with each reading;
 * the settled one's whole result is read alone.
 */
import { assessTrend, lastAtEachInstant } from "@shared/engine/index.ts";
import type { EquipmentDetail } from "@shared/schemas/equipment-detail.ts";
import type { CircuitNameplate } from "@shared/schemas/equipment.ts";
import type { Database } from "../db/client.ts";
import { latestCircuitReadings, latestReadingVisit, readingResult } from "../db/latest-readings.ts";

/** A first tail long enough for a window of readings every 2 s (150) and some before it. */
const FIRST_TAIL_READINGS = 256;
export const MAX_TAIL_READINGS = 1_024;

type LastSettled = EquipmentDetail["lastSettled"][number];

/** The last settled reading of a tail (by the run log's rule), with its whole stored result. */
async function lastSettledIn(
  db: Database,
  circuit: number,
  rows: Awaited<ReturnType<typeof latestCircuitReadings>>,
): Promise<LastSettled> {
  const series = lastAtEachInstant(rows, (reading) => reading.takenAt.getTime());
  if (series.length === 0) return { circuit, takenAt: null, result: null };
  const { lastSettled } = assessTrend(
    series.map((reading) => ({ takenAt: reading.takenAt.toISOString(), input: reading.input, result: reading.result })),
  );
  // lastSettled.index is a reading of the series the trend was given.
  const settled = lastSettled && series[lastSettled.index];
  if (!lastSettled || !settled) return { circuit, takenAt: null, result: null };
  const result = await readingResult(db, settled.id);
  return { circuit, takenAt: lastSettled.takenAt, result: result ?? null };
}

export async function lastSettledStates(
  db: Database,
  organisationId: string,
  equipmentId: string,
  circuits: readonly CircuitNameplate[],
): Promise<LastSettled[]> {
  const visitId = await latestReadingVisit(db, organisationId, equipmentId);
  const states: LastSettled[] = [];
  for (const { number } of circuits) {
    if (!visitId) {
      states.push({ circuit: number, takenAt: null, result: null });
      continue;
    }
    let limit = FIRST_TAIL_READINGS;
    for (;;) {
      const rows = await latestCircuitReadings(db, visitId, number, limit);
      const state = await lastSettledIn(db, number, rows);
      // Settled in the tail, the whole visit read, or as far back as it looks: the answer.
      if (state.result !== null || rows.length < limit || limit >= MAX_TAIL_READINGS) {
        states.push(state);
        break;
      }
      limit = Math.min(limit * 4, MAX_TAIL_READINGS);
    }
  }
  return states;
}
