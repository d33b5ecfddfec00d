import { randomInt } from "node:crypto";
import { Router, type Response } from "express";
import { upperFirst } from "@shared/format/upper-first.ts";
import { chargeStateText } from "@shared/content/charge-states.ts";
import { authoredAnswers, diagnose, generateCase, seededRandom } from "@shared/engine/index.ts";
import {
  asksChargeToAdd,
  CaseDraftSchema,
  CaseFromReadingSchema,
  cycleQuestionsOf,
  GenerateCaseSchema,
  generatedCaseId,
  type Case,
  type CaseDraft,
} from "@shared/schemas/casebook.ts";
import { canCasebook } from "@shared/schemas/casebook-permissions.ts";
import { getAuth } from "../auth/session.ts";
import {
  deleteCase,
  findCase,
  findReadingForCase,
  insertCase,
  isBuiltInCaseId,
  isGeneratedCaseId,
  listCases,
  publishCase,
  updateCase,
  type CaseRecord,
  type CaseWrite,
} from "../db/casebook.ts";
import { HttpError, notFound } from "../http/http-error.ts";
import { parseId } from "../http/parse-id.ts";
import { requireIfMatch, setVersion, staleWrite } from "../http/versioning.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

type Deps = Pick<AccountRouteDeps, "db">;

const BUILT_IN_READ_ONLY =
  "Built-in cases are shared by every organisation and cannot be changed. Write your own case instead (New case), or turn one of your visit readings into a case.";
const GENERATED_READ_ONLY =
  "Generated practice cases are made on demand and are not stored, so they cannot be changed or published.";
const METERING_WORDS = { txv: "TXV", eev: "EEV", "fixed-orifice": "fixed orifice", capillary: "capillary" } as const;

/** The case as the API sends it; the answers stay hidden from those who practise on it. */
function toCase(record: CaseRecord, showAnswers: boolean): Case {
  return {
    id: record.id,
    source: record.source,
    status: record.status,
    title: record.title,
    difficulty: record.difficulty,
    story: record.story,
    input: record.input,
    reasoning: showAnswers ? record.reasoning : null,
    safetyTopics: record.safetyTopics,
    expected: showAnswers ? record.expected : null,
    cycleQuestions: cycleQuestionsOf(record.expected),
    chargeQuestion: asksChargeToAdd(record.expected),
    authorName: record.authorName,
    fromReading: record.fromReading,
    editable: showAnswers && record.source === "organisation",
    updatedAt: record.updatedAt,
    version: record.version,
  };
}

/** Built-in and generated cases are nobody's to change: say so plainly, before any lookup. */
function refuseSharedCase(id: string, status: 403 | 409 = 403) {
  if (isBuiltInCaseId(id)) throw new HttpError(status, BUILT_IN_READ_ONLY);
  if (isGeneratedCaseId(id)) throw new HttpError(status, GENERATED_READ_ONLY);
}

/**
 * Expected answers always come from the engine, never from the author; a case that gives the
 * circuit's correct charge asks the charge to add whenever the engine can estimate it.
 */
function withEngineAnswers(draft: CaseDraft) {
  return { ...draft, expected: authoredAnswers(diagnose(draft.input)) };
}

const isAuthor = (res: Response) => canCasebook(getAuth(res).user.role, "author");

export function casesRouter({ db }: Deps): Router {
  const router = Router();

  async function send(res: Response, organisationId: string, id: string, status = 200) {
    const record = await findCase(db, organisationId, id, true);
    if (!record) throw notFound("Case");
    if (record.version !== null) setVersion(res, record.version);
    res.status(status).json({ case: toCase(record, true) });
  }

  /** A versioned write's outcome as an answer: 404 for no such case, 409 for a stale copy. */
  function requireDone(outcome: CaseWrite) {
    if (outcome === "missing") throw notFound("Case");
    if (outcome === "stale") throw staleWrite("this case");
  }

  router.get("/", async (_req, res) => {
    const { organisationId, user } = getAuth(res);
    res.json({ cases: await listCases(db, organisationId, user.id, isAuthor(res)) });
  });

  router.post("/", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const draft = CaseDraftSchema.parse(req.body);
    const id = await insertCase(db, organisationId, { ...withEngineAnswers(draft), createdBy: user.id });
    await send(res, organisationId, id, 201);
  });

  // A real visit's reading as a draft case: only the numbers and the kind of unit are kept.
  router.post("/from-reading", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const { readingId } = CaseFromReadingSchema.parse(req.body);
    const reading = await findReadingForCase(db, organisationId, readingId);
    if (!reading) throw notFound("Reading");
    const { input } = reading;
    const state = chargeStateText[reading.result.chargeState];
    const draft = CaseDraftSchema.parse({
      title: `Field case: ${reading.kind} on ${input.refrigerant}`,
      difficulty: "intermediate",
      story: {
        site: "A real site (customer details removed)",
        equipment: `${upperFirst(reading.kind)} on ${input.refrigerant}, circuit ${reading.circuit}, ${METERING_WORDS[input.meteringDevice]}`,
        complaint: "Describe what the customer reported.",
        conditions:
          input.runMinutes === undefined
            ? "Reading from the run log."
            : `Reading from the run log after ${input.runMinutes} minutes of running.`,
      },
      input,
      reasoning: `${state.title}. ${state.nextStep}`,
      safetyTopics: [],
    });
    const id = await insertCase(db, organisationId, {
      ...withEngineAnswers(draft),
      createdBy: user.id,
      fromReadingId: reading.id,
    });
    await send(res, organisationId, id, 201);
  });

  // Practice never runs out: any signed-in user may make a case; it is not stored.
  router.post("/generate", async (req, res) => {
    const options = GenerateCaseSchema.parse(req.body);
    const seed = options.seed ?? randomInt(0, 2 ** 32 - 1);
    const id = generatedCaseId({ ...options, seed });
    const made = generateCase({ ...options, random: seededRandom(seed) });
    const record = await findCase(db, getAuth(res).organisationId, id, false);
    if (!record || record.expected.chargeState !== made.expected.chargeState)
      throw new Error("generated case did not reproduce from its id");
    res.status(201).json({ case: toCase(record, isAuthor(res)) });
  });

  router.get("/:id", async (req, res) => {
    const author = isAuthor(res);
    const record = await findCase(db, getAuth(res).organisationId, String(req.params.id), author);
    if (!record) throw notFound("Case");
    res.json({ case: toCase(record, author) });
  });

  router.put("/:id", async (req, res) => {
    const id = String(req.params.id);
    refuseSharedCase(id);
    const { organisationId } = getAuth(res);
    const draft = CaseDraftSchema.parse(req.body);
    requireDone(
      await updateCase(db, organisationId, parseId(id, "Case"), withEngineAnswers(draft), requireIfMatch(req)),
    );
    await send(res, organisationId, id);
  });

  router.post("/:id/publish", async (req, res) => {
    const id = String(req.params.id);
    // A built-in case is already published to everyone: a conflict with its state, not a permission.
    refuseSharedCase(id, 409);
    const { organisationId } = getAuth(res);
    requireDone(await publishCase(db, organisationId, parseId(id, "Case"), requireIfMatch(req)));
    await send(res, organisationId, id);
  });

  router.delete("/:id", async (req, res) => {
    const id = String(req.params.id);
    refuseSharedCase(id);
    requireDone(await deleteCase(db, getAuth(res).organisationId, parseId(id, "Case"), requireIfMatch(req)));
    res.status(204).end();
  });

  return router;
}
