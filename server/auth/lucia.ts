import { DrizzlePostgreSQLAdapter } from "@lucia-auth/adapter-drizzle";
import { Lucia, TimeSpan } from "lucia";
import type { Role } from "@shared/schemas/auth.ts";
import type { Database } from "../db/client.ts";
import { sessions, users } from "../db/schema.ts";
import type { Env } from "../env.ts";

/**
 * A session lasts 30 days from its last renewal. lucia renews it (new expiry, same id) on any
 * request made in the second half of that window, so someone who opens Satura weekly stays
 * signed in and an abandoned session ends a month after its last use.
 */
export const SESSION_LIFETIME = new TimeSpan(30, "d");

export const SESSION_COOKIE_NAME = "satura_session";

export function createLucia(db: Database, env: Env) {
  return new Lucia(new DrizzlePostgreSQLAdapter(db, sessions, users), {
    sessionExpiresIn: SESSION_LIFETIME,
    sessionCookie: {
      name: SESSION_COOKIE_NAME,
      // A persistent cookie whose expiry follows the session's.
      expires: true,
      attributes: {
        // Lax keeps the cookie on top-level links from e-mail but off cross-site POSTs.
        sameSite: "lax",
        // lucia defaults to secure: true; http test servers and closed-network installs opt out via env.
        secure: env.cookieSecure,
        path: "/",
      },
    },
    // The adapter reads the whole users row; only these fields ever leave this module.
    getUserAttributes: (row) => ({
      email: row.email,
      name: row.name,
      role: row.role,
      organisationId: row.organisationId,
      deactivatedAt: row.deactivatedAt,
    }),
  });
}

export type Auth = ReturnType<typeof createLucia>;

interface DatabaseUserAttributes {
  email: string;
  name: string;
  role: Role;
  organisationId: string;
  deactivatedAt: Date | null;
}

declare module "lucia" {
  interface Register {
    Lucia: Auth;
    UserId: string;
    DatabaseUserAttributes: DatabaseUserAttributes;
  }
}
