/**
 * Calibration on the unit's own history: when a visit has weighed the circuit's full charge in
 * (the register's charging declaration) and the circuit has since settled, the settled readings
 * become its charge reference point, stored with the equipment, so later visits estimate the
 * charge against the unit itself rather than generic coefficients (Li & Braun 2009).
 *
 * Called after a reading is stored and after a weigh-in is declared, under the visit's lock.
 * Cheap when there is nothing to do: one indexed look-up for the declaration and one for a
 * reference already taken from this visit; the run log is read only in between.
 */
import { hasWeighInReferenceFromVisit, setChargeReference } from "../db/charge-references.ts";
import type { Database } from "../db/client.ts";
import { insertVisitEvent } from "../db/visit-events.ts";
import { weighInRunLog } from "../db/weigh-in-run-log.ts";
import { settledChargeReference } from "./settled-charge-reference.ts";

/** @returns the new reference point's id, or null when none was set */
export async function calibrateAfterWeighIn(
  db: Database,
  organisationId: string,
  values: { visitId: string; equipmentId: string; circuit: number; actorId: string; at?: Date },
): Promise<string | null> {
  // One per visit: a reference a senior has since cleared must not come back with the next reading.
  if (await hasWeighInReferenceFromVisit(db, organisationId, values.visitId, values.circuit)) return null;
  const runLog = await weighInRunLog(db, organisationId, values.visitId, values.circuit);
  if (!runLog) return null;
  const settled = settledChargeReference(runLog);
  if (!settled) return null;
  const id = await setChargeReference(db, organisationId, {
    equipmentId: values.equipmentId,
    circuit: values.circuit,
    values: settled.values,
    source: "weigh-in",
    setBy: values.actorId,
    visitId: values.visitId,
    readingId: settled.readingId,
    readingCount: settled.readingCount,
    note: `Mean of ${settled.readingCount} settled reading(s) after the full weigh-in`,
    at: values.at,
  });
  // The visit's trail says its readings now calibrate the unit: later estimates depend on them.
  await insertVisitEvent(db, organisationId, {
    visitId: values.visitId,
    action: "charge-reference-set",
    summary: `Circuit ${values.circuit}: settled after the full weigh-in (subcooling ${settled.values.subcoolingK} K, superheat ${settled.values.superheatK} K); its charge reference point from now on`,
    actorId: values.actorId,
    at: values.at,
  });
  return id;
}
