/**
 * Queries for visits and their run log. Every function takes the caller's organisation id;
 * a visit of another organisation reads as missing.
 */
import {
  and,
  asc,
  desc,
  eq,
  gt,
  inArray,
  isNotNull,
  isNull,
  lt,
  max,
  sql,
  type AnyColumn,
  type SQL,
} from "drizzle-orm";
import { unionAll } from "drizzle-orm/pg-core";
import { searchTerms, type SearchTerm } from "@shared/format/search-terms.ts";
import type { DiagnosisInput, DiagnosisResult } from "@shared/schemas/diagnosis.ts";
import { defaultDirection, type VisitListQuery, type VisitPage, type VisitSort } from "@shared/schemas/list-pages.ts";
import {
  MAX_READINGS_PAGE_SIZE,
  READINGS_PAGE_SIZE,
  visitReasonText,
  type Adjustment,
  type Comment,
  type Photo,
  type Reading,
  type ReadingsPage,
  type Visit,
  type VisitDelta,
  type VisitStatus,
  type VisitSummary,
} from "@shared/schemas/visits.ts";
import { circuitLogs } from "../visits/circuit-logs.ts";
import { siteAtmosphere } from "../visits/reading-input.ts";
import { visitRevisionToken } from "../visits/visit-revision.ts";
import type { Database } from "./client.ts";
import { circuitReadingsPage } from "./circuit-readings.ts";
import {
  afterCursor,
  containsTerm,
  cursorColumns,
  decodeCursor,
  keysetOrder,
  pageOf,
  type SortKeys,
} from "./keyset.ts";
import { peopleById, person, voidInfo, type People } from "./people.ts";
import { entryKind, insertEntryOnce, type DeviceEntryValues, type StoredEntry } from "./store-once.ts";
import {
  adjustments,
  customers,
  equipment,
  photos,
  readings,
  sites,
  users,
  visitComments,
  visitEvents,
  visitReadingRecorders,
  visitSearch,
  visitTechnicians,
  visits,
} from "./schema.ts";
import { oneRow } from "./one-row.ts";
import { insertVisitEvent, listVisitEvents } from "./visit-events.ts";

/** Readings that are records: not rows of a CSV import still being stored (see readings.pendingImportId). */
const isRecord = isNull(readings.pendingImportId);
/** Readings that count in results: records not voided. */
export const countsInResults = and(isRecord, isNull(readings.voidedAt));

const summaryColumns = {
  id: visits.id,
  equipmentId: visits.equipmentId,
  equipmentName: equipment.name,
  siteName: sites.name,
  customerName: customers.name,
  refrigerant: equipment.refrigerant,
  reason: visits.reason,
  status: visits.status,
  startedAt: visits.startedAt,
};

/** A list's row: the summary's own columns and the stored reading count (migration visit_reading_count). */
const listColumns = { ...summaryColumns, readingCount: visits.readingCount };

type SummaryExtra = Pick<VisitSummary, "readingCount" | "technicians" | "yourLastActivityAt">;

/**
 * When one person last recorded anything on each of these visits: readings (their latest time is
 * stored per visit and recorder, migration visit_reading_count, so a logger's thousands of
 * readings are not read), adjustments, comments and the trail's events (started, submitted,
 * voided, imported…), in one query.
 */
async function lastActivityOf(db: Database, viewerId: string, ids: string[]): Promise<Map<string, Date>> {
  const rows = await unionAll(
    db
      .select({ visitId: adjustments.visitId, at: max(adjustments.createdAt) })
      .from(adjustments)
      .where(and(inArray(adjustments.visitId, ids), eq(adjustments.recordedBy, viewerId)))
      .groupBy(adjustments.visitId),
    db
      .select({ visitId: visitComments.visitId, at: max(visitComments.createdAt) })
      .from(visitComments)
      .where(and(inArray(visitComments.visitId, ids), eq(visitComments.authorId, viewerId)))
      .groupBy(visitComments.visitId),
    db
      .select({ visitId: visitEvents.visitId, at: max(visitEvents.at) })
      .from(visitEvents)
      .where(and(inArray(visitEvents.visitId, ids), eq(visitEvents.actorId, viewerId)))
      .groupBy(visitEvents.visitId),
    db
      .select({ visitId: visitReadingRecorders.visitId, at: visitReadingRecorders.lastRecordedAt })
      .from(visitReadingRecorders)
      .where(and(inArray(visitReadingRecorders.visitId, ids), eq(visitReadingRecorders.userId, viewerId))),
  );
  const latest = new Map<string, Date>();
  for (const row of rows) {
    if (!row.at) continue;
    const at = new Date(row.at);
    const seen = latest.get(row.visitId);
    if (!seen || at > seen) latest.set(row.visitId, at);
  }
  return latest;
}

/**
 * The crew and the viewer's last activity of each listed visit, for the page's rows only. The
 * reading count comes with the rows themselves (visits.reading_count, kept by triggers).
 */
async function summarise(
  db: Database,
  rows: { id: string; readingCount: number }[],
  viewerId?: string,
): Promise<Map<string, SummaryExtra>> {
  const ids = rows.map((row) => row.id);
  const result = new Map<string, SummaryExtra>();
  if (ids.length === 0) return result;
  const crew = await db
    .select({ visitId: visitTechnicians.visitId, id: users.id, name: users.name })
    .from(visitTechnicians)
    .innerJoin(users, eq(users.id, visitTechnicians.userId))
    .where(inArray(visitTechnicians.visitId, ids))
    .orderBy(asc(users.name));
  const activity = viewerId ? await lastActivityOf(db, viewerId, ids) : new Map<string, Date>();
  for (const row of rows)
    result.set(row.id, {
      readingCount: row.readingCount,
      technicians: [],
      yourLastActivityAt: activity.get(row.id)?.toISOString() ?? null,
    });
  for (const row of crew) result.get(row.visitId)!.technicians.push({ id: row.id, name: row.name });
  return result;
}

export interface VisitFilter {
  status?: VisitStatus;
  equipmentId?: string;
}

/**
 * Each sort's keys and the id that breaks ties, each pair with an index in that order: visits
 * (organisation_id, started_at) and (organisation_id, status, id); visit_search (organisation_id,
 * unit_name, visit_id) and (organisation_id, reason, visit_id), whose keys are lower(): the table
 * sorted "a" with "A" before, where Postgres would put every capital first.
 */
const VISIT_SORTS: Record<VisitSort, { keys: SortKeys; id: AnyColumn }> = {
  startedAt: { keys: [{ expr: visits.startedAt, type: "timestamptz" }], id: visits.id },
  equipmentName: { keys: [{ expr: visitSearch.unitName, type: "text" }], id: visitSearch.visitId },
  reason: { keys: [{ expr: visitSearch.reason, type: "text" }], id: visitSearch.visitId },
  status: { keys: [{ expr: visits.status, type: "text" }], id: visits.id },
};

/**
 * The visits one search word finds: in their unit, site, customer, refrigerant or reason
 * (visit_search, through its trigram index), or in the name of someone on their crew
 * (visit_technicians by person). Both read an index, so a rare word reads few rows.
 */
function visitsMatching(organisationId: string, term: SearchTerm): SQL {
  return sql`select ${visitSearch.visitId} from ${visitSearch} where ${visitSearch.organisationId} = ${organisationId} and ${containsTerm(visitSearch.searchText, term)}
    union all
    select ${visitTechnicians.visitId} from ${visitTechnicians} inner join ${users} on ${users.id} = ${visitTechnicians.userId}
    where ${users.organisationId} = ${organisationId} and strpos(lower(${users.name}), ${term.word}) > 0`;
}

/**
 * Up to this many matches, a search reads its visits by id and sorts them; beyond it, the page
 * walks the sort's index and keeps the rows that match, which then come often enough to fill a
 * page soon. Either way a search costs about its matches or a page, never every visit.
 */
export const SEARCH_BY_ID_LIMIT = 2000;

/** The visits every word finds, or null when there are more than SEARCH_BY_ID_LIMIT. */
async function searchedVisitIds(db: Database, organisationId: string, terms: SearchTerm[]): Promise<string[] | null> {
  const everyWord = sql.join(
    terms.map((term) => sql`(${visitsMatching(organisationId, term)})`),
    sql` intersect `,
  );
  const { rows } = await db.execute<{ visit_id: string }>(
    sql`select visit_id from (${everyWord}) as found limit ${SEARCH_BY_ID_LIMIT + 1}`,
  );
  return rows.length > SEARCH_BY_ID_LIMIT ? null : rows.map((row) => row.visit_id);
}

/**
 * The same word, row by row, for a page read in index order (many matches). The crew's half
 * looks up this visit's crew (correlated), so the planner keeps walking the sort's index and
 * stops at a page, where an uncorrelated set would lead it to join and sort every visit.
 */
const rowMatches = (term: SearchTerm) =>
  sql`(${containsTerm(visitSearch.searchText, term)} or exists (select 1 from ${visitTechnicians} inner join ${users} on ${users.id} = ${visitTechnicians.userId} where ${visitTechnicians.visitId} = ${visits.id} and strpos(lower(${users.name}), ${term.word}) > 0))`;

/**
 * One page of the organisation's visits in the asked order, after `query.cursor`. Reading
 * counts, crew and the viewer's last activity are gathered for the page's rows only (at most
 * `query.limit` ids), so the cost follows the page, not the organisation.
 */
export async function listVisitPage(
  db: Database,
  organisationId: string,
  query: VisitListQuery,
  viewerId: string,
): Promise<VisitPage> {
  const direction = query.dir ?? defaultDirection(query.sort);
  const { keys, id } = VISIT_SORTS[query.sort];
  // Both rows' organisation: the unit-name and reason sorts read visit_search's index from it.
  const conditions: (SQL | undefined)[] = [
    eq(visits.organisationId, organisationId),
    eq(visitSearch.organisationId, organisationId),
  ];
  if (query.status) {
    const [only] = query.status;
    conditions.push(query.status.length === 1 && only ? eq(visits.status, only) : inArray(visits.status, query.status));
  }
  if (query.equipmentId) conditions.push(eq(visits.equipmentId, query.equipmentId));
  if (query.crew === "me") {
    conditions.push(
      sql`exists (select 1 from ${visitTechnicians} where ${visitTechnicians.visitId} = ${visits.id} and ${visitTechnicians.userId} = ${viewerId})`,
    );
  }
  const terms = query.q ? searchTerms(query.q) : [];
  if (terms.length > 0) {
    const found = await searchedVisitIds(db, organisationId, terms);
    if (found?.length === 0) return { visits: [], nextCursor: null };
    conditions.push(found ? sql`${visits.id} = any(${sql.param(found)}::uuid[])` : and(...terms.map(rowMatches)));
  }
  if (query.cursor)
    conditions.push(afterCursor(keys, id, direction, decodeCursor(query.cursor, query.sort, direction, keys)));
  const rows = await db
    .select({ ...listColumns, ...cursorColumns(keys) })
    .from(visits)
    .innerJoin(visitSearch, eq(visitSearch.visitId, visits.id))
    .innerJoin(equipment, eq(equipment.id, visits.equipmentId))
    .innerJoin(sites, eq(sites.id, equipment.siteId))
    .innerJoin(customers, eq(customers.id, sites.customerId))
    .where(and(...conditions))
    .orderBy(...keysetOrder(keys, id, direction))
    .limit(query.limit + 1);
  const { page, nextCursor } = pageOf(rows, query.limit, keys, query.sort, direction);
  const extra = await summarise(db, page, viewerId);
  const summaries = page.map((row) => ({
    id: row.id,
    equipmentId: row.equipmentId,
    equipmentName: row.equipmentName,
    siteName: row.siteName,
    customerName: row.customerName,
    refrigerant: row.refrigerant,
    reason: row.reason,
    status: row.status,
    startedAt: row.startedAt.toISOString(),
    ...extra.get(row.id)!,
  }));
  return { visits: summaries, nextCursor };
}

/**
 * Every visit that matches, unpaged: for one unit's history (the equipment page), which grows
 * with that unit's visits only. Lists over the organisation use `listVisitPage`.
 * `viewerId`: whose last activity each summary carries (`yourLastActivityAt`).
 */
export async function listVisits(
  db: Database,
  organisationId: string,
  filter: VisitFilter = {},
  viewerId?: string,
): Promise<VisitSummary[]> {
  const conditions: SQL[] = [eq(visits.organisationId, organisationId)];
  if (filter.status) conditions.push(eq(visits.status, filter.status));
  if (filter.equipmentId) conditions.push(eq(visits.equipmentId, filter.equipmentId));
  const rows = await db
    .select(listColumns)
    .from(visits)
    .innerJoin(equipment, eq(equipment.id, visits.equipmentId))
    .innerJoin(sites, eq(sites.id, equipment.siteId))
    .innerJoin(customers, eq(customers.id, sites.customerId))
    .where(and(...conditions))
    .orderBy(desc(visits.startedAt));
  const extra = await summarise(db, rows, viewerId);
  return rows.map((row) => ({ ...row, startedAt: row.startedAt.toISOString(), ...extra.get(row.id)! }));
}

/** The visit row itself (for permission and status checks), scoped by organisation. */
/** A visit's own row, as routes load it (server/visits/load-records.ts). */
export type VisitRow = typeof visits.$inferSelect;

export async function findVisit(db: Database, organisationId: string, visitId: string): Promise<VisitRow | undefined> {
  const [row] = await db
    .select()
    .from(visits)
    .where(and(eq(visits.organisationId, organisationId), eq(visits.id, visitId)));
  return row;
}

export async function createVisit(
  db: Database,
  organisationId: string,
  values: { equipmentId: string; reason: string; createdBy: string },
): Promise<string | undefined> {
  const [unit] = await db
    .select({ id: equipment.id })
    .from(equipment)
    .where(and(eq(equipment.organisationId, organisationId), eq(equipment.id, values.equipmentId)));
  if (!unit) return undefined;
  return db.transaction(async (tx) => {
    const row = oneRow(
      await tx
        .insert(visits)
        .values({ ...values, organisationId })
        .returning({ id: visits.id }),
      "insert visit",
    );
    await tx.insert(visitTechnicians).values({ visitId: row.id, userId: values.createdBy });
    await insertVisitEvent(tx, organisationId, {
      visitId: row.id,
      action: "started",
      summary: visitReasonText(values.reason),
      actorId: values.createdBy,
    });
    return row.id;
  });
}

/** Puts the user on the visit's crew the first time they record something on it. */
export async function joinCrew(db: Database, visitId: string, userId: string): Promise<void> {
  await joinCrews(db, [{ visitId, userId }]);
}

/** joinCrew for several people and visits in one statement (readings saved together). */
export async function joinCrews(db: Database, members: { visitId: string; userId: string }[]): Promise<void> {
  if (members.length > 0) await db.insert(visitTechnicians).values(members).onConflictDoNothing();
}

/** A reading to store with insertReadings: its id and time chosen by the caller. */
export interface NewReading {
  id: string;
  organisationId: string;
  visitId: string;
  circuit: number;
  takenAt: Date;
  note: string | null;
  input: DiagnosisInput;
  result: DiagnosisResult;
  recordedBy: string;
  /** The device's id for the reading (README decision 026): stored once per visit. */
  clientId?: string | null;
}

/**
 * Several readings in one statement (readings saved together, server/visits/save-readings.ts),
 * answered as the run log shows them, in the order given. The caller knows the ids, times and
 * recorders' names, so what it stored is not read back. A reading whose client id the visit
 * already holds is not stored again (the unique index decides, even between two batches racing
 * on two servers): its answer is the reading stored first, read back, marked `replayed`. The
 * caller gives each client id of a visit once.
 */
export async function insertReadings(
  db: Database,
  rows: NewReading[],
  people: People,
): Promise<StoredEntry<Reading>[]> {
  if (rows.length === 0) return [];
  const inserted = new Set(
    (
      await db
        .insert(readings)
        .values(rows)
        .onConflictDoNothing({
          target: [readings.visitId, readings.clientId],
          where: sql`${readings.clientId} is not null`,
        })
        .returning({ id: readings.id })
    ).map((row) => row.id),
  );
  const held = rows.filter((row) => !inserted.has(row.id));
  const stored = new Map((await readingsByClientId(db, held)).map((row) => [`${row.visitId}:${row.clientId}`, row]));
  const heldPeople = await peopleById(db, [...stored.values()].flatMap(mentionedPeople));
  return rows.map((row) => {
    if (inserted.has(row.id))
      return {
        entry: toReading({ ...row, voidedAt: null, voidedBy: null, voidReason: null }, people),
        replayed: false,
      };
    const first = stored.get(`${row.visitId}:${row.clientId}`);
    if (!first) throw new Error(`insertReadings found no reading holding client id ${row.clientId}`);
    return { entry: toReading(first, heldPeople), replayed: true };
  });
}

/** The stored readings holding the client ids of these (visit, client id) pairs, in one query. */
export async function readingsByClientId(
  db: Database,
  keys: readonly { visitId: string; clientId?: string | null }[],
): Promise<(typeof readings.$inferSelect)[]> {
  const named = keys.filter((key): key is { visitId: string; clientId: string } => Boolean(key.clientId));
  if (named.length === 0) return [];
  return db
    .select()
    .from(readings)
    .where(
      and(
        inArray(readings.visitId, [...new Set(named.map((key) => key.visitId))]),
        inArray(readings.clientId, [...new Set(named.map((key) => key.clientId))]),
        isRecord,
      ),
    );
}

const mentionedPeople = (row: { recordedBy: string | null; voidedBy: string | null }) => [row.recordedBy, row.voidedBy];

/** A stored reading as the API shows it: the one mapper for inserts, the detail, deltas and pages. */
export function toReading(
  row: Pick<
    typeof readings.$inferSelect,
    | "id"
    | "visitId"
    | "circuit"
    | "takenAt"
    | "note"
    | "input"
    | "result"
    | "recordedBy"
    | "voidedAt"
    | "voidedBy"
    | "voidReason"
  >,
  people: People,
): Reading {
  return {
    id: row.id,
    visitId: row.visitId,
    circuit: row.circuit,
    takenAt: row.takenAt.toISOString(),
    note: row.note,
    input: row.input,
    result: row.result,
    recordedBy: person(people, row.recordedBy),
    voided: voidInfo(row, people),
  };
}

function toAdjustment(row: typeof adjustments.$inferSelect, people: People): Adjustment {
  return {
    id: row.id,
    circuit: row.circuit,
    at: row.at.toISOString(),
    kind: row.kind as Adjustment["kind"],
    description: row.description,
    amountKg: row.amountKg,
    movementId: row.movementId,
    recordedBy: person(people, row.recordedBy),
    voided: voidInfo(row, people),
  };
}

/** Adjustments, for storing once per client id and answering a repeated send. */
export const adjustmentEntries = entryKind(adjustments, async (db, row) =>
  toAdjustment(row, await peopleById(db, mentionedPeople(row))),
);

/** Stores an adjustment, once per client id on the visit (README decision 026). */
export async function insertAdjustment(
  db: Database,
  organisationId: string,
  values: {
    visitId: string;
    circuit: number | null;
    at?: Date;
    kind: string;
    description: string;
    amountKg: number | null;
    movementId?: string | null;
    recordedBy: string;
    clientId?: string;
  },
): Promise<StoredEntry<Adjustment>> {
  return insertEntryOnce(db, adjustmentEntries, { ...values, organisationId });
}

/** The reading a comment is about, as the comment shows it; undefined when it is no record of the visit. */
async function commentedReading(
  db: Database,
  visitId: string,
  readingId: string | null,
): Promise<Comment["reading"] | undefined> {
  if (!readingId) return null;
  const [found] = await db
    .select({ circuit: readings.circuit, takenAt: readings.takenAt })
    .from(readings)
    .where(and(eq(readings.id, readingId), eq(readings.visitId, visitId), isRecord));
  return found ? { circuit: found.circuit, takenAt: found.takenAt.toISOString() } : undefined;
}

/** Comments, for storing once per client id and answering a repeated send. */
export const commentEntries = entryKind(visitComments, async (db, row): Promise<Comment> => {
  const people = await peopleById(db, [row.authorId]);
  const reading = (await commentedReading(db, row.visitId, row.readingId)) ?? null;
  return {
    id: row.id,
    readingId: row.readingId,
    reading,
    body: row.body,
    author: person(people, row.authorId),
    createdAt: row.createdAt.toISOString(),
  };
});

/** Stores a comment, once per client id on the visit; undefined when the reading it names is not the visit's. */
export async function insertComment(
  db: Database,
  organisationId: string,
  values: { visitId: string; readingId: string | null; authorId: string; body: string; clientId?: string },
): Promise<StoredEntry<Comment> | undefined> {
  if ((await commentedReading(db, values.visitId, values.readingId)) === undefined) return undefined;
  return insertEntryOnce(db, commentEntries, { ...values, organisationId });
}

export async function updateVisitStatus(
  db: Database,
  visitId: string,
  values: {
    status: VisitStatus;
    reviewNote?: string | null;
    signedOffBy?: string | null;
    signedOffAt?: Date | null;
    reason?: string;
  },
): Promise<void> {
  await db
    .update(visits)
    .set({ ...values, updatedAt: new Date() })
    .where(eq(visits.id, visitId));
}

export function photoUrls(id: string): Pick<Photo, "url" | "thumbnailUrl"> {
  return { url: `/api/photos/${id}`, thumbnailUrl: `/api/photos/${id}/thumbnail` };
}

/**
 * The visit's own row with what its detail shows from the unit, site and customer: one small
 * query, enough to answer a conditional request (ETag from the revision) without reading the run log.
 */
export async function getVisitHead(db: Database, organisationId: string, visitId: string) {
  const [head] = await db
    .select({
      ...listColumns,
      customerContactEmail: customers.contactEmail,
      reviewNote: visits.reviewNote,
      signedOffBy: visits.signedOffBy,
      signedOffAt: visits.signedOffAt,
      siteAltitudeM: sites.altitudeM,
      revision: visits.revision,
    })
    .from(visits)
    .innerJoin(equipment, eq(equipment.id, visits.equipmentId))
    .innerJoin(sites, eq(sites.id, equipment.siteId))
    .innerJoin(customers, eq(customers.id, sites.customerId))
    .where(and(eq(visits.organisationId, organisationId), eq(visits.id, visitId)));
  if (!head) return undefined;
  const { equipmentName, siteName, customerName, refrigerant, customerContactEmail, siteAltitudeM } = head;
  // What other tables contribute to the detail changes without a visit write, so it is in the token.
  return {
    ...head,
    token: visitRevisionToken(head.revision, [
      equipmentName,
      siteName,
      customerName,
      refrigerant,
      customerContactEmail,
      siteAltitudeM,
    ]),
  };
}
export type VisitHead = NonNullable<Awaited<ReturnType<typeof getVisitHead>>>;

/**
 * The visit with the latest page of each circuit's readings (older ones: visitReadingsPage) and
 * each circuit's log, worked out over all its readings (server/visits/circuit-logs.ts), so the
 * detail's size and cost follow the page, not the visit's length. With `sinceRevision`, only
 * the run-log rows written (added, voided, imported) after that revision: a delta the client
 * merges by id; the summary, review state, counts, crew and (when readings or adjustments
 * changed) the circuit logs are always whole (they are bounded).
 */
async function buildVisit(db: Database, organisationId: string, head: VisitHead, sinceRevision?: number) {
  const visitId = head.id;
  const changed = <T extends typeof readings | typeof adjustments | typeof visitComments | typeof photos>(table: T) =>
    sinceRevision === undefined ? undefined : gt(table.revision, sinceRevision);
  const [changedReadings, allAdjustmentRows, commentRows, photoRows, extra, events] = await Promise.all([
    sinceRevision === undefined
      ? Promise.resolve(undefined)
      : db
          .select()
          .from(readings)
          .where(and(eq(readings.visitId, visitId), isRecord, changed(readings)))
          .orderBy(asc(readings.takenAt), asc(readings.createdAt)),
    db.select().from(adjustments).where(eq(adjustments.visitId, visitId)).orderBy(asc(adjustments.at)),
    db
      .select({ comment: visitComments, readingCircuit: readings.circuit, readingTakenAt: readings.takenAt })
      .from(visitComments)
      .leftJoin(readings, eq(readings.id, visitComments.readingId))
      .where(and(eq(visitComments.visitId, visitId), changed(visitComments)))
      .orderBy(asc(visitComments.createdAt)),
    db
      .select()
      .from(photos)
      .where(and(eq(photos.visitId, visitId), changed(photos)))
      .orderBy(asc(photos.takenAt), asc(photos.id)),
    summarise(db, [head]),
    listVisitEvents(db, organisationId, visitId, sinceRevision),
  ]);
  const adjustmentRows =
    sinceRevision === undefined ? allAdjustmentRows : allAdjustmentRows.filter((row) => row.revision > sinceRevision);
  const adjustmentPeople = await peopleById(db, allAdjustmentRows.flatMap(mentionedPeople));
  const allAdjustments = allAdjustmentRows.map((row) => toAdjustment(row, adjustmentPeople));
  // The logs change only with the readings and adjustments; a delta without either leaves the held ones.
  const logsChanged = changedReadings === undefined || changedReadings.length > 0 || adjustmentRows.length > 0;
  const allLogs = logsChanged ? await circuitLogs(db, visitId, allAdjustments) : undefined;
  // A delta carries the logs of the circuits it touched only (each is up to a few hundred chart
  // points): an adjustment for no one circuit touches them all.
  const touched =
    changedReadings === undefined || adjustmentRows.some((row) => row.circuit === null)
      ? undefined
      : new Set([...changedReadings.map((row) => row.circuit), ...adjustmentRows.map((row) => row.circuit!)]);
  const logs = touched ? allLogs?.filter((log) => touched.has(log.circuit)) : allLogs;
  const pages = new Map<number, { rows: (typeof readings.$inferSelect)[]; olderCursor: string | null }>();
  if (changedReadings === undefined) {
    for (const log of logs!)
      pages.set(log.circuit, await circuitReadingsPage(db, visitId, log.circuit, READINGS_PAGE_SIZE));
  }
  const readingRows =
    changedReadings ??
    [...pages.values()].flatMap((page) => page.rows).sort((a, b) => a.takenAt.getTime() - b.takenAt.getTime());
  const people = await peopleById(db, [
    head.signedOffBy,
    ...readingRows.flatMap(mentionedPeople),
    ...(logs ?? []).flatMap((log) => log.keyRows.flatMap(mentionedPeople)),
    ...commentRows.map((row) => row.comment.authorId),
  ]);
  const { siteAltitudeM, token, revision: _revision, ...visit } = head;
  return {
    ...visit,
    ...extra.get(head.id)!,
    revision: token,
    atmosphere: siteAtmosphere({ altitudeM: siteAltitudeM }),
    events,
    startedAt: head.startedAt.toISOString(),
    signedOffBy: person(people, head.signedOffBy),
    signedOffAt: head.signedOffAt?.toISOString() ?? null,
    readings: readingRows.map((row) => toReading(row, people)),
    circuitLogs: logs?.map(({ keyRows, ...log }) => ({
      ...log,
      olderCursor: pages.get(log.circuit)?.olderCursor ?? null,
      keyReadings: keyRows.map((row) => toReading(row, people)),
    })),
    adjustments:
      sinceRevision === undefined ? allAdjustments : adjustmentRows.map((row) => toAdjustment(row, adjustmentPeople)),
    comments: commentRows.map(({ comment, readingCircuit, readingTakenAt }) => ({
      id: comment.id,
      readingId: comment.readingId,
      reading:
        readingCircuit !== null && readingTakenAt !== null
          ? { circuit: readingCircuit, takenAt: readingTakenAt.toISOString() }
          : null,
      body: comment.body,
      author: person(people, comment.authorId),
      createdAt: comment.createdAt.toISOString(),
    })),
    photos: photoRows.map(toPhoto),
  };
}

/** The whole visit: summary, review state, the latest page of each circuit's readings and each circuit's log. */
export async function getVisitDetail(
  db: Database,
  organisationId: string,
  visitId: string,
  head?: VisitHead,
): Promise<Visit | undefined> {
  const found = head ?? (await getVisitHead(db, organisationId, visitId));
  if (!found) return undefined;
  const built = await buildVisit(db, organisationId, found);
  return { ...built, circuitLogs: built.circuitLogs ?? [] };
}

/**
 * What changed on the visit after `sinceRevision` (see buildVisit), and the token it brings the
 * client to; undefined when more readings changed than a page holds (an imported series): the
 * caller answers with the whole visit, whose size is bounded, instead.
 */
export async function getVisitDelta(
  db: Database,
  organisationId: string,
  head: VisitHead,
  sinceRevision: number,
): Promise<Omit<VisitDelta, "since"> | undefined> {
  const changedReadings = await db
    .select({ id: readings.id })
    .from(readings)
    .where(and(eq(readings.visitId, head.id), isRecord, gt(readings.revision, sinceRevision)))
    .limit(MAX_READINGS_PAGE_SIZE + 1);
  if (changedReadings.length > MAX_READINGS_PAGE_SIZE) return undefined;
  return buildVisit(db, organisationId, head, sinceRevision);
}

/**
 * One circuit's readings (voided ones included) before the reading `before`, a page at a time,
 * for "Show earlier entries". The caller has checked the visit is the organisation's.
 */
export async function visitReadingsPage(
  db: Database,
  visitId: string,
  query: { circuit: number; before: string; limit: number },
): Promise<ReadingsPage> {
  const page = await circuitReadingsPage(db, visitId, query.circuit, query.limit, query.before);
  const people = await peopleById(db, page.rows.flatMap(mentionedPeople));
  return { readings: page.rows.map((row) => toReading(row, people)), olderCursor: page.olderCursor };
}

function toPhoto(row: typeof photos.$inferSelect): Photo {
  return {
    id: row.id,
    kind: row.kind as Photo["kind"],
    caption: row.caption,
    takenAt: row.takenAt.toISOString(),
    createdAt: row.createdAt.toISOString(),
    ...photoUrls(row.id),
  };
}

/** Photos, for storing once per client id and answering a repeated send. */
export const photoEntries = entryKind(photos, async (_db, row): Promise<Photo> => toPhoto(row));

/** Stores a photo's index row, once per client id on the visit (a repeat's files are the caller's to discard). */
export async function insertPhoto(
  db: Database,
  organisationId: string,
  values: {
    visitId: string;
    kind: string;
    caption: string | null;
    storedName: string;
    thumbnailName: string;
    mimeType: string;
    bytes: number;
    uploadedBy: string;
  } & DeviceEntryValues,
): Promise<StoredEntry<Photo>> {
  return insertEntryOnce(db, photoEntries, { ...values, organisationId });
}

export async function findPhoto(db: Database, organisationId: string, photoId: string) {
  const [row] = await db
    .select()
    .from(photos)
    .where(and(eq(photos.organisationId, organisationId), eq(photos.id, photoId)));
  return row;
}

/**
 * One slice of a CSV import, stored hidden under its import id. `rowsJson` is the worker's
 * JSON array of { takenAt, input, result }, each result already packed as the `result` column
 * stores it (server/db/stored-result.ts): PostgreSQL unpacks the array, so the server's thread
 * never builds or parses the whole series, and each slice holds the database only briefly.
 */
export async function stageImportedReadings(
  db: Database,
  organisationId: string,
  values: { importId: string; visitId: string; circuit: number; recordedBy: string; rowsJson: string },
): Promise<void> {
  await db.execute(sql`
    insert into ${readings} (organisation_id, visit_id, circuit, taken_at, input, result, recorded_by, note, pending_import_id)
    select ${organisationId}, ${values.visitId}, ${values.circuit}, (row->>'takenAt')::timestamptz, row->'input', row->'result',
           ${values.recordedBy}, 'imported from CSV', ${values.importId}
    from jsonb_array_elements(${values.rowsJson}::jsonb) as row`);
}

/** Makes a staged import's rows readings, all in one step (call under the visit's lock). */
export async function commitImportedReadings(db: Database, importId: string): Promise<number> {
  const rows = await db
    .update(readings)
    .set({ pendingImportId: null })
    .where(eq(readings.pendingImportId, importId))
    .returning({ id: readings.id });
  return rows.length;
}

/**
 * Removes rows an import staged but never committed (refused, failed, or cut off by a
 * restart): they were never records, so nothing recorded is lost. Without an id, every one.
 */
export async function discardStagedReadings(db: Database, importId?: string): Promise<void> {
  await db
    .delete(readings)
    .where(importId ? eq(readings.pendingImportId, importId) : isNotNull(readings.pendingImportId));
}

/**
 * Removes staged rows older than `before`: with several app servers one cannot clear every
 * staged row at start-up, as another may be importing right now, so abandoned ones go by age.
 */
export async function discardStagedReadingsBefore(db: Database, before: Date): Promise<number> {
  const removed = await db
    .delete(readings)
    .where(and(isNotNull(readings.pendingImportId), lt(readings.createdAt, before)))
    .returning({ id: readings.id });
  return removed.length;
}
