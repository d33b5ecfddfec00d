/**
 * Sessions and authorisation for every API route.
 *
 * How routes use this:
 *
 *   // server/auth/route-permissions.ts: who may call the route at all
 *   "POST /api/visits/:id/readings": PERMISSIONS.writeRecords,
 *
 *   // the router: no guard of its own; the gate has already answered 401 or 403
 *   router.post("/:id/readings", async (req, res) => {
 *     const { user, organisationId } = getAuth(res);
 *     const rows = await listThings(db, organisationId); // every query scoped by organisationId
 *     …
 *   });
 *
 * - `loadSession(auth, …)` runs once for all of /api (mounted in app.ts). It reads the session
 *   cookie, validates it, renews it when lucia says so, clears it when it is stale, and puts
 *   `res.locals.auth = { user, session, organisationId }` for a signed-in, active user.
 * - `requireUser` answers 401 without a session. `requireRole(...roles)` also answers 403 when
 *   the user's role is not listed. The route gate (server/auth/route-permissions.ts) applies
 *   them from its table. Roles are read from the database on every request, so a role change
 *   applies at once.
 * - `getAuth(res)` returns res.locals.auth inside a handler of a signed-in route (it throws a
 *   401 if there is no session, so a route wrongly marked public fails closed).
 * - Records of another organisation must answer 404, never 403: look them up with
 *   `where organisation_id = organisationId`, and treat "not found" and "not yours" alike.
 */
import type { RequestHandler, Response } from "express";
import type { Session, User } from "lucia";
import type { Role } from "@shared/schemas/auth.ts";
import { HttpError } from "../http/http-error.ts";
import type { Auth } from "./lucia.ts";
import { cachedSession, forgetSession, forgetUserSessions, rememberSession } from "./session-cache.ts";

export interface AuthContext {
  user: User;
  session: Session;
  organisationId: string;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Locals {
      /** Set by loadSession for a signed-in, active user; absent otherwise. */
      auth?: AuthContext;
    }
  }
}

/**
 * `cacheSessions`: keep validated sessions a minute in this process (server/auth/session-cache.ts).
 * Only where this process is the only app server: another server's sign-out, role change or
 * removal forgets the session in its own memory only, and this one would honour it for up to a minute.
 */
export function loadSession(auth: Auth, { cacheSessions }: { cacheSessions: boolean }): RequestHandler {
  return async (req, res, next) => {
    try {
      const sessionId = auth.readSessionCookie(req.headers.cookie ?? "");
      if (!sessionId) return next();
      // A session validated within the last minute and not changed since (server/auth/session-cache.ts).
      const cached = cacheSessions ? cachedSession(sessionId) : undefined;
      const { session, user } = cached ?? (await auth.validateSession(sessionId));
      if (!session) {
        // Expired or signed out elsewhere: drop the dead cookie.
        res.append("Set-Cookie", auth.createBlankSessionCookie().serialize());
        return next();
      }
      if (user.deactivatedAt) {
        await auth.invalidateUserSessions(user.id);
        forgetUserSessions(user.id);
        res.append("Set-Cookie", auth.createBlankSessionCookie().serialize());
        return next();
      }
      // lucia extended the session (renewal on use): send the cookie with the new expiry.
      if (session.fresh) res.append("Set-Cookie", auth.createSessionCookie(session.id).serialize());
      if (cacheSessions && !cached) rememberSession(session, user);
      res.locals.auth = { user, session, organisationId: user.organisationId };
      next();
    } catch (error) {
      next(error);
    }
  };
}

const SIGN_IN_REQUIRED = "Sign in to continue";

export const requireUser: RequestHandler = (_req, res, next) => {
  next(res.locals.auth ? undefined : new HttpError(401, SIGN_IN_REQUIRED));
};

export function requireRole(...roles: readonly Role[]): RequestHandler {
  return (_req, res, next) => {
    const context = res.locals.auth;
    if (!context) return next(new HttpError(401, SIGN_IN_REQUIRED));
    if (!roles.includes(context.user.role)) {
      return next(new HttpError(403, "Your role does not allow this. Ask an owner if you need it."));
    }
    next();
  };
}

export function getAuth(res: Response): AuthContext {
  const context = res.locals.auth;
  if (!context) throw new HttpError(401, SIGN_IN_REQUIRED);
  return context;
}

/**
 * Creates a session for the user and sets its cookie on the response. A session the browser
 * already had is ended first, so signing in always yields a fresh id (no session fixation).
 */
export async function startSession(auth: Auth, res: Response, userId: string): Promise<void> {
  const previous = res.locals.auth;
  if (previous) {
    await auth.invalidateSession(previous.session.id);
    forgetSession(previous.session.id);
  }
  const session = await auth.createSession(userId, {});
  res.append("Set-Cookie", auth.createSessionCookie(session.id).serialize());
}

/** Ends the current session, if any, and clears the cookie. */
export async function endSession(auth: Auth, res: Response): Promise<void> {
  const current = res.locals.auth;
  if (current) {
    await auth.invalidateSession(current.session.id);
    forgetSession(current.session.id);
  }
  res.locals.auth = undefined;
  res.append("Set-Cookie", auth.createBlankSessionCookie().serialize());
}
