import { and, desc, eq, gt, isNull, sql } from "drizzle-orm";
import type { Invitation } from "@shared/schemas/invitations.ts";
import type { Role } from "@shared/schemas/auth.ts";
import type { Database } from "./client.ts";
import { invitations, organisations, users } from "./schema.ts";
import { oneRow } from "./one-row.ts";

type InvitationRow = typeof invitations.$inferSelect;

function toInvitation(row: InvitationRow, invitedByName: string | null): Invitation {
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    invitedByName,
    expiresAt: row.expiresAt.toISOString(),
    createdAt: row.createdAt.toISOString(),
  };
}

const pending = (now: Date) => and(isNull(invitations.acceptedAt), gt(invitations.expiresAt, now));

/** Pending (not accepted, not expired) invitations of one organisation, newest first. */
export async function listPendingInvitations(
  db: Database,
  organisationId: string,
  now = new Date(),
): Promise<Invitation[]> {
  const rows = await db
    .select({ invitation: invitations, invitedByName: users.name })
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.organisationId, organisationId), pending(now)))
    .orderBy(desc(invitations.createdAt));
  return rows.map((row) => toInvitation(row.invitation, row.invitedByName));
}

/**
 * Creates an invitation; an earlier pending one to the same address in the same
 * organisation is replaced, so re-inviting resends a fresh link.
 */
export async function createInvitation(
  db: Database,
  input: {
    organisationId: string;
    email: string;
    role: Role;
    tokenHash: string;
    invitedBy: string;
    invitedByName: string;
    expiresAt: Date;
  },
): Promise<Invitation> {
  return db.transaction(async (tx) => {
    await tx
      .delete(invitations)
      .where(
        and(
          eq(invitations.organisationId, input.organisationId),
          sql`lower(${invitations.email}) = ${input.email.toLowerCase()}`,
          isNull(invitations.acceptedAt),
        ),
      );
    const rows = await tx
      .insert(invitations)
      .values({
        organisationId: input.organisationId,
        email: input.email,
        role: input.role,
        tokenHash: input.tokenHash,
        invitedBy: input.invitedBy,
        expiresAt: input.expiresAt,
      })
      .returning();
    return toInvitation(oneRow(rows, "insert invitation"), input.invitedByName);
  });
}

/** @returns false when this organisation has no such pending invitation (the route answers 404). */
export async function revokeInvitation(db: Database, organisationId: string, invitationId: string): Promise<boolean> {
  const deleted = await db
    .delete(invitations)
    .where(
      and(
        eq(invitations.organisationId, organisationId),
        eq(invitations.id, invitationId),
        isNull(invitations.acceptedAt),
      ),
    )
    .returning({ id: invitations.id });
  return deleted.length > 0;
}

/** A usable invitation by the hash of its e-mailed token, with the organisation's name. */
export async function findUsableInvitation(db: Database, tokenHash: string, now = new Date()) {
  const [row] = await db
    .select({ invitation: invitations, organisationName: organisations.name })
    .from(invitations)
    .innerJoin(organisations, eq(organisations.id, invitations.organisationId))
    .where(and(eq(invitations.tokenHash, tokenHash), pending(now)))
    .limit(1);
  return row;
}

/**
 * Marks the invitation accepted and creates the member, in one transaction; the update's
 * condition makes the token single-use even if two acceptances race.
 * @returns the new user row, or undefined when the invitation was used or expired meanwhile.
 */
export async function acceptInvitation(
  db: Database,
  input: { invitationId: string; name: string; passwordHash: string },
  now = new Date(),
) {
  return db.transaction(async (tx) => {
    const [invitation] = await tx
      .update(invitations)
      .set({ acceptedAt: now })
      .where(and(eq(invitations.id, input.invitationId), pending(now)))
      .returning();
    if (!invitation) return undefined;
    const [user] = await tx
      .insert(users)
      .values({
        organisationId: invitation.organisationId,
        email: invitation.email,
        name: input.name,
        role: invitation.role,
        passwordHash: input.passwordHash,
      })
      .returning();
    return user;
  });
}
