import { and, eq, gt, isNull } from "drizzle-orm";
import type { Database } from "./client.ts";
import { passwordResets, sessions, users } from "./schema.ts";
import { forgetUserSessions } from "../auth/session-cache.ts";

/** Stores a new reset token for the user; any earlier unused one stops working. */
export async function createPasswordReset(
  db: Database,
  input: { userId: string; tokenHash: string; expiresAt: Date },
  now = new Date(),
) {
  await db.transaction(async (tx) => {
    await tx
      .update(passwordResets)
      .set({ usedAt: now })
      .where(and(eq(passwordResets.userId, input.userId), isNull(passwordResets.usedAt)));
    await tx.insert(passwordResets).values(input);
  });
}

/**
 * Uses a reset token: sets the new password hash, marks the token used and ends every
 * session of the user (whoever knew the old password is signed out), in one transaction.
 * @returns false when the token is unknown, used or expired.
 */
export async function consumePasswordReset(
  db: Database,
  input: { tokenHash: string; passwordHash: string },
  now = new Date(),
) {
  const consumed = await db.transaction(async (tx) => {
    const [reset] = await tx
      .update(passwordResets)
      .set({ usedAt: now })
      .where(
        and(
          eq(passwordResets.tokenHash, input.tokenHash),
          isNull(passwordResets.usedAt),
          gt(passwordResets.expiresAt, now),
        ),
      )
      .returning();
    if (!reset) return false;
    const [user] = await tx
      .update(users)
      .set({ passwordHash: input.passwordHash, updatedAt: now })
      .where(and(eq(users.id, reset.userId), isNull(users.deactivatedAt)))
      .returning({ id: users.id });
    if (!user) return false;
    await tx.delete(sessions).where(eq(sessions.userId, reset.userId));
    return reset.userId;
  });
  if (!consumed) return false;
  forgetUserSessions(consumed);
  return true;
}
