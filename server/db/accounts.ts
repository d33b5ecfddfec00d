import { and, eq, isNull, sql } from "drizzle-orm";
import type { AuthUser, Role } from "@shared/schemas/auth.ts";
import { DEFAULT_PREFERENCES, PreferencesSchema, type Preferences } from "@shared/schemas/profile.ts";
import type { Database } from "./client.ts";
import { organisations, users } from "./schema.ts";
import { oneRow } from "./one-row.ts";
import { forgetUserSessions } from "../auth/session-cache.ts";

type UserRow = typeof users.$inferSelect;

export function toAuthUser(row: Pick<UserRow, "id" | "email" | "name" | "role" | "organisationId">): AuthUser {
  return { id: row.id, email: row.email, name: row.name, role: row.role, organisationId: row.organisationId };
}

/** Any user with this address, active or not, in any organisation (addresses are unique). */
export async function findUserByEmail(db: Database, email: string): Promise<UserRow | undefined> {
  const [row] = await db
    .select()
    .from(users)
    .where(sql`lower(${users.email}) = ${email.toLowerCase()}`)
    .limit(1);
  return row;
}

/** Is this address taken? Postgres's unique index on lower(email) is the final guard. */
export async function emailInUse(db: Database, email: string): Promise<boolean> {
  return (await findUserByEmail(db, email)) !== undefined;
}

/** Sign-up: a new organisation and its first owner, in one transaction. */
export async function createOrganisationWithOwner(
  db: Database,
  input: { organisationName: string; name: string; email: string; passwordHash: string },
): Promise<UserRow> {
  return db.transaction(async (tx) => {
    const organisation = oneRow(
      await tx.insert(organisations).values({ name: input.organisationName }).returning(),
      "insert organisation",
    );
    const owners = await tx
      .insert(users)
      .values({
        organisationId: organisation.id,
        name: input.name,
        email: input.email,
        role: "owner",
        passwordHash: input.passwordHash,
      })
      .returning();
    return oneRow(owners, "insert owner");
  });
}

export async function createUser(
  db: Database,
  input: { organisationId: string; name: string; email: string; role: Role; passwordHash: string },
): Promise<UserRow> {
  return oneRow(await db.insert(users).values(input).returning(), "insert user");
}

export async function setPasswordHash(db: Database, userId: string, passwordHash: string): Promise<void> {
  await db.update(users).set({ passwordHash, updatedAt: new Date() }).where(eq(users.id, userId));
  forgetUserSessions(userId);
}

/** Stored preferences may predate a field or hold junk; missing or bad values fall back to defaults. */
export function readPreferences(stored: Record<string, unknown>): Preferences {
  const merged = { ...DEFAULT_PREFERENCES, ...stored };
  const parsed = PreferencesSchema.safeParse(merged);
  return parsed.success ? parsed.data : DEFAULT_PREFERENCES;
}

export async function getProfile(db: Database, userId: string, organisationId: string) {
  const [row] = await db
    .select({ user: users, organisationName: organisations.name })
    .from(users)
    .innerJoin(organisations, eq(organisations.id, users.organisationId))
    .where(and(eq(users.id, userId), eq(users.organisationId, organisationId), isNull(users.deactivatedAt)))
    .limit(1);
  if (!row) return undefined;
  return {
    user: toAuthUser(row.user),
    organisationName: row.organisationName,
    preferences: readPreferences(row.user.preferences),
    licenceNumber: row.user.licenceNumber,
    version: row.user.profileVersion,
  };
}

/** Saves the profile if it is still at `version`; "stale" when it was changed since, undefined when the user is gone. */
export async function updateProfile(
  db: Database,
  userId: string,
  organisationId: string,
  input: { name: string; preferences: Preferences; licenceNumber?: string | null },
  version: number,
) {
  const updated = await db
    .update(users)
    .set({
      name: input.name,
      preferences: input.preferences,
      ...(input.licenceNumber !== undefined ? { licenceNumber: input.licenceNumber } : {}),
      profileVersion: sql`${users.profileVersion} + 1`,
      updatedAt: new Date(),
    })
    .where(and(eq(users.id, userId), eq(users.organisationId, organisationId), eq(users.profileVersion, version)))
    .returning({ id: users.id });
  forgetUserSessions(userId); // the session carries the name
  const profile = await getProfile(db, userId, organisationId);
  if (profile && updated.length === 0) return "stale" as const;
  return profile;
}
