/**
 * Brings readings saved by an older diagnosis engine up to the current result format. A
 * reading's measured values are the record and never change; its `result` is derived from them,
 * and the screens parse it with the current schema, so a result missing the current fields is
 * worked out again (same code the server runs on every save). Readings now carry the
 * equipment's application, as every new reading does; older ones get it added first. Likewise
 * the circuit's correct charge (nameplate plus its visit's weigh-in line adjustment), so an older
 * reading gets a charge estimate in kilograms; it gets no reference point, because one set later
 * was not the unit's history when the reading was taken.
 */
import { and, isNull, sql } from "drizzle-orm";
import { parseDiagnosisInput } from "@shared/engine/index.ts";
import { diagnoseReading } from "../diagnosis/diagnose-on-server.ts";
import type { Database } from "./client.ts";
import { circuitCharges, equipment, readings, visits } from "./schema.ts";

/** A field every current result has and older ones lack. */
const MARKER_FIELD = "chargeDeviation";
const BATCH = 500;

/** @returns how many readings were brought up to date. */
export async function upgradeStoredDiagnoses(db: Database): Promise<number> {
  let upgraded = 0;
  for (;;) {
    const stale = await db
      .select({
        id: readings.id,
        circuit: readings.circuit,
        input: readings.input,
        application: equipment.application,
        circuits: equipment.circuits,
        lineAdjustmentKg: circuitCharges.lineAdjustmentKg,
      })
      .from(readings)
      .innerJoin(visits, sql`${visits.id} = ${readings.visitId}`)
      .innerJoin(equipment, sql`${equipment.id} = ${visits.equipmentId}`)
      .leftJoin(
        circuitCharges,
        and(
          sql`${circuitCharges.visitId} = ${readings.visitId}`,
          sql`${circuitCharges.circuit} = ${readings.circuit}`,
          isNull(circuitCharges.voidedAt),
        ),
      )
      .where(sql`NOT (${readings.result} ? ${MARKER_FIELD})`)
      .limit(BATCH);
    if (stale.length === 0) return upgraded;
    for (const row of stale) {
      const factoryChargeKg = row.circuits.find((circuit) => circuit.number === row.circuit)?.factoryChargeKg;
      const chargeKg =
        row.input.chargeKg ??
        (factoryChargeKg === undefined ? undefined : factoryChargeKg + (row.lineAdjustmentKg ?? 0));
      // Saved by an older version and given fields here: it passes today's schema before diagnose(), which trusts its input.
      const input = parseDiagnosisInput({
        ...row.input,
        application: row.input.application ?? row.application,
        ...(chargeKg === undefined ? {} : { chargeKg }),
      });
      await db
        .update(readings)
        .set({ input, result: await diagnoseReading(input) })
        .where(sql`${readings.id} = ${row.id}`);
    }
    upgraded += stale.length;
  }
}
