/**
 * Queries for the refrigerant register: cylinders, movements and declared weigh-ins. Every
 * function takes the caller's organisation id; another organisation's records read as missing.
 *
 * A cylinder's contents are derived, never stored: initial contents + movements into it −
 * movements out of it (MOVEMENT_CYLINDER_RULES says which way each kind goes).
 */
import { and, asc, desc, eq, gte, inArray, isNull, lt, sql, type SQL } from "drizzle-orm";
import type { SortDirection } from "@shared/schemas/list-pages.ts";
import {
  MOVEMENT_CYLINDER_RULES,
  MOVEMENT_DIRECTION,
  MOVEMENT_KINDS,
  type CylinderValues,
  type Movement,
  type MovementKind,
  type RunLogChargeCheck,
} from "@shared/schemas/register.ts";
import { CHARGE_ADJUSTMENT_KINDS, type ChargeAdjustmentKind } from "@shared/schemas/visits.ts";
import { alias, type PgSelect } from "drizzle-orm/pg-core";
import type { Database } from "./client.ts";
import { entryKind, insertEntryOnce, type StoredEntry } from "./store-once.ts";
import { afterCursor, cursorColumns, decodeCursor, keysetOrder, pageOf, type SortKeys } from "./keyset.ts";
import { adjustments, circuitCharges, cylinders, equipment, refrigerantMovements, sites, users } from "./schema.ts";
import { oneRow } from "./one-row.ts";

export type CylinderRow = typeof cylinders.$inferSelect & { contentsKg: number };

/** The person who voided a movement (users joined a second time). */
const voiders = alias(users, "voiders");

/** Contents per cylinder id from the register, for the given cylinders. */
async function contentsById(db: Database, rows: (typeof cylinders.$inferSelect)[]): Promise<Map<string, number>> {
  const result = new Map(rows.map((row) => [row.id, row.initialContentsKg]));
  if (rows.length === 0) return result;
  const sums = await db
    .select({
      cylinderId: refrigerantMovements.cylinderId,
      kind: refrigerantMovements.kind,
      kg: sql<number>`sum(${refrigerantMovements.kg})`.mapWith(Number),
    })
    .from(refrigerantMovements)
    // A voided movement never moved anything: it counts in no cylinder's contents.
    .where(
      and(
        inArray(
          refrigerantMovements.cylinderId,
          rows.map((row) => row.id),
        ),
        isNull(refrigerantMovements.voidedAt),
      ),
    )
    .groupBy(refrigerantMovements.cylinderId, refrigerantMovements.kind);
  for (const sum of sums) {
    if (!sum.cylinderId) continue;
    const sign = MOVEMENT_CYLINDER_RULES[sum.kind].intoCylinder ? 1 : -1;
    result.set(sum.cylinderId, (result.get(sum.cylinderId) ?? 0) + sign * sum.kg);
  }
  // Sums of doubles drift in the last digits (0.1 + 0.2); grams are the scale's resolution.
  for (const [id, kg] of result) result.set(id, Math.round(kg * 1000) / 1000);
  return result;
}

export async function listCylinders(
  db: Database,
  organisationId: string,
  filter: { refrigerant?: string } = {},
): Promise<CylinderRow[]> {
  const conditions: SQL[] = [eq(cylinders.organisationId, organisationId)];
  if (filter.refrigerant) conditions.push(eq(cylinders.refrigerant, filter.refrigerant));
  const rows = await db
    .select()
    .from(cylinders)
    .where(and(...conditions))
    .orderBy(asc(cylinders.refrigerant), asc(cylinders.label));
  const contents = await contentsById(db, rows);
  return rows.map((row) => ({ ...row, contentsKg: contents.get(row.id) ?? 0 }));
}

export async function getCylinder(
  db: Database,
  organisationId: string,
  cylinderId: string,
): Promise<CylinderRow | undefined> {
  const [row] = await db
    .select()
    .from(cylinders)
    .where(and(eq(cylinders.organisationId, organisationId), eq(cylinders.id, cylinderId)));
  if (!row) return undefined;
  const contents = await contentsById(db, [row]);
  return { ...row, contentsKg: contents.get(row.id) ?? 0 };
}

/** @returns the new cylinder, or undefined when the organisation already has one with that label. */
export async function createCylinder(
  db: Database,
  organisationId: string,
  values: CylinderValues,
): Promise<CylinderRow | undefined> {
  const [existing] = await db
    .select({ id: cylinders.id })
    .from(cylinders)
    .where(and(eq(cylinders.organisationId, organisationId), sql`lower(${cylinders.label}) = lower(${values.label})`));
  if (existing) return undefined;
  const row = oneRow(
    await db
      .insert(cylinders)
      .values({ ...values, organisationId })
      .returning(),
    "insert cylinder",
  );
  return { ...row, contentsKg: row.initialContentsKg };
}

const movementColumns = {
  id: refrigerantMovements.id,
  visitId: refrigerantMovements.visitId,
  equipmentId: refrigerantMovements.equipmentId,
  equipmentName: equipment.name,
  equipmentLocation: equipment.location,
  siteName: sites.name,
  circuit: refrigerantMovements.circuit,
  refrigerant: refrigerantMovements.refrigerant,
  kind: refrigerantMovements.kind,
  kg: refrigerantMovements.kg,
  cylinderId: refrigerantMovements.cylinderId,
  cylinderLabel: cylinders.label,
  technicianId: refrigerantMovements.technicianId,
  technicianName: users.name,
  at: refrigerantMovements.at,
  note: refrigerantMovements.note,
  voidedAt: refrigerantMovements.voidedAt,
  voidReason: refrigerantMovements.voidReason,
  voidedByName: voiders.name,
  voidedBy: refrigerantMovements.voidedBy,
};

export type MovementRow = Movement & { siteName: string | null; location: string | null };

function selectMovements(db: Database, conditions: SQL[]) {
  return withMovementJoins(db.select(movementColumns).from(refrigerantMovements).$dynamic(), conditions);
}

/** The register's page: the movements with their sort keys as text, for the next cursor. */
function selectRegisterPage(db: Database, conditions: SQL[]) {
  return withMovementJoins(
    db
      .select({ ...movementColumns, ...cursorColumns(REGISTER_KEYS) })
      .from(refrigerantMovements)
      .$dynamic(),
    conditions,
  );
}

function withMovementJoins<Query extends PgSelect>(query: Query, conditions: SQL[]) {
  return query
    .leftJoin(equipment, eq(equipment.id, refrigerantMovements.equipmentId))
    .leftJoin(sites, eq(sites.id, equipment.siteId))
    .leftJoin(cylinders, eq(cylinders.id, refrigerantMovements.cylinderId))
    .leftJoin(users, eq(users.id, refrigerantMovements.technicianId))
    .leftJoin(voiders, eq(voiders.id, refrigerantMovements.voidedBy))
    .where(and(...conditions));
}

function toMovement(row: Awaited<ReturnType<typeof selectMovements>>[number]): MovementRow {
  return {
    id: row.id,
    visitId: row.visitId,
    equipmentId: row.equipmentId,
    equipmentName: row.equipmentName,
    circuit: row.circuit,
    refrigerant: row.refrigerant,
    kind: row.kind,
    kg: row.kg,
    cylinder: row.cylinderId && row.cylinderLabel ? { id: row.cylinderId, label: row.cylinderLabel } : null,
    technician: row.technicianId && row.technicianName ? { id: row.technicianId, name: row.technicianName } : null,
    at: row.at.toISOString(),
    note: row.note,
    voided: row.voidedAt
      ? {
          at: row.voidedAt.toISOString(),
          by: row.voidedBy && row.voidedByName ? { id: row.voidedBy, name: row.voidedByName } : null,
          reason: row.voidReason ?? "",
        }
      : null,
    siteName: row.siteName,
    location: row.equipmentLocation,
  };
}

export async function visitMovements(db: Database, organisationId: string, visitId: string): Promise<MovementRow[]> {
  const rows = await selectMovements(db, [
    eq(refrigerantMovements.organisationId, organisationId),
    eq(refrigerantMovements.visitId, visitId),
  ]).orderBy(asc(refrigerantMovements.at), asc(refrigerantMovements.createdAt));
  return rows.map(toMovement);
}

export async function equipmentMovements(
  db: Database,
  organisationId: string,
  equipmentId: string,
): Promise<MovementRow[]> {
  const rows = await selectMovements(db, [
    eq(refrigerantMovements.organisationId, organisationId),
    eq(refrigerantMovements.equipmentId, equipmentId),
  ]).orderBy(asc(refrigerantMovements.at), asc(refrigerantMovements.createdAt));
  return rows.map(toMovement);
}

export async function cylinderMovements(
  db: Database,
  organisationId: string,
  cylinderId: string,
): Promise<MovementRow[]> {
  const rows = await selectMovements(db, [
    eq(refrigerantMovements.organisationId, organisationId),
    eq(refrigerantMovements.cylinderId, cylinderId),
  ]).orderBy(desc(refrigerantMovements.at), desc(refrigerantMovements.createdAt));
  return rows.map(toMovement);
}

export interface RegisterFilter {
  /** Inclusive start, ms since epoch. */
  fromMs?: number;
  /** Exclusive end, ms since epoch. */
  toMs?: number;
  technicianId?: string;
}

/**
 * The register's lines for a period: voided movements are left out, since the register, its
 * totals and its export hold what really moved.
 */
function registerConditions(organisationId: string, filter: RegisterFilter): SQL[] {
  const conditions: SQL[] = [
    eq(refrigerantMovements.organisationId, organisationId),
    isNull(refrigerantMovements.voidedAt),
  ];
  if (filter.fromMs !== undefined) conditions.push(gte(refrigerantMovements.at, new Date(filter.fromMs)));
  if (filter.toMs !== undefined) conditions.push(lt(refrigerantMovements.at, new Date(filter.toMs)));
  if (filter.technicianId) conditions.push(eq(refrigerantMovements.technicianId, filter.technicianId));
  return conditions;
}

/**
 * The register's order: by date, then by when the line was entered (two movements logged for
 * the same minute keep the order they were typed in), then by id. Oldest first is the order a
 * regulator's record reads in; the screen may ask for newest first. Each key has an index over
 * the standing lines (refrigerant_movements_register_idx and its per-technician twin).
 */
const REGISTER_KEYS: SortKeys = [
  { expr: refrigerantMovements.at, type: "timestamptz" },
  { expr: refrigerantMovements.createdAt, type: "timestamptz" },
];
const REGISTER_SORT = "at";

export interface RegisterPageRequest extends RegisterFilter {
  direction: SortDirection;
  /** A `nextCursor` this function gave out for the same direction. */
  cursor?: string;
  limit: number;
}

/**
 * One page of the register after `request.cursor`: the database reads the page's lines in index
 * order from the cursor, so a page costs the same on the first day and after ten years of lines.
 * @throws HttpError 400 for a cursor this list did not give out
 */
export async function registerPage(
  db: Database,
  organisationId: string,
  request: RegisterPageRequest,
): Promise<{ rows: MovementRow[]; nextCursor: string | null }> {
  const conditions = registerConditions(organisationId, request);
  if (request.cursor) {
    conditions.push(
      afterCursor(
        REGISTER_KEYS,
        refrigerantMovements.id,
        request.direction,
        decodeCursor(request.cursor, REGISTER_SORT, request.direction, REGISTER_KEYS),
      ),
    );
  }
  const rows = await selectRegisterPage(db, conditions)
    .orderBy(...keysetOrder(REGISTER_KEYS, refrigerantMovements.id, request.direction))
    .limit(request.limit + 1);
  const { page, nextCursor } = pageOf(rows, request.limit, REGISTER_KEYS, REGISTER_SORT, request.direction);
  return { rows: page.map(toMovement), nextCursor };
}

/**
 * Every line of the period, oldest first, `chunkSize` lines at a time: the CSV export writes each
 * chunk before reading the next, so its memory stays one chunk whatever the register's size, and
 * other requests reach the database between chunks.
 */
export async function* registerChunks(
  db: Database,
  organisationId: string,
  filter: RegisterFilter,
  chunkSize: number,
  firstChunkSize = chunkSize,
): AsyncGenerator<MovementRow[]> {
  let cursor: string | undefined;
  let limit = firstChunkSize;
  do {
    const { rows, nextCursor } = await registerPage(db, organisationId, { ...filter, direction: "asc", cursor, limit });
    limit = chunkSize;
    if (rows.length > 0) yield rows;
    cursor = nextCursor ?? undefined;
  } while (cursor);
}

/** The register for a period, oldest first, whole: for callers that need every line at once (tests, small periods). */
export async function registerMovements(
  db: Database,
  organisationId: string,
  filter: RegisterFilter,
): Promise<MovementRow[]> {
  const rows = await selectMovements(db, registerConditions(organisationId, filter)).orderBy(
    ...keysetOrder(REGISTER_KEYS, refrigerantMovements.id, "asc"),
  );
  return rows.map(toMovement);
}

export interface RegisterTotal {
  refrigerant: string;
  kind: MovementKind;
  kg: number;
}

/**
 * Kilograms by refrigerant and kind over every line of the period (not only the page shown),
 * summed in the database: one row per refrigerant and kind comes back, however many lines there
 * are. Rounded to grams, the scale's resolution (TRADE.md §6 weigh-in: about ±28 g). Ordered by
 * refrigerant, then kind in MOVEMENT_KINDS order (recovered before reused before added…).
 */
export async function registerTotals(
  db: Database,
  organisationId: string,
  filter: RegisterFilter,
): Promise<RegisterTotal[]> {
  const kindOrder = sql`array_position(array[${sql.join(
    MOVEMENT_KINDS.map((kind) => sql`${kind}`),
    sql`, `,
  )}]::text[], ${refrigerantMovements.kind})`;
  const rows = await db
    .select({
      refrigerant: refrigerantMovements.refrigerant,
      kind: refrigerantMovements.kind,
      kg: sql<number>`round(sum(${refrigerantMovements.kg})::numeric, 3)`.mapWith(Number),
    })
    .from(refrigerantMovements)
    .where(and(...registerConditions(organisationId, filter)))
    .groupBy(refrigerantMovements.refrigerant, refrigerantMovements.kind)
    .orderBy(asc(refrigerantMovements.refrigerant), kindOrder);
  return rows;
}

export interface MovementInsert {
  visitId: string | null;
  equipmentId: string | null;
  circuit: number | null;
  refrigerant: string;
  kind: MovementKind;
  kg: number;
  cylinderId: string | null;
  technicianId: string;
  at?: Date;
  note: string | null;
}

/** Register movements of visits, for storing once per client id and answering a repeated send. */
export const movementEntries = entryKind(refrigerantMovements, async (db, row) =>
  toMovement(oneRow(await selectMovements(db, [eq(refrigerantMovements.id, row.id)]), "select stored movement")),
);

/**
 * Stores a movement, once per client id on a visit (README decision 026): a movement the visit
 * already holds under the id is answered instead, with `replayed`.
 */
export async function insertMovement(
  db: Database,
  organisationId: string,
  values: MovementInsert & { clientId?: string },
): Promise<StoredEntry<MovementRow>> {
  return insertEntryOnce(db, movementEntries, { ...values, organisationId });
}

/** The standing (not voided) full weigh-in declarations of a visit's circuits. */
export async function visitCircuitCharges(db: Database, organisationId: string, visitId: string) {
  return db
    .select({
      id: circuitCharges.id,
      circuit: circuitCharges.circuit,
      lineAdjustmentKg: circuitCharges.lineAdjustmentKg,
    })
    .from(circuitCharges)
    .where(
      and(
        eq(circuitCharges.organisationId, organisationId),
        eq(circuitCharges.visitId, visitId),
        isNull(circuitCharges.voidedAt),
      ),
    );
}

/**
 * Declares a full weigh-in of one circuit. A standing declaration with another line
 * adjustment is voided first, saying what changed, so the earlier figure is kept; the same
 * figure again changes nothing. Call under the visit's lock (writeToVisit).
 * @returns the void of the replaced declaration, for the audit trail, if there was one
 */
export async function declareCircuitCharge(
  db: Database,
  organisationId: string,
  values: { visitId: string; circuit: number; lineAdjustmentKg: number; recordedBy: string },
): Promise<{ replacedId: string; reason: string } | null> {
  const [standing] = (await visitCircuitCharges(db, organisationId, values.visitId)).filter(
    (charge) => charge.circuit === values.circuit,
  );
  if (standing && standing.lineAdjustmentKg === values.lineAdjustmentKg) return null;
  let replaced: { replacedId: string; reason: string } | null = null;
  if (standing) {
    const reason = `Replaced: line adjustment ${standing.lineAdjustmentKg} kg changed to ${values.lineAdjustmentKg} kg`;
    await db
      .update(circuitCharges)
      .set({ voidedAt: new Date(), voidedBy: values.recordedBy, voidReason: reason, updatedAt: new Date() })
      .where(eq(circuitCharges.id, standing.id));
    replaced = { replacedId: standing.id, reason };
  }
  await db.insert(circuitCharges).values({ ...values, organisationId });
  return replaced;
}

/**
 * Voids a reclaim (a movement with no visit) of a cylinder. Voiding takes nothing out of the
 * cylinder that is not in it: a reclaim only ever took refrigerant out, so it gives it back.
 * @returns the voided movement, or why it was not voided
 */
export async function voidReclaim(
  db: Database,
  organisationId: string,
  values: { cylinderId: string; movementId: string; reason: string; voidedBy: string },
): Promise<MovementRow | "missing" | "on-a-visit" | "already-void"> {
  const [row] = await db
    .select({ visitId: refrigerantMovements.visitId, voidedAt: refrigerantMovements.voidedAt })
    .from(refrigerantMovements)
    .where(
      and(
        eq(refrigerantMovements.organisationId, organisationId),
        eq(refrigerantMovements.cylinderId, values.cylinderId),
        eq(refrigerantMovements.id, values.movementId),
      ),
    );
  if (!row) return "missing";
  if (row.visitId) return "on-a-visit";
  const voided = await db
    .update(refrigerantMovements)
    .set({ voidedAt: new Date(), voidedBy: values.voidedBy, voidReason: values.reason })
    .where(and(eq(refrigerantMovements.id, values.movementId), isNull(refrigerantMovements.voidedAt)))
    .returning({ id: refrigerantMovements.id });
  if (voided.length === 0) return "already-void";
  const movements = await selectMovements(db, [eq(refrigerantMovements.id, values.movementId)]);
  return toMovement(oneRow(movements, "select voided movement"));
}

/** A member of the organisation by id (for the technician filter), or undefined. */
export async function findMember(db: Database, organisationId: string, userId: string) {
  const [row] = await db
    .select({ id: users.id, name: users.name })
    .from(users)
    .where(and(eq(users.organisationId, organisationId), eq(users.id, userId)));
  return row;
}

const grams = (value: number) => Math.round(value * 1000) / 1000;

/**
 * The visit's run-log charge adjustments beside its register movements (RunLogChargeCheckSchema).
 * Linked adjustments carry their movement's kilograms, so the totals agree unless a row was
 * changed outside Satura; the report prints the check either way. Unlinked adjustments (stored
 * before entries were linked) are listed for the reader and counted nowhere.
 */
export async function runLogChargeCheck(
  db: Database,
  organisationId: string,
  visitId: string,
  movements: readonly Movement[],
): Promise<RunLogChargeCheck> {
  const rows = await db
    .select({
      id: adjustments.id,
      at: adjustments.at,
      circuit: adjustments.circuit,
      kind: adjustments.kind,
      amountKg: adjustments.amountKg,
      movementId: adjustments.movementId,
    })
    .from(adjustments)
    .where(
      and(
        eq(adjustments.organisationId, organisationId),
        eq(adjustments.visitId, visitId),
        inArray(adjustments.kind, [...CHARGE_ADJUSTMENT_KINDS]),
        isNull(adjustments.voidedAt),
      ),
    )
    .orderBy(asc(adjustments.at));
  const linked = rows.filter((row) => row.movementId !== null);
  const sumOf = (kind: string) =>
    grams(linked.filter((row) => row.kind === kind).reduce((sum, row) => sum + (row.amountKg ?? 0), 0));
  const standing = movements.filter((movement) => movement.voided === null && movement.kind !== "sent-for-reclaim");
  const registerOf = (direction: string) =>
    grams(
      standing
        .filter((movement) => MOVEMENT_DIRECTION[movement.kind as keyof typeof MOVEMENT_DIRECTION] === direction)
        .reduce((sum, movement) => sum + movement.kg, 0),
    );
  const check = {
    runLogInKg: sumOf("charge-added"),
    runLogOutKg: sumOf("charge-removed"),
    registerInKg: registerOf("charge-added"),
    registerOutKg: registerOf("charge-removed"),
  };
  return {
    ...check,
    agrees: check.runLogInKg === check.registerInKg && check.runLogOutKg === check.registerOutKg,
    unlinked: rows
      .filter((row) => row.movementId === null && row.amountKg !== null)
      .map((row) => ({
        id: row.id,
        at: row.at.toISOString(),
        circuit: row.circuit,
        kind: row.kind as ChargeAdjustmentKind,
        amountKg: row.amountKg!,
      })),
  };
}
