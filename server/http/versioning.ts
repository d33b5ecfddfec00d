/**
 * Optimistic concurrency for records people edit (a casebook case, the company limits, a
 * profile, an evacuation): each carries a version that every change bumps. The client sends
 * the version it last read as `If-Match: "<version>"` (RFC 9110 §13.1.1); a write based on an
 * older version is refused with 409 rather than silently overwriting someone else's save.
 */
import type { Request, Response } from "express";
import { HttpError } from "./http-error.ts";

const ETAG = /^(?:W\/)?"(\d{1,9})"$/;

/** The version the write is based on; 428 without If-Match, 400 when it is not one of ours. */
export function requireIfMatch(req: Request): number {
  const header = req.get("If-Match");
  if (!header) {
    throw new HttpError(
      428,
      "This change must say which version it replaces (an If-Match header): reload the page and try again",
    );
  }
  const match = ETAG.exec(header.trim());
  if (!match)
    throw new HttpError(400, `If-Match must be a version this server sent, like "3"; got ${header.slice(0, 40)}`);
  return Number(match[1]);
}

/** Sends the record's version as its ETag, beside the `version` field of the body. */
export function setVersion(res: Response, version: number): void {
  res.setHeader("ETag", `"${version}"`);
}

/** The answer to a write based on an old version; `what` in running text, e.g. "the company limits". */
export function staleWrite(what: string): HttpError {
  return new HttpError(
    409,
    `A newer version of ${what} was saved after you opened it here, so your change was not saved. Reload to see the latest version, then make your change again.`,
  );
}
