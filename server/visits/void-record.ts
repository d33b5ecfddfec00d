/**
 * Voiding a visit's record: the one way a reading, adjustment, procedure record, register
 * movement or weigh-in declaration is corrected. The row stays as it was written, marked with
 * who voided it, when and why; every result, balance, total, export and report leaves it out,
 * and the visit's audit trail gets a line naming it. Nothing is ever deleted. Runs under the
 * visit's lock (writeToVisit), so it follows the same open/closed rule as new entries. A charge
 * adjustment and its linked register movement are voided together.
 */
import { sql } from "drizzle-orm";
import type { PgTable } from "drizzle-orm/pg-core";
import {
  ELECTRICAL_TARGET_LABELS,
  LEAK_METHOD_LABELS,
  type ElectricalTarget,
  type LeakMethod,
} from "@shared/schemas/procedure-records.ts";
import { MOVEMENT_KIND_LABELS, type MovementKind } from "@shared/schemas/register.ts";
import {
  ADJUSTMENT_KIND_LABELS,
  VOIDABLE_KIND_LABELS,
  type VisitEvent,
  type VoidableKind,
  type VoidBody,
} from "@shared/schemas/visits.ts";
import type { Database } from "../db/client.ts";
import { getCylinder } from "../db/register.ts";
import {
  adjustments,
  circuitCharges,
  electricalChecks,
  evacuations,
  leakSearches,
  pressureTests,
  readings,
  refrigerantMovements,
  standingPressureChecks,
} from "../db/schema.ts";
import { findVoidEvent, insertVisitEvent } from "../db/visit-events.ts";
import { HttpError, notFound } from "../http/http-error.ts";

/** Each voidable kind's table: all carry id, organisation_id, visit_id and the void columns. */
const TABLES: Record<VoidableKind, PgTable> = {
  reading: readings,
  adjustment: adjustments,
  "electrical-check": electricalChecks,
  "leak-search": leakSearches,
  "standing-pressure": standingPressureChecks,
  "pressure-test": pressureTests,
  evacuation: evacuations,
  movement: refrigerantMovements,
  charging: circuitCharges,
};

/** A voided row as PostgreSQL returns it (snake_case columns, jsonb parsed). */
type RawRow = Record<string, unknown> & { id: string };
type Json = Record<string, unknown>;

const kg = (value: unknown) => `${Number(Number(value).toFixed(3))} kg`;

/** What the audit trail says the record was, in words (times are on the record itself). */
const SUMMARIES: Record<VoidableKind, (row: RawRow) => string> = {
  reading: (row) => {
    const input = row.input as Json;
    return `Reading on circuit ${row.circuit}: suction ${input.suctionPressureKPa} kPa, liquid ${input.liquidPressureKPa} kPa`;
  },
  adjustment: (row) =>
    `${ADJUSTMENT_KIND_LABELS[row.kind as keyof typeof ADJUSTMENT_KIND_LABELS] ?? "Adjustment"}: ${row.description}`,
  "electrical-check": (row) =>
    `Electrical check of the ${ELECTRICAL_TARGET_LABELS[row.target as ElectricalTarget].toLowerCase()}`,
  "leak-search": (row) => `Leak search by ${LEAK_METHOD_LABELS[row.method as LeakMethod].toLowerCase()}`,
  "standing-pressure": (row) => {
    const input = row.input as Json;
    // Typed in psi or °F, the stored SI figures carry long fractions; a tenth is what a gauge shows.
    const tenths = (value: unknown) => Number(Number(value).toFixed(1));
    return `Standing pressure ${tenths(input.standingGaugeKPa)} kPa gauge at ${tenths(input.equalisedTempC)} °C (${input.refrigerant})`;
  },
  "pressure-test": (row) => {
    const input = row.input as Json;
    return `Pressure test: ${input.startGaugeKPa} to ${input.endGaugeKPa} kPa gauge over ${input.holdMinutes} min`;
  },
  evacuation: (row) => `Evacuation to ${row.target_microns} microns (${(row.samples as unknown[]).length} readings)`,
  movement: (row) =>
    `${kg(row.kg)} ${MOVEMENT_KIND_LABELS[row.kind as MovementKind].toLowerCase()}, circuit ${row.circuit}`,
  charging: (row) => `Full weigh-in of circuit ${row.circuit}, line adjustment ${kg(row.line_adjustment_kg)}`,
};

/**
 * The void this body asks for, if this person already made it (same record, same reason): a
 * repeated send is answered with it (README decision 026) whatever the visit's status now.
 */
export const findRepeatedVoid = (
  db: Database,
  organisationId: string,
  visitId: string,
  body: VoidBody,
  actorId: string,
) =>
  findVoidEvent(db, organisationId, visitId, {
    recordKind: body.kind,
    recordId: body.recordId,
    reason: body.reason.trim(),
    actorId,
  });

/**
 * Voids one record of the visit and writes the audit line. 404 when the visit has no such
 * record, 409 when it is already void (unless this same void was made by this person: a repeat,
 * answered with its line) or when voiding it would leave the register impossible.
 */
export async function voidVisitRecord(
  tx: Database,
  organisationId: string,
  visitId: string,
  body: VoidBody,
  actorId: string,
): Promise<{ event: VisitEvent; replayed: boolean }> {
  const table = TABLES[body.kind];
  // Rows a CSV import is still staging are not records yet, so they cannot be voided.
  const recordsOnly = body.kind === "reading" ? sql`and pending_import_id is null` : sql``;
  const updated = await tx.execute<RawRow>(sql`
    update ${table} set voided_at = now(), voided_by = ${actorId}, void_reason = ${body.reason.trim()}
    where id = ${body.recordId} and organisation_id = ${organisationId} and visit_id = ${visitId} and voided_at is null ${recordsOnly}
    returning *`);
  const row = updated.rows[0];
  if (!row) {
    const found = await tx.execute(
      sql`select 1 from ${table} where id = ${body.recordId} and organisation_id = ${organisationId} and visit_id = ${visitId} ${recordsOnly}`,
    );
    if (found.rows.length > 0) {
      const repeated = await findRepeatedVoid(tx, organisationId, visitId, body, actorId);
      if (repeated) return { event: repeated, replayed: true };
      throw new HttpError(409, `This ${VOIDABLE_KIND_LABELS[body.kind].toLowerCase()} is already void`);
    }
    throw notFound(VOIDABLE_KIND_LABELS[body.kind]);
  }
  if (body.kind === "movement") await requireRegisterStillPossible(tx, organisationId, visitId, row);
  const event = await insertVisitEvent(tx, organisationId, {
    visitId,
    action: "voided",
    recordKind: body.kind,
    recordId: row.id,
    summary: SUMMARIES[body.kind](row),
    reason: body.reason.trim(),
    actorId,
  });
  await voidLinkedChargeEntry(tx, organisationId, visitId, body, row, actorId);
  return { event, replayed: false };
}

/**
 * A charge adjustment and its register movement are one entry: voiding either voids the other
 * with the same reason, in the same transaction, so the run log and the register never show
 * different kilograms. Each void gets its own line in the audit trail.
 */
async function voidLinkedChargeEntry(
  tx: Database,
  organisationId: string,
  visitId: string,
  body: VoidBody,
  row: RawRow,
  actorId: string,
): Promise<void> {
  let linked: { kind: VoidableKind; row: RawRow } | undefined;
  if (body.kind === "adjustment" && typeof row.movement_id === "string") {
    const updated = await tx.execute<RawRow>(sql`
      update ${refrigerantMovements} set voided_at = now(), voided_by = ${actorId}, void_reason = ${body.reason.trim()}
      where id = ${row.movement_id} and organisation_id = ${organisationId} and voided_at is null
      returning *`);
    if (updated.rows[0]) {
      await requireRegisterStillPossible(tx, organisationId, visitId, updated.rows[0]);
      linked = { kind: "movement", row: updated.rows[0] };
    }
  } else if (body.kind === "movement") {
    const updated = await tx.execute<RawRow>(sql`
      update ${adjustments} set voided_at = now(), voided_by = ${actorId}, void_reason = ${body.reason.trim()}
      where movement_id = ${row.id} and organisation_id = ${organisationId} and voided_at is null
      returning *`);
    if (updated.rows[0]) linked = { kind: "adjustment", row: updated.rows[0] };
  }
  if (!linked) return;
  await insertVisitEvent(tx, organisationId, {
    visitId,
    action: "voided",
    recordKind: linked.kind,
    recordId: linked.row.id,
    summary: SUMMARIES[linked.kind](linked.row),
    reason: body.reason.trim(),
    actorId,
  });
}

/**
 * Voiding a movement must leave a register that could have happened: no cylinder holding
 * less than nothing (its recovery voided after it was sent for reclaim), and no more reused
 * on a circuit than was recovered from it. The transaction is rolled back otherwise.
 */
async function requireRegisterStillPossible(
  tx: Database,
  organisationId: string,
  visitId: string,
  row: RawRow,
): Promise<void> {
  if (typeof row.cylinder_id === "string") {
    const cylinder = await getCylinder(tx, organisationId, row.cylinder_id);
    if (cylinder && cylinder.contentsKg < -1e-9) {
      throw new HttpError(
        409,
        `Voiding this would leave ${cylinder.label} holding ${kg(cylinder.contentsKg)} by the register: refrigerant has been drawn from it since. Void the later movement out of it first.`,
      );
    }
  }
  if (row.kind === "recovered") {
    const totals = await tx.execute<{ kind: MovementKind; kg: number }>(sql`
      select kind, sum(kg)::float8 as kg from ${refrigerantMovements}
      where organisation_id = ${organisationId} and visit_id = ${visitId} and circuit = ${row.circuit} and voided_at is null
      group by kind`);
    const total = (kind: MovementKind) => totals.rows.find((entry) => entry.kind === kind)?.kg ?? 0;
    if (total("reused") > total("recovered") + 1e-9) {
      throw new HttpError(
        409,
        `Voiding this would leave more reused on circuit ${row.circuit} (${kg(total("reused"))}) than recovered from it (${kg(total("recovered"))}). Void the reuse first.`,
      );
    }
  }
}
