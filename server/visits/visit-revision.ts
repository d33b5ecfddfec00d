/**
 * A visit's revision as the client sees it: one opaque token, sent as the detail's ETag and
 * given back as `?since=` to ask only for what changed. It joins three parts:
 *
 * - this process's start, because start-up may rewrite stored readings without a visit write
 *   (server/db/upgrade-stored-diagnoses.ts): after a restart every client reloads the visit once;
 * - the visit's revision (visits.revision), bumped by every write under the visit's row lock, so
 *   it orders the visit's writes with no clock involved;
 * - a fingerprint of what the detail shows from other tables (unit, site and customer names,
 *   the site's altitude), which change without a visit write.
 */
import { createHash } from "node:crypto";

const PROCESS_EPOCH = Date.now().toString(36);

export function visitRevisionToken(revision: number, shownElsewhere: unknown): string {
  const fingerprint = createHash("sha1").update(JSON.stringify(shownElsewhere)).digest("base64url").slice(0, 10);
  return `${PROCESS_EPOCH}.${revision}.${fingerprint}`;
}

/** Weak: the body is the same record, not the same bytes (compression changes those). */
export const visitEtag = (token: string) => `W/"${token}"`;

/**
 * The visit revision a `since` token stands for, when a delta can be served on top of it: same
 * process, and not ahead of the visit (a token from a restored or another database is refused).
 * Undefined means "send the whole visit".
 */
export function revisionSince(token: unknown, current: number): number | undefined {
  if (typeof token !== "string") return undefined;
  const [epoch, revision] = token.split(".");
  const value = Number(revision);
  if (epoch !== PROCESS_EPOCH || !Number.isInteger(value) || value < 0 || value > current) return undefined;
  return value;
}

/** Whether an If-None-Match header names this ETag (a list, weak or strong, or `*`). */
export function matchesIfNoneMatch(header: string | undefined, etag: string): boolean {
  if (!header) return false;
  const bare = (tag: string) => tag.trim().replace(/^W\//, "");
  return header.split(",").some((tag) => tag.trim() === "*" || bare(tag) === bare(etag));
}
