/**
 * Queries for a visit's procedure records (electrical checks, leak searches, standing-pressure
 * checks, pressure tests, evacuations). Callers have already found the visit within their organisation; every insert
 * still carries the organisation id and every read filters by it, so a record of another
 * organisation reads as missing.
 */
import { and, asc, eq, or, sql } from "drizzle-orm";
import type {
  ElectricalCheck,
  ElectricalCheckInput,
  ElectricalCheckResult,
  Evacuation,
  EvacuationResult,
  LeakSearch,
  LeakSearchInput,
  PressureTest,
  PressureTestRecordInput,
  PressureTestRecordResult,
  ProcedureSettings,
  StandingPressureCheck,
  StandingPressureRecordInput,
} from "@shared/schemas/procedure-records.ts";
import { ProcedureSettingsSchema } from "@shared/schemas/procedure-records.ts";
import type { StandingPressureResult, Verdict } from "@shared/schemas/procedures.ts";
import type { Database } from "./client.ts";
import { peopleById, person, voidInfo, type People } from "./people.ts";
import { electricalChecks, evacuations, leakSearches, organisations, pressureTests, standingPressureChecks } from "./schema.ts";
import { entryKind, insertEntryOnce, type DeviceEntryValues, type StoredEntry } from "./store-once.ts";

/** The people a record names: who recorded it and who voided it. */
const mentioned = (rows: { recordedBy: string | null; voidedBy: string | null }[]) => rows.flatMap((row) => [row.recordedBy, row.voidedBy]);

/** The organisation's procedure settings (organisations.settings), malformed figures dropped. */
export async function getProcedureSettings(db: Database, organisationId: string): Promise<ProcedureSettings> {
  const [row] = await db.select({ settings: organisations.settings }).from(organisations).where(eq(organisations.id, organisationId));
  return ProcedureSettingsSchema.parse(row?.settings ?? {});
}

// ---- electrical checks ----------------------------------------------------------------------

function toElectricalCheck(row: typeof electricalChecks.$inferSelect, people: People): ElectricalCheck {
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

/** ElectricalCheck entries, for storing once per client id and answering a repeated send. */
export const electricalCheckEntries = entryKind(electricalChecks, async (db, row) => toElectricalCheck(row, await peopleById(db, mentioned([row]))));

export async function listElectricalChecks(db: Database, organisationId: string, visitId: string): Promise<ElectricalCheck[]> {
  const rows = await db
    .select()
    .from(electricalChecks)
    .where(and(eq(electricalChecks.organisationId, organisationId), eq(electricalChecks.visitId, visitId)))
    .orderBy(asc(electricalChecks.takenAt));
  const people = await peopleById(db, mentioned(rows));
  return rows.map((row) => toElectricalCheck(row, people));
}

export async function insertElectricalCheck(
  db: Database,
  organisationId: string,
  values: { visitId: string; input: ElectricalCheckInput; result: ElectricalCheckResult; recordedBy: string } & DeviceEntryValues,
): Promise<StoredEntry<ElectricalCheck>> {
  return insertEntryOnce(db, electricalCheckEntries, {
    organisationId,
    visitId: values.visitId,
    target: values.input.target,
    input: values.input,
    result: values.result,
    recordedBy: values.recordedBy,
    clientId: values.clientId,
    takenAt: values.takenAt,
  });
}

// ---- leak searches --------------------------------------------------------------------------

function toLeakSearch(row: typeof leakSearches.$inferSelect, people: People): LeakSearch {
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

/** LeakSearch entries, for storing once per client id and answering a repeated send. */
export const leakSearchEntries = entryKind(leakSearches, async (db, row) => toLeakSearch(row, await peopleById(db, mentioned([row]))));

export async function listLeakSearches(db: Database, organisationId: string, visitId: string): Promise<LeakSearch[]> {
  const rows = await db
    .select()
    .from(leakSearches)
    .where(and(eq(leakSearches.organisationId, organisationId), eq(leakSearches.visitId, visitId)))
    .orderBy(asc(leakSearches.takenAt));
  const people = await peopleById(db, mentioned(rows));
  return rows.map((row) => toLeakSearch(row, people));
}

export async function insertLeakSearch(
  db: Database,
  organisationId: string,
  values: { visitId: string; input: LeakSearchInput; result: Verdict; recordedBy: string } & DeviceEntryValues,
): Promise<StoredEntry<LeakSearch>> {
  return insertEntryOnce(db, leakSearchEntries, {
    organisationId,
    visitId: values.visitId,
    method: values.input.method,
    input: values.input,
    result: values.result,
    recordedBy: values.recordedBy,
    clientId: values.clientId,
    takenAt: values.takenAt,
  });
}

// ---- standing-pressure checks ---------------------------------------------------------------

function toStandingPressureCheck(row: typeof standingPressureChecks.$inferSelect, people: People): StandingPressureCheck {
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

/** StandingPressureCheck entries, for storing once per client id and answering a repeated send. */
export const standingPressureCheckEntries = entryKind(standingPressureChecks, async (db, row) => toStandingPressureCheck(row, await peopleById(db, mentioned([row]))));

export async function listStandingPressureChecks(db: Database, organisationId: string, visitId: string): Promise<StandingPressureCheck[]> {
  const rows = await db
    .select()
    .from(standingPressureChecks)
    .where(and(eq(standingPressureChecks.organisationId, organisationId), eq(standingPressureChecks.visitId, visitId)))
    .orderBy(asc(standingPressureChecks.takenAt));
  const people = await peopleById(db, mentioned(rows));
  return rows.map((row) => toStandingPressureCheck(row, people));
}

export async function insertStandingPressureCheck(
  db: Database,
  organisationId: string,
  values: { visitId: string; input: StandingPressureRecordInput; result: StandingPressureResult; recordedBy: string } & DeviceEntryValues,
): Promise<StoredEntry<StandingPressureCheck>> {
  return insertEntryOnce(db, standingPressureCheckEntries, {
    organisationId,
    visitId: values.visitId,
    circuit: values.input.circuit,
    input: values.input,
    result: values.result,
    recordedBy: values.recordedBy,
    clientId: values.clientId,
    takenAt: values.takenAt,
  });
}

// ---- pressure tests -------------------------------------------------------------------------

function toPressureTest(row: typeof pressureTests.$inferSelect, people: People): PressureTest {
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

/** PressureTest entries, for storing once per client id and answering a repeated send. */
export const pressureTestEntries = entryKind(pressureTests, async (db, row) => toPressureTest(row, await peopleById(db, mentioned([row]))));

export async function listPressureTests(db: Database, organisationId: string, visitId: string): Promise<PressureTest[]> {
  const rows = await db
    .select()
    .from(pressureTests)
    .where(and(eq(pressureTests.organisationId, organisationId), eq(pressureTests.visitId, visitId)))
    .orderBy(asc(pressureTests.takenAt));
  const people = await peopleById(db, mentioned(rows));
  return rows.map((row) => toPressureTest(row, people));
}

export async function insertPressureTest(
  db: Database,
  organisationId: string,
  values: { visitId: string; input: PressureTestRecordInput; result: PressureTestRecordResult; recordedBy: string } & DeviceEntryValues,
): Promise<StoredEntry<PressureTest>> {
  return insertEntryOnce(db, pressureTestEntries, {
    organisationId,
    visitId: values.visitId,
    input: values.input,
    result: values.result,
    recordedBy: values.recordedBy,
    clientId: values.clientId,
    takenAt: values.takenAt,
  });
}

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
export const evacuationEntries = entryKind(evacuations, async (db, row) => toEvacuation(row, await peopleById(db, mentioned([row]))));

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
export async function findEvacuation(db: Database, organisationId: string, visitId: string, evacuationId: string): Promise<EvacuationRow | undefined> {
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
  values: { targetMicrons: number; isolatedAtMinutes: number | null; samples: EvacuationRow["samples"]; note: string | null; result: EvacuationResult },
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
export async function getVersionedProcedureSettings(db: Database, organisationId: string): Promise<{ settings: ProcedureSettings; version: number }> {
  const [row] = await db
    .select({ settings: organisations.settings, version: organisations.settingsVersion })
    .from(organisations)
    .where(eq(organisations.id, organisationId));
  return { settings: ProcedureSettingsSchema.parse(row?.settings ?? {}), version: row?.version ?? 1 };
}

/**
 * Changes only the overrides named in `update` (a null clears one), keeping every other
 * setting, if the settings are still at `version`; undefined when someone changed them since.
 */
export async function updateProcedureSettings(
  db: Database,
  organisationId: string,
  update: { evacuationTargetMicrons?: number | null; pressureTestAllowedDropKPa?: number | null },
  version: number,
): Promise<{ settings: ProcedureSettings; version: number } | undefined> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select({ settings: organisations.settings, version: organisations.settingsVersion })
      .from(organisations)
      .where(eq(organisations.id, organisationId))
      .for("update");
    if (!row || row.version !== version) return undefined;
    const next: Record<string, unknown> = { ...row.settings };
    for (const [key, value] of Object.entries(update)) {
      if (value === undefined) continue;
      if (value === null) delete next[key];
      else next[key] = value;
    }
    await tx
      .update(organisations)
      .set({ settings: next, settingsVersion: row.version + 1, updatedAt: new Date() })
      .where(eq(organisations.id, organisationId));
    return { settings: ProcedureSettingsSchema.parse(next), version: row.version + 1 };
  });
}
