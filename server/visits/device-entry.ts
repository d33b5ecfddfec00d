/**
 * The server's side of entries made on a device (README decision 026): the device's time checked
 * against the visit, the client id of a body, and the answer to a write that may be a repeat.
 */
import type { Response } from "express";
import { ClientIdSchema, deviceTimeProblem } from "@shared/schemas/device-entries.ts";
import type { Database } from "../db/client.ts";
import { findEntry, type EntryKind, type EntryTable } from "../db/store-once.ts";
import { HttpError } from "../http/http-error.ts";

/** The response header marking an answer given from an entry an earlier send stored (as Stripe's API names it). */
export const REPLAYED_HEADER = "Idempotent-Replayed";

/**
 * Refuses a device time later than now or earlier than the visit's start (beyond the clock
 * skew) with a 400 naming the field; no time (the server's clock then) passes.
 *
 * `backDated` entries — an adjustment's or a register movement's `at`, which have always taken a
 * time entered after the fact (a recovery made before the visit was opened in the app, a
 * register line written up later) — are held to the future bound only.
 */
export function requireDeviceTime(
  field: string,
  iso: string | undefined,
  visit: { startedAt: Date },
  { backDated = false, nowMs = Date.now() } = {},
): void {
  if (iso === undefined) return;
  const problem = deviceTimeProblem(Date.parse(iso), {
    nowMs,
    visitStartedMs: backDated ? -Infinity : visit.startedAt.getTime(),
  });
  if (problem) throw new HttpError(400, "Some fields need attention", { [field]: problem });
}

/** A device time to store, or undefined for the database's own now. */
export const deviceDate = (iso: string | undefined) => (iso === undefined ? undefined : new Date(iso));

/**
 * The client id of a body not parsed yet (undefined unless it is a UUID): a repeated send is
 * answered before the visit's status is checked, so an entry stored just before the visit was
 * submitted is still answered as stored, not refused, when its answer was lost.
 */
export function clientIdOf(body: unknown): string | undefined {
  const raw = typeof body === "object" && body !== null ? (body as { clientId?: unknown }).clientId : undefined;
  const parsed = ClientIdSchema.safeParse(raw);
  return parsed.success ? parsed.data : undefined;
}

/**
 * Answers a write of a visit entry: 201 with the entry whether this send stored it or an earlier
 * one with the same client id did (the client needs the stored entry either way, and one status
 * keeps its outbox simple); a repeat carries `Idempotent-Replayed: true`.
 */
export function sendEntry(res: Response, body: object, replayed: boolean): void {
  if (replayed) res.setHeader(REPLAYED_HEADER, "true");
  res.status(201).json(body);
}

/**
 * Answers a repeated send from the entry its client id already names on the visit, as the first
 * send was answered (`{ [key]: entry }`, 201, marked replayed); false when there is none, and the
 * route goes on to store it (where the unique index still settles a race between two sends).
 */
export async function answeredBefore<Table extends EntryTable, Entry>(
  db: Database,
  res: Response,
  kind: EntryKind<Table, Entry>,
  key: string,
  visitId: string,
  body: unknown,
): Promise<boolean> {
  const entry = await findEntry(db, kind, visitId, clientIdOf(body));
  if (entry === undefined) return false;
  sendEntry(res, { [key]: entry }, true);
  return true;
}
