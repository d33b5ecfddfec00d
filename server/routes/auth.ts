import { Router } from "express";
import {
  MessageResponseSchema,
  PasswordResetConfirmSchema,
  PasswordResetRequestSchema,
  SignInSchema,
  SignUpSchema,
  type MeResponse,
} from "@shared/schemas/auth.ts";
import { hashPassword, verifyDummyPassword, verifyPassword } from "../auth/password.ts";
import { endSession, getAuth, startSession } from "../auth/session.ts";
import { createToken, hashToken, tokenLink } from "../auth/tokens.ts";
import { createOrganisationWithOwner, emailInUse, findUserByEmail, toAuthUser } from "../db/accounts.ts";
import { uniqueViolation } from "../db/errors.ts";
import { consumePasswordReset, createPasswordReset } from "../db/password-resets.ts";
import { HttpError } from "../http/http-error.ts";
import { passwordResetMail } from "../mail/messages.ts";
import type { AccountRouteDeps } from "./route-deps.ts";

/** A reset link is short-lived: it is as good as the password for whoever holds it. */
export const PASSWORD_RESET_VALID_MINUTES = 60;

/** One message for every failed sign-in, so it never tells which half was wrong. */
export const SIGN_IN_FAILED = "That e-mail and password do not match an account";

export const RESET_REQUESTED = "If an account uses that e-mail address, a link to reset its password is on its way.";

export function authRouter({ db, env, logger, auth, mailer, limiters }: AccountRouteDeps): Router {
  const router = Router();

  router.post("/sign-up", ...limiters.signUp, async (req, res) => {
    const input = SignUpSchema.parse(req.body);
    // Sign-up must say when an address is taken; it is throttled per IP like sign-in.
    const taken = () =>
      new HttpError(409, "Some fields need attention", {
        email: "This e-mail address already has an account. Sign in, or reset the password.",
      });
    if (await emailInUse(db, input.email)) throw taken();
    // Two sign-ups for one address at once both pass the check above; the unique index stops the second.
    const user = await createOrganisationWithOwner(db, {
      ...input,
      passwordHash: await hashPassword(input.password),
    }).catch((error: unknown) => Promise.reject(uniqueViolation(error) ? taken() : error));
    await startSession(auth, res, user.id);
    res.status(201).json({ user: toAuthUser(user) } satisfies MeResponse);
  });

  router.post("/sign-in", ...limiters.signIn, async (req, res) => {
    const parsed = SignInSchema.safeParse(req.body);
    // A malformed address gets the same answer as a wrong one; only missing fields are 400.
    if (!parsed.success) {
      if (
        typeof req.body?.email === "string" &&
        typeof req.body?.password === "string" &&
        req.body.password.length > 0
      ) {
        throw new HttpError(401, SIGN_IN_FAILED);
      }
      throw parsed.error;
    }
    const { email, password } = parsed.data;
    const user = await findUserByEmail(db, email);
    const passwordOk =
      user && !user.deactivatedAt
        ? await verifyPassword(user.passwordHash, password)
        : await verifyDummyPassword(password);
    if (!user || user.deactivatedAt || !passwordOk) throw new HttpError(401, SIGN_IN_FAILED);
    await startSession(auth, res, user.id);
    res.status(200).json({ user: toAuthUser(user) } satisfies MeResponse);
  });

  router.post("/sign-out", async (_req, res) => {
    await endSession(auth, res);
    res.status(204).end();
  });

  router.get("/me", (_req, res) => {
    const { user } = getAuth(res);
    res.json({ user: toAuthUser({ ...user }) } satisfies MeResponse);
  });

  router.post("/password-reset/request", ...limiters.resetRequest, async (req, res) => {
    const { email } = PasswordResetRequestSchema.parse(req.body);
    // The answer is the same whether or not the account exists, and it is sent before any
    // mail work, so neither its content nor its timing tells the two apart.
    res.status(202).json(MessageResponseSchema.parse({ message: RESET_REQUESTED }));
    try {
      const user = await findUserByEmail(db, email);
      if (!user || user.deactivatedAt) return;
      const { token, tokenHash } = createToken();
      await createPasswordReset(db, {
        userId: user.id,
        tokenHash,
        expiresAt: new Date(Date.now() + PASSWORD_RESET_VALID_MINUTES * 60_000),
      });
      const link = tokenLink(env.APP_URL, "/reset-password", token);
      await mailer.send(
        passwordResetMail({
          to: user.email,
          name: user.name,
          link,
          validMinutes: PASSWORD_RESET_VALID_MINUTES,
          organisationId: user.organisationId,
        }),
      );
    } catch (error) {
      logger.error({ err: error }, "password reset mail failed");
    }
  });

  router.post("/password-reset/confirm", ...limiters.resetConfirm, async (req, res) => {
    const { token, password } = PasswordResetConfirmSchema.parse(req.body);
    const done = await consumePasswordReset(db, {
      tokenHash: hashToken(token),
      passwordHash: await hashPassword(password),
    });
    if (!done) {
      throw new HttpError(400, "This reset link is not valid any more. Ask for a new one.", {
        token: "This reset link has expired or was already used",
      });
    }
    res.status(204).end();
  });

  return router;
}
