import { Router } from "express";
import {
  AcceptInvitationSchema,
  CreateInvitationSchema,
  INVITATION_VALID_DAYS,
  InvitationPreviewRequestSchema,
  type InvitationPreview,
  type InvitationResponse,
  type InvitationsResponse,
} from "@shared/schemas/invitations.ts";
import { hashPassword } from "../auth/password.ts";
import { getAuth, startSession } from "../auth/session.ts";
import { createToken, hashToken, tokenLink } from "../auth/tokens.ts";
import { emailInUse, findUserByEmail, toAuthUser } from "../db/accounts.ts";
import { uniqueViolation } from "../db/errors.ts";
import {
  acceptInvitation,
  createInvitation,
  findUsableInvitation,
  listPendingInvitations,
  revokeInvitation,
} from "../db/invitations.ts";
import { getProfile } from "../db/accounts.ts";
import { HttpError, notFound } from "../http/http-error.ts";
import { invitationMail } from "../mail/messages.ts";
import { parseId } from "../http/parse-id.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

const INVALID_LINK = "This invitation link is not valid any more. Ask the person who invited you for a new one.";

export function invitationsRouter({ db, env, auth, mailer, limiters }: AccountRouteDeps): Router {
  const router = Router();

  router.get("/", async (_req, res) => {
    const { organisationId } = getAuth(res);
    res.json({ invitations: await listPendingInvitations(db, organisationId) } satisfies InvitationsResponse);
  });

  router.post("/", async (req, res) => {
    const { user, organisationId } = getAuth(res);
    const { email, role } = CreateInvitationSchema.parse(req.body);
    // Someone already in this company is visible to the owner anyway. An address that belongs
    // to another company gets exactly the same answer and mail as a new one (no enumeration);
    // accepting then tells the invitee, who owns the mailbox, to sign in instead.
    const existing = await findUserByEmail(db, email);
    if (existing && existing.organisationId === organisationId && !existing.deactivatedAt) {
      throw new HttpError(409, "Some fields need attention", { email: "This person is already a member" });
    }
    const profile = await getProfile(db, user.id, organisationId);
    const { token, tokenHash } = createToken();
    const invitation = await createInvitation(db, {
      organisationId,
      email,
      role,
      tokenHash,
      invitedBy: user.id,
      invitedByName: user.name,
      expiresAt: new Date(Date.now() + INVITATION_VALID_DAYS * 24 * 3600_000),
    });
    const link = tokenLink(env.APP_URL, "/accept-invitation", token);
    await mailer.send(
      invitationMail({
        to: email,
        organisationName: profile?.organisationName ?? "your company",
        invitedByName: user.name,
        role,
        link,
        organisationId,
      }),
    );
    res.status(201).json({ invitation } satisfies InvitationResponse);
  });

  router.delete("/:id", async (req, res) => {
    const { organisationId } = getAuth(res);
    const id = parseId(req.params.id, "Invitation");
    if (!(await revokeInvitation(db, organisationId, id))) throw notFound("Invitation");
    res.status(204).end();
  });

  // Public: the invitee has no account yet. The token travels in the body, never the URL.
  router.post("/preview", ...limiters.signUp, async (req, res) => {
    const { token } = InvitationPreviewRequestSchema.parse(req.body);
    const found = await findUsableInvitation(db, hashToken(token));
    if (!found) throw new HttpError(404, INVALID_LINK);
    const preview: InvitationPreview = {
      organisationName: found.organisationName,
      email: found.invitation.email,
      role: found.invitation.role,
    };
    res.json(preview);
  });

  router.post("/accept", ...limiters.signUp, async (req, res) => {
    const { token, name, password } = AcceptInvitationSchema.parse(req.body);
    const found = await findUsableInvitation(db, hashToken(token));
    if (!found) throw new HttpError(404, INVALID_LINK);
    const taken = () =>
      new HttpError(
        409,
        "This e-mail address already has a Satura account. Sign in with it, or ask for an invitation to another address.",
      );
    if (await emailInUse(db, found.invitation.email)) throw taken();
    const user = await acceptInvitation(db, {
      invitationId: found.invitation.id,
      name,
      passwordHash: await hashPassword(password),
    }).catch((error: unknown) => Promise.reject(uniqueViolation(error) ? taken() : error));
    if (!user) throw new HttpError(404, INVALID_LINK);
    await startSession(auth, res, user.id);
    res.status(201).json({ user: toAuthUser(user) });
  });

  return router;
}
