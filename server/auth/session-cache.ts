/**
 * Validated sessions kept for a minute, so a signed-in request costs no database round trip:
 * lucia reads the session and its user on every request, which on the embedded database (one
 * statement at a time) was the largest single cost of a save under load.
 *
 * Whatever changes what a session stands for forgets it at once, after its own write: signing
 * out or in (server/auth/session.ts), a password reset or change, a role change, a member's
 * removal and a profile's new name (server/db/accounts.ts, members.ts, password-resets.ts).
 * Roles and deactivation therefore still apply to the very next request, as before. One
 * process holds a PGlite database (README decision 002), so one process's memory is the whole
 * cache; with several app servers on one PostgreSQL the cache is off (server/index.ts, decision 035).
 */
import type { Session, User } from "lucia";

/** Long enough to spare a busy run log its look-ups; short enough that nothing missed lingers. */
export const SESSION_CACHE_MS = 60_000;
/** Sessions kept at most; the oldest go first. */
const MAX_ENTRIES = 10_000;

interface Entry {
  session: Session;
  user: User;
  until: number;
}

const entries = new Map<string, Entry>();

/** A cached, unexpired session and its user, or undefined (validate with lucia then). */
export function cachedSession(sessionId: string, now = Date.now()): { session: Session; user: User } | undefined {
  const entry = entries.get(sessionId);
  if (!entry) return undefined;
  if (entry.until <= now || entry.session.expiresAt.getTime() <= now) {
    entries.delete(sessionId);
    return undefined;
  }
  return { session: entry.session, user: entry.user };
}

export function rememberSession(session: Session, user: User, now = Date.now()): void {
  if (entries.size >= MAX_ENTRIES) entries.delete(entries.keys().next().value!);
  // A renewal's cookie is sent once, by the request that renewed it.
  entries.set(session.id, { session: { ...session, fresh: false }, user, until: now + SESSION_CACHE_MS });
}

export function forgetSession(sessionId: string): void {
  entries.delete(sessionId);
}

/** Forgets every cached session of a user: their role, name, password or membership changed. */
export function forgetUserSessions(userId: string): void {
  for (const [id, entry] of entries) if (entry.user.id === userId) entries.delete(id);
}
