import { inArray } from "drizzle-orm";
import type { VoidInfo } from "@shared/schemas/visits.ts";
import type { Database } from "./client.ts";
import { users } from "./schema.ts";

export type PersonRef = { id: string; name: string };
export type People = Map<string, PersonRef>;

/** Names of the people a set of records mentions, in one query. */
export async function peopleById(db: Database, ids: (string | null)[]): Promise<People> {
  const wanted = [...new Set(ids.filter((id): id is string => id !== null))];
  if (wanted.length === 0) return new Map();
  const rows = await db.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, wanted));
  return new Map(rows.map((row) => [row.id, row]));
}

/** The person a record names, or null when none (or a removed member's row is gone). */
export const person = (people: People, id: string | null): PersonRef | null => (id ? (people.get(id) ?? null) : null);

/** A voidable row's void (who, when, why), or null while it stands. */
export function voidInfo(
  row: { voidedAt: Date | null; voidedBy: string | null; voidReason: string | null },
  people: People,
): VoidInfo {
  return row.voidedAt
    ? { at: row.voidedAt.toISOString(), by: person(people, row.voidedBy), reason: row.voidReason ?? "" }
    : null;
}
