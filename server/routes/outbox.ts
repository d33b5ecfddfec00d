import { Router } from "express";
import { PERMISSIONS } from "@shared/schemas/auth.ts";
import type { OutboxResponse } from "@shared/schemas/outbox.ts";
import { getAuth, requireRole } from "../auth/session.ts";
import { listOutboundMail } from "../db/outbox.ts";
import { HttpError } from "../http/http-error.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

/**
 * GET /api/outbox: mail caught by the development mail server, for owners. Messages hold
 * sign-in links, so the route answers 404 whenever a real SMTP host is configured or the
 * outbox is switched off (the default in production).
 */
export function outboxRouter({ db, mailer }: AccountRouteDeps): Router {
  const router = Router();
  router.get("/", requireRole(...PERMISSIONS.manageMembers), async (_req, res) => {
    if (!mailer.outboxEnabled) throw new HttpError(404, "The outbox is only available in development");
    const { organisationId } = getAuth(res);
    res.json({ messages: await listOutboundMail(db, organisationId) } satisfies OutboxResponse);
  });
  return router;
}
