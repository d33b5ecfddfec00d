import { lt } from "drizzle-orm";
import type { Database } from "./client.ts";
import { sessions } from "./schema.ts";

/** Deletes sessions past their expiry; lucia refuses them anyway, this keeps the table small. */
export async function deleteExpiredSessions(db: Database, now = new Date()): Promise<number> {
  const removed = await db.delete(sessions).where(lt(sessions.expiresAt, now)).returning({ id: sessions.id });
  return removed.length;
}
