import { desc, eq } from "drizzle-orm";
import type { OutboxMessage } from "@shared/schemas/outbox.ts";
import type { Database } from "./client.ts";
import { outboundMail } from "./schema.ts";

export const OUTBOX_PAGE_SIZE = 50;

export async function recordOutboundMail(
  db: Database,
  input: { to: string; subject: string; text: string; html: string | null; organisationId: string | null },
): Promise<void> {
  await db.insert(outboundMail).values(input);
}

/** The organisation's latest messages, newest first. */
export async function listOutboundMail(
  db: Database,
  organisationId: string,
): Promise<Omit<OutboxMessage, "linksHidden">[]> {
  const rows = await db
    .select()
    .from(outboundMail)
    .where(eq(outboundMail.organisationId, organisationId))
    .orderBy(desc(outboundMail.createdAt))
    .limit(OUTBOX_PAGE_SIZE);
  return rows.map((row) => ({
    id: row.id,
    to: row.to,
    subject: row.subject,
    text: row.text,
    createdAt: row.createdAt.toISOString(),
  }));
}
