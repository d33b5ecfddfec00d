/**
 * Stores the valid rows of a CSV import. Storing thousands of readings in one statement holds
 * the embedded database (and so every other request) for seconds, so the rows go in slices of
 * IMPORT_SLICE_ROWS, hidden under an import id, with the server free between slices; then one
 * short transaction under the visit's lock makes them all readings at once. Either every row
 * becomes a reading or none does: a visit closed meanwhile, or any failure, discards the slices.
 */
import { randomUUID } from "node:crypto";
import type { Database } from "../db/client.ts";
import { analyzeTables } from "../db/planner-statistics.ts";
import { readings } from "../db/schema.ts";
import { insertVisitEvent } from "../db/visit-events.ts";
import { commitImportedReadings, discardStagedReadings, joinCrew, stageImportedReadings } from "../db/visits.ts";
import { calibrateAfterWeighIn } from "../visits/calibrate-after-weigh-in.ts";
import { writeToVisit } from "../visits/write-to-visit.ts";

/** Lets requests that queued while a slice was stored run before the next one. */
const yieldToOtherRequests = () => new Promise<void>((resolve) => setImmediate(resolve));

export async function storeImportedReadings(
  db: Database,
  organisationId: string,
  values: { visitId: string; equipmentId: string; circuit: number; recordedBy: string; slices: readonly Uint8Array[] },
): Promise<number> {
  if (values.slices.length === 0) return 0;
  const importId = randomUUID();
  const decoder = new TextDecoder();
  let stored: number;
  try {
    for (const slice of values.slices) {
      await stageImportedReadings(db, organisationId, {
        importId,
        visitId: values.visitId,
        circuit: values.circuit,
        recordedBy: values.recordedBy,
        rowsJson: decoder.decode(slice),
      });
      await yieldToOtherRequests();
    }
    stored = await writeToVisit(db, organisationId, values.visitId, async (tx) => {
      const stored = await commitImportedReadings(tx, importId);
      await joinCrew(tx, values.visitId, values.recordedBy);
      await insertVisitEvent(tx, organisationId, {
        visitId: values.visitId,
        action: "imported",
        summary: `${stored} readings imported from CSV into circuit ${values.circuit}`,
        actorId: values.recordedBy,
      });
      // A logged series after a full weigh-in calibrates the circuit as hand-entered readings do.
      await calibrateAfterWeighIn(tx, organisationId, {
        visitId: values.visitId,
        equipmentId: values.equipmentId,
        circuit: values.circuit,
        actorId: values.recordedBy,
      });
      return stored;
    });
  } catch (error) {
    await discardStagedReadings(db, importId);
    throw error;
  }
  // Thousands of readings at once move the table's size well past what the planner last saw.
  // The readings are stored by now: a failed refresh must not report the import as failed (a
  // retry would store them twice), and the hourly refresh catches up.
  await analyzeTables(db, [readings]).catch(() => undefined);
  return stored;
}
