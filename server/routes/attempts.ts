import { Router } from "express";
import { z } from "zod";
import { caseSafetyNotes, diagnose, scoreAttempt, workedSolution } from "@shared/engine/index.ts";
import { AttemptCreateSchema } from "@shared/schemas/casebook.ts";
import { canCasebook } from "@shared/schemas/casebook-permissions.ts";
import { getAuth } from "../auth/session.ts";
import { findAttempt, findCase, insertAttempt, listAttempts, progressFor, teamProgress } from "../db/casebook.ts";
import { notFound } from "../http/http-error.ts";
import { parseId } from "../http/parse-id.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

type Deps = Pick<AccountRouteDeps, "db">;

const ListQuerySchema = z.object({ userId: z.uuid().optional() });

export function attemptsRouter({ db }: Deps): Router {
  const router = Router();

  // Scoring happens here, on the server, against the engine's answers: the client never sees them first.
  router.post("/", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const { caseId, answers } = AttemptCreateSchema.parse(req.body);
    const record = await findCase(db, organisationId, caseId, canCasebook(user.role, "author"));
    if (!record) throw notFound("Case");
    const score = scoreAttempt(record.expected, answers);
    const worked = workedSolution(record.input, diagnose(record.input), record.reasoning);
    const safety = caseSafetyNotes(record.input.refrigerant, record.expected.chargeState, record.safetyTopics);
    const id = await insertAttempt(db, organisationId, {
      userId: user.id,
      caseRecord: record,
      answers,
      score,
      worked,
      safety,
    });
    res.status(201).json({ attempt: await findAttempt(db, organisationId, id) });
  });

  // Your own attempts; seniors and owners may ask for anyone's in their organisation.
  router.get("/", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const { userId } = ListQuerySchema.parse(req.query);
    const whose = userId && userId !== user.id && canCasebook(user.role, "seeTeamProgress") ? userId : user.id;
    res.json({ attempts: await listAttempts(db, organisationId, whose) });
  });

  router.get("/progress", async (_req, res) => {
    const { organisationId, user } = getAuth(res);
    res.json({ progress: await progressFor(db, organisationId, user.id) });
  });

  router.get("/progress/team", async (_req, res) => {
    res.json(await teamProgress(db, getAuth(res).organisationId));
  });

  router.get("/:id", async (req, res) => {
    const { organisationId, user } = getAuth(res);
    const mineOnly = canCasebook(user.role, "seeTeamProgress") ? undefined : user.id;
    const attempt = await findAttempt(db, organisationId, parseId(req.params.id, "Attempt"), mineOnly);
    if (!attempt) throw notFound("Attempt");
    res.json({ attempt });
  });

  return router;
}
