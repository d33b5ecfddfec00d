import { and, asc, count, eq, isNull } from "drizzle-orm";
import type { Member } from "@shared/schemas/members.ts";
import type { Role } from "@shared/schemas/auth.ts";
import type { Database } from "./client.ts";
import { sessions, users } from "./schema.ts";
import { oneRow } from "./one-row.ts";
import { forgetUserSessions } from "../auth/session-cache.ts";

type UserRow = typeof users.$inferSelect;

function toMember(row: UserRow): Member {
  return { id: row.id, name: row.name, email: row.email, role: row.role, createdAt: row.createdAt.toISOString() };
}

const activeIn = (organisationId: string) => and(eq(users.organisationId, organisationId), isNull(users.deactivatedAt));

export async function listMembers(db: Database, organisationId: string): Promise<Member[]> {
  const rows = await db.select().from(users).where(activeIn(organisationId)).orderBy(asc(users.name));
  return rows.map(toMember);
}

/** An active member of this organisation; undefined for anyone else's (the route answers 404). */
export async function findMember(db: Database, organisationId: string, memberId: string): Promise<Member | undefined> {
  const [row] = await db
    .select()
    .from(users)
    .where(and(activeIn(organisationId), eq(users.id, memberId)))
    .limit(1);
  return row ? toMember(row) : undefined;
}

export class LastOwnerError extends Error {
  constructor() {
    super("An organisation always keeps at least one owner");
    this.name = "LastOwnerError";
  }
}

async function ownerCount(db: Pick<Database, "select">, organisationId: string): Promise<number> {
  const rows = await db
    .select({ owners: count() })
    .from(users)
    .where(and(activeIn(organisationId), eq(users.role, "owner")));
  return oneRow(rows, "count owners").owners;
}

/**
 * Changes a member's role. Refuses (LastOwnerError) to demote the last owner, inside one
 * transaction so two owners demoting each other cannot both succeed.
 */
export async function changeMemberRole(
  db: Database,
  organisationId: string,
  memberId: string,
  role: Role,
): Promise<Member | undefined> {
  const member = await db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(users)
      .where(and(activeIn(organisationId), eq(users.id, memberId)))
      .for("update");
    if (!row) return undefined;
    if (row.role === "owner" && role !== "owner" && (await ownerCount(tx, organisationId)) <= 1)
      throw new LastOwnerError();
    // The row is locked above, so the update finds it.
    const updated = await tx
      .update(users)
      .set({ role, updatedAt: new Date() })
      .where(eq(users.id, memberId))
      .returning();
    return toMember(oneRow(updated, "update member role"));
  });
  forgetUserSessions(memberId); // the new role applies to their next request
  return member;
}

/**
 * Removes a member from the organisation: deactivates the row (records they signed keep
 * their name) and ends all their sessions. The last owner cannot be removed.
 * @returns false when there is no such active member in this organisation.
 */
export async function removeMember(db: Database, organisationId: string, memberId: string): Promise<boolean> {
  const removed = await db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(users)
      .where(and(activeIn(organisationId), eq(users.id, memberId)))
      .for("update");
    if (!row) return false;
    if (row.role === "owner" && (await ownerCount(tx, organisationId)) <= 1) throw new LastOwnerError();
    await tx.update(users).set({ deactivatedAt: new Date(), updatedAt: new Date() }).where(eq(users.id, memberId));
    await tx.delete(sessions).where(eq(sessions.userId, memberId));
    return true;
  });
  forgetUserSessions(memberId);
  return removed;
}
