/**
 * What an entry made on a device carries so that it can be sent late and sent again (README
 * decision 026): the id the device gave it when it was first submitted, and when it was taken
 * by the device's clock. The server stores an entry once per client id and keeps the device's
 * time, within bounds.
 */
import { z } from "zod";
import { instant } from "./dates.ts";

/** A UUID made on the device when the entry is first submitted, kept across every retry of it. */
export const ClientIdSchema = z.uuid("clientId must be a UUID made on the device");

/** An optional client id on a request body (a form field, for photos). */
export const optionalClientId = ClientIdSchema.optional();

/** When a visit entry was taken by the device's clock: an ISO 8601 date-time with offset. */
export const deviceTime = (field: string) => instant(`${field} must be an ISO 8601 date and time`).optional();

/**
 * How far a device's clock may run ahead of the server's, ms. Phones set their clocks from the
 * network and are normally within seconds; two minutes lets a clock a minute or so fast through
 * (and a reading taken in the first moments of a visit started from a clock a little behind),
 * while an entry stamped hours ahead or before the visit existed — a wrong clock or a wrong
 * visit — is refused instead of sorting into the run log out of place. Time spent waiting in
 * the outbox does not count against it: the time is the device's, set when the entry was taken.
 */
export const DEVICE_CLOCK_SKEW_MS = 2 * 60_000;

/**
 * What is wrong with a device time for an entry on a visit, or undefined when it may be stored:
 * not later than now plus the skew, and not earlier than the visit's start minus the skew.
 * Times in ms since the epoch; the visit's start and now are the server's.
 */
export function deviceTimeProblem(
  takenAtMs: number,
  { nowMs, visitStartedMs }: { nowMs: number; visitStartedMs: number },
): string | undefined {
  if (takenAtMs > nowMs + DEVICE_CLOCK_SKEW_MS) {
    return "This time is in the future by the server's clock: check the date and time set on the device";
  }
  if (takenAtMs < visitStartedMs - DEVICE_CLOCK_SKEW_MS) {
    return `This time is before the visit started (${new Date(visitStartedMs).toISOString()}): check the device's clock, or record it on the visit it belongs to`;
  }
  return undefined;
}
