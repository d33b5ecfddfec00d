/**
 * Queries for circuits' charge reference points (charge_references) and the correct charge the
 * diagnosis scales its kilograms by. Every function takes the caller's organisation id and never
 * reads or writes another organisation's rows.
 */
import { and, desc, eq, inArray, isNull, notExists } from "drizzle-orm";
import type {
  ChargeReferenceSource,
  CircuitChargeReferences,
  StoredChargeReference,
} from "@shared/schemas/charge-references.ts";
import type { ChargeReference } from "@shared/schemas/diagnosis.ts";
import type { CircuitNameplate } from "@shared/schemas/equipment.ts";
import type { Database } from "./client.ts";
import { peopleById, person, voidInfo } from "./people.ts";
import { chargeReferences, circuitCharges, readings, visits } from "./schema.ts";
import { oneRow } from "./one-row.ts";
import { countsInResults } from "./visits.ts";

type ReferenceRow = typeof chargeReferences.$inferSelect;

/** The engine's reference values of a stored row. */
function valuesOf(row: ReferenceRow): ChargeReference {
  return {
    subcoolingK: row.subcoolingK,
    superheatK: row.superheatK,
    evaporatingTempC: row.evaporatingTempC,
    condensingTempC: row.condensingTempC,
    outdoorAirDryBulbC: row.outdoorAirDryBulbC,
    returnAirDryBulbC: row.returnAirDryBulbC,
  };
}

/**
 * The circuit's standing reference point: not cleared. Reading it and clearing it must pick the
 * same row, so both use this.
 */
function standingReferenceOf(organisationId: string, equipmentId: string, circuit: number) {
  return and(
    eq(chargeReferences.organisationId, organisationId),
    eq(chargeReferences.equipmentId, equipmentId),
    eq(chargeReferences.circuit, circuit),
    isNull(chargeReferences.voidedAt),
  );
}

/** The standing reference point of one circuit, as the diagnosis takes it, or null. */
export async function standingChargeReference(
  db: Database,
  organisationId: string,
  equipmentId: string,
  circuit: number,
): Promise<ChargeReference | null> {
  const [row] = await db
    .select()
    .from(chargeReferences)
    .where(standingReferenceOf(organisationId, equipmentId, circuit));
  return row ? valuesOf(row) : null;
}

/**
 * The line-set adjustment of the circuit's latest standing full weigh-in declaration, kg (0 when
 * it has none): the installed line set holds refrigerant the factory charge does not cover, so
 * the correct charge is the nameplate plus this.
 */
export async function circuitLineAdjustmentKg(
  db: Database,
  organisationId: string,
  equipmentId: string,
  circuit: number,
): Promise<number> {
  const [row] = await db
    .select({ lineAdjustmentKg: circuitCharges.lineAdjustmentKg })
    .from(circuitCharges)
    .innerJoin(visits, eq(visits.id, circuitCharges.visitId))
    .where(
      and(
        eq(circuitCharges.organisationId, organisationId),
        eq(visits.equipmentId, equipmentId),
        eq(circuitCharges.circuit, circuit),
        isNull(circuitCharges.voidedAt),
      ),
    )
    .orderBy(desc(circuitCharges.createdAt))
    .limit(1);
  return row?.lineAdjustmentKg ?? 0;
}

/** What a circuit's readings are diagnosed against for charge: its correct charge and its reference point. */
export interface CircuitCharge {
  chargeKg: number;
  chargeReference: ChargeReference | null;
}

export async function circuitCharge(
  db: Database,
  organisationId: string,
  equipmentId: string,
  nameplate: CircuitNameplate,
): Promise<CircuitCharge> {
  const [lineAdjustmentKg, chargeReference] = await Promise.all([
    circuitLineAdjustmentKg(db, organisationId, equipmentId, nameplate.number),
    standingChargeReference(db, organisationId, equipmentId, nameplate.number),
  ]);
  return { chargeKg: nameplate.factoryChargeKg + lineAdjustmentKg, chargeReference };
}

/**
 * Of the given visits, the circuits with a standing full weigh-in and no reference point from it
 * yet (standing or cleared): the only ones a new reading can calibrate (calibrateAfterWeighIn).
 * One indexed query, so a save skips the calibration's reads when there is nothing to do.
 */
export async function circuitsAwaitingWeighInReference(
  db: Database,
  organisationIds: readonly string[],
  visitIds: readonly string[],
): Promise<{ visitId: string; circuit: number }[]> {
  return db
    .selectDistinct({ visitId: circuitCharges.visitId, circuit: circuitCharges.circuit })
    .from(circuitCharges)
    .where(
      and(
        inArray(circuitCharges.organisationId, [...organisationIds]),
        inArray(circuitCharges.visitId, [...visitIds]),
        isNull(circuitCharges.voidedAt),
        notExists(
          db
            .select({ id: chargeReferences.id })
            .from(chargeReferences)
            .where(
              and(
                eq(chargeReferences.visitId, circuitCharges.visitId),
                eq(chargeReferences.circuit, circuitCharges.circuit),
                eq(chargeReferences.source, "weigh-in"),
              ),
            ),
        ),
      ),
    );
}

/** Every reference point of a unit's circuits, the standing one first, then newest first; with the correct charge. */
export async function listChargeReferences(
  db: Database,
  organisationId: string,
  equipmentId: string,
  circuits: CircuitNameplate[],
): Promise<CircuitChargeReferences[]> {
  const rows = await db
    .select({ reference: chargeReferences, visitStartedAt: visits.startedAt })
    .from(chargeReferences)
    .leftJoin(visits, eq(visits.id, chargeReferences.visitId))
    .where(and(eq(chargeReferences.organisationId, organisationId), eq(chargeReferences.equipmentId, equipmentId)))
    .orderBy(desc(chargeReferences.setAt), desc(chargeReferences.id));
  const people = await peopleById(
    db,
    rows.flatMap(({ reference }) => [reference.setBy, reference.voidedBy]),
  );
  const stored = rows.map(({ reference, visitStartedAt }): StoredChargeReference => ({
    id: reference.id,
    circuit: reference.circuit,
    values: valuesOf(reference),
    source: reference.source,
    setAt: reference.setAt.toISOString(),
    setBy: person(people, reference.setBy),
    visitId: reference.visitId,
    visitStartedAt: visitStartedAt?.toISOString() ?? null,
    readingId: reference.readingId,
    readingCount: reference.readingCount,
    note: reference.note,
    cleared: voidInfo(reference, people),
  }));
  return Promise.all(
    circuits.map(async (nameplate) => {
      const lineAdjustmentKg = await circuitLineAdjustmentKg(db, organisationId, equipmentId, nameplate.number);
      const history = stored.filter((reference) => reference.circuit === nameplate.number);
      return {
        circuit: nameplate.number,
        correctChargeKg: nameplate.factoryChargeKg + lineAdjustmentKg,
        lineAdjustmentKg,
        current: history.find((reference) => reference.cleared === null) ?? null,
        history,
      };
    }),
  );
}

export interface ChargeReferenceInsert {
  equipmentId: string;
  circuit: number;
  values: ChargeReference;
  source: ChargeReferenceSource;
  setBy: string | null;
  visitId: string | null;
  readingId: string | null;
  readingCount: number;
  note: string | null;
  /** When it was set; now unless a history is being written (the demo). */
  at?: Date;
}

/**
 * Makes a reference point the circuit's standing one. The one standing before is cleared with a
 * reason naming what replaced it, so the history reads in order. Run inside a transaction.
 * @returns the new row's id
 */
export async function setChargeReference(
  db: Database,
  organisationId: string,
  values: ChargeReferenceInsert,
): Promise<string> {
  const reason =
    values.source === "weigh-in"
      ? "Replaced by the reference point settled after a weigh-in"
      : "Replaced by a reference point set by a senior";
  const at = values.at ?? new Date();
  await clearChargeReference(db, organisationId, {
    equipmentId: values.equipmentId,
    circuit: values.circuit,
    reason,
    clearedBy: values.setBy,
    at,
  });
  const rows = await db
    .insert(chargeReferences)
    .values({
      organisationId,
      equipmentId: values.equipmentId,
      circuit: values.circuit,
      ...values.values,
      source: values.source,
      setBy: values.setBy,
      visitId: values.visitId,
      readingId: values.readingId,
      readingCount: values.readingCount,
      note: values.note,
      setAt: at,
    })
    .returning({ id: chargeReferences.id });
  return oneRow(rows, "insert charge reference").id;
}

/** Clears the circuit's standing reference point, keeping it with the reason. @returns whether one stood. */
export async function clearChargeReference(
  db: Database,
  organisationId: string,
  values: { equipmentId: string; circuit: number; reason: string; clearedBy: string | null; at?: Date },
): Promise<boolean> {
  const cleared = await db
    .update(chargeReferences)
    .set({ voidedAt: values.at ?? new Date(), voidedBy: values.clearedBy, voidReason: values.reason })
    .where(standingReferenceOf(organisationId, values.equipmentId, values.circuit))
    .returning({ id: chargeReferences.id });
  return cleared.length > 0;
}

/**
 * Has this visit already given the circuit a reference point from its weigh-in (standing or
 * since cleared)? A senior's clearing must not be undone by the next reading stored.
 */
export async function hasWeighInReferenceFromVisit(
  db: Database,
  organisationId: string,
  visitId: string,
  circuit: number,
): Promise<boolean> {
  const [row] = await db
    .select({ id: chargeReferences.id })
    .from(chargeReferences)
    .where(
      and(
        eq(chargeReferences.organisationId, organisationId),
        eq(chargeReferences.visitId, visitId),
        eq(chargeReferences.circuit, circuit),
        eq(chargeReferences.source, "weigh-in"),
      ),
    )
    .limit(1);
  return row !== undefined;
}

/** A standing reading of one of the unit's circuits, by id (any visit of the unit), or undefined. */
export async function findUnitReading(db: Database, organisationId: string, equipmentId: string, readingId: string) {
  const [row] = await db
    .select({
      id: readings.id,
      visitId: readings.visitId,
      circuit: readings.circuit,
      input: readings.input,
      result: readings.result,
    })
    .from(readings)
    .innerJoin(visits, eq(visits.id, readings.visitId))
    .where(
      and(
        eq(readings.organisationId, organisationId),
        eq(visits.equipmentId, equipmentId),
        eq(readings.id, readingId),
        countsInResults,
      ),
    );
  return row;
}
