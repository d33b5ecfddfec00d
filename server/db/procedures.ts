/**
 * Queries for a visit's procedure records (electrical checks, leak searches, standing-pressure
 * checks, pressure tests, evacuations). Callers have already found the visit within their organisation; every insert
 * still carries the organisation id and every read filters by it, so a record of another
 * organisation reads as missing.
 */
import { and, asc, eq, or, sql } from "drizzle-orm";
import type {
  ElectricalCheckInput,
  Evacuation,
  EvacuationResult,
  LeakSearchInput,
  ProcedureSettings,
  StandingPressureRecordInput,
} from "@shared/schemas/procedure-records.ts";
import { ProcedureSettingsSchema } from "@shared/schemas/procedure-records.ts";
import type { ProcedureLimits } from "@shared/schemas/procedures.ts";
import type { Database } from "./client.ts";
import { peopleById, person, voidInfo, type People } from "./people.ts";
import {
  electricalChecks,
  evacuations,
  leakSearches,
  organisations,
  pressureTests,
  standingPressureChecks,
} from "./schema.ts";
import { entryKind, insertEntryOnce, type DeviceEntryValues, type StoredEntry } from "./store-once.ts";

/** The people a record names: who recorded it and who voided it. */
const mentioned = (rows: { recordedBy: string | null; voidedBy: string | null }[]) =>
  rows.flatMap((row) => [row.recordedBy, row.voidedBy]);

/** The organisation's procedure settings (organisations.settings), malformed figures dropped. */
export async function getProcedureSettings(db: Database, organisationId: string): Promise<ProcedureSettings> {
  const [row] = await db
    .select({ settings: organisations.settings })
    .from(organisations)
    .where(eq(organisations.id, organisationId));
  return ProcedureSettingsSchema.parse(row?.settings ?? {});
}

// ---- checks and tests: electrical checks, leak searches, standing-pressure checks, pressure tests

/** A table of one kind of a visit's checks: each row is what was entered (input) and the verdict on it (result). */
export type CheckTable =
  typeof electricalChecks | typeof leakSearches | typeof standingPressureChecks | typeof pressureTests;
type CheckRow<Table extends CheckTable> = Table["$inferSelect"];

/** A stored check as the API shows it. */
interface CheckRecord<Table extends CheckTable> {
  id: string;
  visitId: string;
  takenAt: string;
  recordedBy: ReturnType<typeof person>;
  voided: ReturnType<typeof voidInfo>;
  input: CheckRow<Table>["input"];
  result: CheckRow<Table>["result"];
}

function toCheckRecord<Table extends CheckTable>(row: CheckRow<Table>, people: People): CheckRecord<Table> {
  return {
    id: row.id,
    visitId: row.visitId,
    takenAt: row.takenAt.toISOString(),
    recordedBy: person(people, row.recordedBy),
    voided: voidInfo(row, people),
    input: row.input,
    result: row.result,
  };
}

/**
 * One kind of check: its entries (stored once per client id, decision 026), its list on a visit,
 * and its insert. `indexed` copies the figure of the input a column of its own holds (the
 * electrical check's target, the leak search's method, the standing-pressure check's circuit).
 */
function checkKind<Table extends CheckTable>(
  table: Table,
  indexed: (input: CheckRow<Table>["input"]) => Partial<Table["$inferInsert"]> = () => ({}),
) {
  const entries = entryKind(table, async (db, row: CheckRow<Table>) =>
    toCheckRecord<Table>(row, await peopleById(db, mentioned([row]))),
  );
  async function list(db: Database, organisationId: string, visitId: string): Promise<CheckRecord<Table>[]> {
    const rows = (await db
      .select()
      .from(table as CheckTable)
      .where(and(eq(table.organisationId, organisationId), eq(table.visitId, visitId)))
      .orderBy(asc(table.takenAt))) as CheckRow<Table>[];
    const people = await peopleById(db, mentioned(rows));
    return rows.map((row) => toCheckRecord<Table>(row, people));
  }
  function insert(
    db: Database,
    organisationId: string,
    values: {
      visitId: string;
      input: CheckRow<Table>["input"];
      result: CheckRow<Table>["result"];
      recordedBy: string;
    } & DeviceEntryValues,
  ): Promise<StoredEntry<CheckRecord<Table>>> {
    const row = {
      organisationId,
      visitId: values.visitId,
      ...indexed(values.input),
      input: values.input,
      result: values.result,
      recordedBy: values.recordedBy,
      clientId: values.clientId,
      takenAt: values.takenAt,
    } as Table["$inferInsert"] & { visitId: string; clientId?: string | null };
    return insertEntryOnce(db, entries, row);
  }
  return { entries, list, insert };
}

/** One kind of check (checkKind): what a route stores and lists through. */
export type CheckKind<Table extends CheckTable> = ReturnType<typeof checkKind<Table>>;

export const electricalCheckKind = checkKind(electricalChecks, (input: ElectricalCheckInput) => ({
  target: input.target,
}));
export const leakSearchKind = checkKind(leakSearches, (input: LeakSearchInput) => ({ method: input.method }));
export const standingPressureKind = checkKind(standingPressureChecks, (input: StandingPressureRecordInput) => ({
  circuit: input.circuit,
}));
export const pressureTestKind = checkKind(pressureTests);

// ---- evacuations ----------------------------------------------------------------------------

export type EvacuationRow = typeof evacuations.$inferSelect;

function toEvacuation(row: EvacuationRow, people: People): Evacuation {
  return {
    id: row.id,
    visitId: row.visitId,
    startedAt: row.startedAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    recordedBy: person(people, row.recordedBy),
    targetMicrons: row.targetMicrons,
    isolatedAtMinutes: row.isolatedAtMinutes,
    samples: row.samples,
    clientId: row.clientId,
    note: row.note,
    result: row.result,
    version: row.version,
    voided: voidInfo(row, people),
  };
}

/** Evacuation entries, for storing once per client id and answering a repeated send. */
export const evacuationEntries = entryKind(evacuations, async (db, row) =>
  toEvacuation(row, await peopleById(db, mentioned([row]))),
);

export async function listEvacuations(db: Database, organisationId: string, visitId: string): Promise<Evacuation[]> {
  const rows = await db
    .select()
    .from(evacuations)
    .where(and(eq(evacuations.organisationId, organisationId), eq(evacuations.visitId, visitId)))
    .orderBy(asc(evacuations.startedAt));
  const people = await peopleById(db, mentioned(rows));
  return rows.map((row) => toEvacuation(row, people));
}

/**
 * One evacuation of the given visit, scoped by organisation, named by its id or by the client id
 * the device gave it: an evacuation started without signal has no server id on the device yet,
 * so its readings, sent after it, name it by that (README decision 027). Undefined when not found.
 */
export async function findEvacuation(
  db: Database,
  organisationId: string,
  visitId: string,
  evacuationId: string,
): Promise<EvacuationRow | undefined> {
  const [row] = await db
    .select()
    .from(evacuations)
    .where(
      and(
        eq(evacuations.organisationId, organisationId),
        eq(evacuations.visitId, visitId),
        or(eq(evacuations.id, evacuationId), eq(evacuations.clientId, evacuationId)),
      ),
    )
    // Both are random UUIDs; should one ever equal another's client id, the id wins.
    .orderBy(sql`${evacuations.id} = ${evacuationId} desc`)
    .limit(1);
  return row;
}

export async function insertEvacuation(
  db: Database,
  organisationId: string,
  values: {
    visitId: string;
    targetMicrons: number;
    isolatedAtMinutes: number | null;
    samples: { minutes: number; microns: number }[];
    note: string | null;
    result: EvacuationResult;
    recordedBy: string;
    clientId?: string;
    /** When the pump was started by the device's clock; now by the server's without it. */
    startedAt?: Date;
  },
): Promise<StoredEntry<Evacuation>> {
  return insertEntryOnce(db, evacuationEntries, { ...values, organisationId, result: values.result });
}

/**
 * Changes an evacuation: a new sample, valving off, the target or the note. With `version`
 * (a PATCH's If-Match) it is a change to the record's figures: made only if nobody changed them
 * since (undefined otherwise), and the version moves on. New samples only add to the series, so
 * they leave the version alone and never make another device's copy stale.
 */
export async function updateEvacuation(
  db: Database,
  organisationId: string,
  evacuationId: string,
  values: {
    targetMicrons: number;
    isolatedAtMinutes: number | null;
    samples: EvacuationRow["samples"];
    note: string | null;
    result: EvacuationResult;
  },
  version?: number,
): Promise<Evacuation | undefined> {
  const [row] = await db
    .update(evacuations)
    .set({
      ...values,
      result: values.result,
      ...(version === undefined ? {} : { version: sql`${evacuations.version} + 1` }),
      updatedAt: new Date(),
    })
    .where(
      and(
        eq(evacuations.organisationId, organisationId),
        eq(evacuations.id, evacuationId),
        version === undefined ? undefined : eq(evacuations.version, version),
      ),
    )
    .returning();
  return row ? toEvacuation(row, await peopleById(db, mentioned([row]))) : undefined;
}

/** The organisation's procedure settings with their version (for the company limits page). */
export async function getVersionedProcedureSettings(
  db: Database,
  organisationId: string,
): Promise<{ settings: ProcedureSettings; version: number }> {
  const [row] = await db
    .select({ settings: organisations.settings, version: organisations.settingsVersion })
    .from(organisations)
    .where(eq(organisations.id, organisationId));
  return { settings: ProcedureSettingsSchema.parse(row?.settings ?? {}), version: row?.version ?? 1 };
}

/**
 * Replaces the company's limits with `change(current limits)`, keeping every other setting, if
 * the settings are still at `version`; undefined when someone changed them since.
 */
export async function updateProcedureLimits(
  db: Database,
  organisationId: string,
  change: (limits: ProcedureLimits) => ProcedureLimits,
  version: number,
): Promise<{ settings: ProcedureSettings; version: number } | undefined> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select({ settings: organisations.settings, version: organisations.settingsVersion })
      .from(organisations)
      .where(eq(organisations.id, organisationId))
      .for("update");
    if (!row || row.version !== version) return undefined;
    const procedureLimits = change(ProcedureSettingsSchema.parse(row.settings).procedureLimits ?? {});
    const next = { ...row.settings, procedureLimits };
    await tx
      .update(organisations)
      .set({ settings: next, settingsVersion: row.version + 1, updatedAt: new Date() })
      .where(eq(organisations.id, organisationId));
    return { settings: { procedureLimits }, version: row.version + 1 };
  });
}
