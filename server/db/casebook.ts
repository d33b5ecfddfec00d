/**
 * Queries for the casebook: built-in cases (from data/casebook/, shared by every organisation),
 * organisation cases and attempts. Every function takes the caller's organisation id; a case
 * or attempt of another organisation reads as missing.
 */
import { and, count, desc, eq, inArray, isNull, or, sql, type SQL } from "drizzle-orm";
import { generateCase, seededRandom } from "@shared/engine/index.ts";
import {
  BuiltInCaseFileSchema,
  parseGeneratedCaseId,
  type Attempt,
  type AttemptAnswers,
  type AttemptScore,
  type AttemptSummary,
  type BuiltInCase,
  type CaseDraft,
  type CaseExpected,
  type CaseSource,
  type CaseStatus,
  type CaseSummary,
  type Progress,
  type ProgressGroup,
  type SafetyNote,
  type TeamProgress,
  type WorkedStep,
} from "@shared/schemas/casebook.ts";
import type { ChargeState, DiagnosisInput } from "@shared/schemas/diagnosis.ts";
import builtInFile from "../../data/casebook/built-in-cases.json";
import type { Database } from "./client.ts";
import { casebookAttempts, casebookCases, equipment, readings, users, visits } from "./schema.ts";
import { oneRow } from "./one-row.ts";

/** The built-in library, checked against its schema once at start-up (bad data fails loudly). */
const BUILT_IN_CASES: readonly BuiltInCase[] = BuiltInCaseFileSchema.parse(builtInFile).cases;
const BUILT_IN_BY_ID = new Map(BUILT_IN_CASES.map((worked) => [worked.id, worked]));

/** A case from any of the three sources, in one shape. */
export interface CaseRecord {
  id: string;
  source: CaseSource;
  status: CaseStatus;
  title: string;
  difficulty: BuiltInCase["difficulty"];
  story: BuiltInCase["story"];
  input: DiagnosisInput;
  reasoning: string;
  safetyTopics: SafetyNote["topic"][];
  expected: CaseExpected;
  authorName: string | null;
  fromReading: boolean;
  updatedAt: string | null;
  /** Organisation cases only: bumped by every change, checked against If-Match. */
  version: number | null;
}

function fromBuiltIn(worked: BuiltInCase): CaseRecord {
  return {
    id: worked.id,
    source: "built-in",
    status: "published",
    title: worked.title,
    difficulty: worked.difficulty,
    story: worked.story,
    input: worked.input,
    reasoning: worked.reasoning,
    safetyTopics: worked.safetyTopics,
    expected: worked.expected,
    authorName: null,
    fromReading: false,
    updatedAt: null,
    version: null,
  };
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function isBuiltInCaseId(id: string): boolean {
  return BUILT_IN_BY_ID.has(id);
}

export function isGeneratedCaseId(id: string): boolean {
  return parseGeneratedCaseId(id) !== null;
}

/** Makes a generated case (again) from its id; null when the id is not a generator id. */
export function generatedCase(id: string): CaseRecord | null {
  const options = parseGeneratedCaseId(id);
  if (!options) return null;
  const made = generateCase({ ...options, random: seededRandom(options.seed) });
  return { ...fromBuiltIn({ ...made, id: "generated" }), id, source: "generated" };
}

async function organisationCaseRows(db: Database, organisationId: string, condition?: SQL) {
  return db
    .select({ row: casebookCases, authorName: users.name })
    .from(casebookCases)
    .leftJoin(users, eq(users.id, casebookCases.createdBy))
    .where(and(eq(casebookCases.organisationId, organisationId), condition))
    .orderBy(desc(casebookCases.updatedAt));
}

function fromRow({ row, authorName }: Awaited<ReturnType<typeof organisationCaseRows>>[number]): CaseRecord {
  return {
    id: row.id,
    source: "organisation",
    status: row.status,
    title: row.title,
    difficulty: row.difficulty,
    story: row.story,
    input: row.input,
    reasoning: row.reasoning,
    safetyTopics: row.safetyTopics,
    expected: row.expected,
    authorName: authorName ?? null,
    fromReading: row.fromReadingId !== null,
    updatedAt: row.updatedAt.toISOString(),
    version: row.version,
  };
}

/**
 * Any case by id: built-in, generated (made again from its seed) or the organisation's own.
 * Drafts are found only when `includeDrafts` (authors); otherwise they read as missing.
 */
export async function findCase(
  db: Database,
  organisationId: string,
  id: string,
  includeDrafts: boolean,
): Promise<CaseRecord | null> {
  const builtIn = BUILT_IN_BY_ID.get(id);
  if (builtIn) return fromBuiltIn(builtIn);
  if (isGeneratedCaseId(id)) return generatedCase(id);
  if (!UUID.test(id)) return null;
  const [found] = await organisationCaseRows(
    db,
    organisationId,
    and(eq(casebookCases.id, id), includeDrafts ? undefined : eq(casebookCases.status, "published")),
  );
  return found ? fromRow(found) : null;
}

/** Built-in and published organisation cases (and drafts for authors), with the user's attempts at each. */
export async function listCases(
  db: Database,
  organisationId: string,
  userId: string,
  includeDrafts: boolean,
): Promise<CaseSummary[]> {
  const own = await organisationCaseRows(
    db,
    organisationId,
    includeDrafts ? undefined : eq(casebookCases.status, "published"),
  );
  const tally = await db
    .select({ caseId: casebookAttempts.caseId, attempts: count() })
    .from(casebookAttempts)
    .where(and(eq(casebookAttempts.organisationId, organisationId), eq(casebookAttempts.userId, userId)))
    .groupBy(casebookAttempts.caseId);
  const solvedRows = await db
    .selectDistinct({ caseId: casebookAttempts.caseId })
    .from(casebookAttempts)
    .where(
      and(
        eq(casebookAttempts.organisationId, organisationId),
        eq(casebookAttempts.userId, userId),
        eq(casebookAttempts.allCorrect, true),
      ),
    );
  const attempts = new Map(tally.map((row) => [row.caseId, row.attempts]));
  const solved = new Set(solvedRows.map((row) => row.caseId));
  const records = [...own.map(fromRow), ...BUILT_IN_CASES.map(fromBuiltIn)];
  return records.map((record) => ({
    id: record.id,
    source: record.source,
    status: record.status,
    title: record.title,
    difficulty: record.difficulty,
    refrigerant: record.input.refrigerant,
    meteringDevice: record.input.meteringDevice,
    site: record.story.site,
    attempts: attempts.get(record.id) ?? 0,
    solved: solved.has(record.id),
  }));
}

export async function insertCase(
  db: Database,
  organisationId: string,
  values: CaseDraft & { expected: CaseExpected; createdBy: string; fromReadingId?: string },
): Promise<string> {
  const rows = await db
    .insert(casebookCases)
    .values({ ...values, organisationId, status: "draft" })
    .returning({ id: casebookCases.id });
  return oneRow(rows, "insert case").id;
}

/**
 * What a versioned write on an organisation case found: done, changed by someone else since
 * the version the caller saw, or no such case in the organisation.
 */
export type CaseWrite = "done" | "stale" | "missing";

async function caseWriteOutcome(
  db: Database,
  organisationId: string,
  id: string,
  written: boolean,
): Promise<CaseWrite> {
  if (written) return "done";
  const [exists] = await db
    .select({ id: casebookCases.id })
    .from(casebookCases)
    .where(and(eq(casebookCases.organisationId, organisationId), eq(casebookCases.id, id)));
  return exists ? "stale" : "missing";
}

const caseAt = (organisationId: string, id: string, version: number) =>
  and(eq(casebookCases.organisationId, organisationId), eq(casebookCases.id, id), eq(casebookCases.version, version));

/**
 * Sets columns of an organisation case if it is still at `version`, moving it to the next version.
 * Editing and publishing are both this write, so both bump the version the same way and answer
 * the same outcomes.
 */
async function changeCaseAt(
  db: Database,
  organisationId: string,
  id: string,
  version: number,
  values: Partial<typeof casebookCases.$inferInsert>,
): Promise<CaseWrite> {
  const rows = await db
    .update(casebookCases)
    .set({ ...values, version: sql`${casebookCases.version} + 1`, updatedAt: new Date() })
    .where(caseAt(organisationId, id, version))
    .returning({ id: casebookCases.id });
  return caseWriteOutcome(db, organisationId, id, rows.length > 0);
}

/** Changes an organisation case if it is still at `version`. */
export async function updateCase(
  db: Database,
  organisationId: string,
  id: string,
  values: CaseDraft & { expected: CaseExpected },
  version: number,
): Promise<CaseWrite> {
  return changeCaseAt(db, organisationId, id, version, values);
}

export async function publishCase(
  db: Database,
  organisationId: string,
  id: string,
  version: number,
): Promise<CaseWrite> {
  return changeCaseAt(db, organisationId, id, version, { status: "published", publishedAt: new Date() });
}

export async function deleteCase(
  db: Database,
  organisationId: string,
  id: string,
  version: number,
): Promise<CaseWrite> {
  const rows = await db
    .delete(casebookCases)
    .where(caseAt(organisationId, id, version))
    .returning({ id: casebookCases.id });
  return caseWriteOutcome(db, organisationId, id, rows.length > 0);
}

/**
 * A run-log reading with only what a case may keep: the readings and the kind of unit. No
 * customer, site, unit name, serial, note or person is read, so none can leak into a case.
 */
export async function findReadingForCase(db: Database, organisationId: string, readingId: string) {
  const [row] = await db
    .select({
      id: readings.id,
      circuit: readings.circuit,
      input: readings.input,
      result: readings.result,
      kind: equipment.kind,
    })
    .from(readings)
    .innerJoin(visits, eq(visits.id, readings.visitId))
    .innerJoin(equipment, eq(equipment.id, visits.equipmentId))
    // A voided reading is not evidence of anything, and a staged import row is not yet a record.
    .where(
      and(
        eq(readings.organisationId, organisationId),
        eq(readings.id, readingId),
        isNull(readings.voidedAt),
        isNull(readings.pendingImportId),
      ),
    );
  return row;
}

// ---------------------------------------------------------------------------------------------
// Attempts
// ---------------------------------------------------------------------------------------------

export async function insertAttempt(
  db: Database,
  organisationId: string,
  values: {
    userId: string;
    caseRecord: CaseRecord;
    answers: AttemptAnswers;
    score: AttemptScore;
    worked: WorkedStep[];
    safety: SafetyNote[];
  },
): Promise<string> {
  const { caseRecord } = values;
  const rows = await db
    .insert(casebookAttempts)
    .values({
      organisationId,
      userId: values.userId,
      caseId: caseRecord.id,
      caseTitle: caseRecord.title,
      refrigerant: caseRecord.input.refrigerant,
      expectedState: caseRecord.expected.chargeState,
      answers: values.answers,
      score: values.score,
      correctCount: values.score.correctCount,
      allCorrect: values.score.allCorrect,
      expected: caseRecord.expected,
      reasoning: caseRecord.reasoning,
      worked: values.worked,
      safety: values.safety,
    })
    .returning({ id: casebookAttempts.id });
  return oneRow(rows, "insert attempt").id;
}

/** One attempt of the organisation; `userId` narrows it to that person's own. */
export async function findAttempt(
  db: Database,
  organisationId: string,
  id: string,
  userId?: string,
): Promise<Attempt | null> {
  const [found] = await db
    .select({ row: casebookAttempts, name: users.name })
    .from(casebookAttempts)
    .innerJoin(users, eq(users.id, casebookAttempts.userId))
    .where(
      and(
        eq(casebookAttempts.organisationId, organisationId),
        eq(casebookAttempts.id, id),
        userId ? eq(casebookAttempts.userId, userId) : undefined,
      ),
    );
  if (!found) return null;
  const { row } = found;
  return {
    id: row.id,
    caseId: row.caseId,
    caseTitle: row.caseTitle,
    refrigerant: row.refrigerant,
    expectedState: row.expectedState,
    answers: row.answers,
    score: row.score,
    expected: row.expected,
    reasoning: row.reasoning,
    worked: row.worked,
    safety: row.safety,
    user: { id: row.userId, name: found.name },
    createdAt: row.createdAt.toISOString(),
  };
}

export async function listAttempts(db: Database, organisationId: string, userId: string): Promise<AttemptSummary[]> {
  const rows = await db
    .select()
    .from(casebookAttempts)
    .where(and(eq(casebookAttempts.organisationId, organisationId), eq(casebookAttempts.userId, userId)))
    .orderBy(desc(casebookAttempts.createdAt));
  return rows.map((row) => ({
    id: row.id,
    caseId: row.caseId,
    caseTitle: row.caseTitle,
    refrigerant: row.refrigerant,
    expectedState: row.expectedState,
    createdAt: row.createdAt.toISOString(),
    correctCount: row.correctCount,
    total: row.score.total,
    allCorrect: row.allCorrect,
  }));
}

interface ProgressRow {
  userId: string;
  refrigerant: string;
  expectedState: ChargeState;
  correctCount: number;
  total: number;
  allCorrect: boolean;
  createdAt: Date;
}

function group(rows: ProgressRow[], key: (row: ProgressRow) => string): ProgressGroup[] {
  const groups = new Map<string, ProgressGroup>();
  for (const row of rows) {
    const name = key(row);
    const entry = groups.get(name) ?? { key: name, attempts: 0, solved: 0, answersRight: 0, answersTotal: 0 };
    entry.attempts += 1;
    entry.solved += row.allCorrect ? 1 : 0;
    entry.answersRight += row.correctCount;
    entry.answersTotal += row.total;
    groups.set(name, entry);
  }
  return [...groups.values()].sort((a, b) => a.key.localeCompare(b.key));
}

function progressOf(rows: ProgressRow[]): Progress {
  return {
    attempts: rows.length,
    solved: rows.filter((row) => row.allCorrect).length,
    byState: group(rows, (row) => row.expectedState),
    byRefrigerant: group(rows, (row) => row.refrigerant),
  };
}

async function progressRows(db: Database, organisationId: string, userId?: string): Promise<ProgressRow[]> {
  const rows = await db
    .select({
      userId: casebookAttempts.userId,
      refrigerant: casebookAttempts.refrigerant,
      expectedState: casebookAttempts.expectedState,
      correctCount: casebookAttempts.correctCount,
      score: casebookAttempts.score,
      allCorrect: casebookAttempts.allCorrect,
      createdAt: casebookAttempts.createdAt,
    })
    .from(casebookAttempts)
    .where(
      and(
        eq(casebookAttempts.organisationId, organisationId),
        userId ? eq(casebookAttempts.userId, userId) : undefined,
      ),
    )
    .orderBy(desc(casebookAttempts.createdAt));
  return rows.map(({ score, ...row }) => ({ ...row, total: score.total }));
}

export async function progressFor(db: Database, organisationId: string, userId: string): Promise<Progress> {
  return progressOf(await progressRows(db, organisationId, userId));
}

/** Every apprentice of the organisation (even with no attempts yet), and anyone else who has practised. */
export async function teamProgress(db: Database, organisationId: string): Promise<TeamProgress> {
  const rows = await progressRows(db, organisationId);
  const practised = [...new Set(rows.map((row) => row.userId))];
  const people = await db
    .select({ id: users.id, name: users.name, role: users.role })
    .from(users)
    .where(
      and(
        eq(users.organisationId, organisationId),
        isNull(users.deactivatedAt),
        practised.length > 0
          ? or(eq(users.role, "apprentice"), inArray(users.id, practised))
          : eq(users.role, "apprentice"),
      ),
    )
    .orderBy(users.name);
  return {
    people: people.map((person) => {
      const own = rows.filter((row) => row.userId === person.id);
      return { user: person, progress: progressOf(own), lastAttemptAt: own[0]?.createdAt.toISOString() ?? null };
    }),
  };
}
