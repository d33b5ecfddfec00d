import { Router } from "express";
import type { OutboxResponse } from "@shared/schemas/outbox.ts";
import { getAuth } from "../auth/session.ts";
import { hideLinkTokens } from "../auth/tokens.ts";
import { listOutboundMail } from "../db/outbox.ts";
import { HttpError } from "../http/http-error.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

/**
 * GET /api/outbox: mail caught by the development mail server, for owners. Messages hold
 * sign-in links, so the route answers 404 whenever a real SMTP host is configured or the
 * outbox is switched off (the default in production).
 *
 * An owner reads the company's mail, but a reset or invitation link works only for the person
 * it was sent to: in every message addressed to someone else, the token of each link is taken
 * out (docs/accounts.md, "Outbox"). Otherwise an owner could take over a colleague's account
 * with the reset link meant for them.
 */
export function outboxRouter({ db, mailer }: AccountRouteDeps): Router {
  const router = Router();
  router.get("/", async (_req, res) => {
    if (!mailer.outboxEnabled) throw new HttpError(404, "The outbox is only available in development");
    const { organisationId, user } = getAuth(res);
    const reader = user.email.toLowerCase();
    const messages = (await listOutboundMail(db, organisationId)).map((message) => {
      const own = message.to.toLowerCase() === reader;
      return { ...message, text: own ? message.text : hideLinkTokens(message.text), linksHidden: !own };
    });
    res.json({ messages } satisfies OutboxResponse);
  });
  return router;
}
