/**
 * The one schema for dates and times that come from a client: request bodies, queries and the
 * time cells of an imported CSV. ISO 8601 is checked first; then the instant must be one the
 * database can store. PostgreSQL's timestamptz reaches from 4713 BC to 294276 AD
 * (https://www.postgresql.org/docs/current/datatype-datetime.html), but values travel to it as
 * ISO 8601 strings with a four-digit year, and it has no year 0000: so the storable range is
 * 0001-01-01T00:00:00Z to 9999-12-31T23:59:59.999Z. A date-time whose offset pushes it past
 * either end (9999-12-31T23:59:59-14:00 is in the year 10000 in UTC) is refused too.
 */
import { z } from "zod";

/** First storable instant, ms since the epoch. */
export const EARLIEST_INSTANT_MS = Date.parse("0001-01-01T00:00:00.000Z");
/** Last storable instant, ms since the epoch. */
export const LATEST_INSTANT_MS = Date.parse("9999-12-31T23:59:59.999Z");

export const OUT_OF_RANGE_MESSAGE = "Use a date between the years 0001 and 9999";

const DAY_MS = 86_400_000;
const isCalendarDate = (value: string) => value.length === 10;

/** Can this instant (ms since the epoch) be stored? NaN and infinities cannot. */
export function isStorableInstant(ms: number): boolean {
  return Number.isFinite(ms) && ms >= EARLIEST_INSTANT_MS && ms <= LATEST_INSTANT_MS;
}

/** An ISO 8601 date-time with an offset (`2026-07-01T09:30:00+10:00` or `…Z`) that can be stored. */
export function instant(error = "Use an ISO 8601 date and time, like 2026-07-01T09:30:00+10:00") {
  return z.iso
    .datetime({ offset: true, error })
    .refine((value) => isStorableInstant(Date.parse(value)), OUT_OF_RANGE_MESSAGE);
}

/** Start of a period bound (ms since the epoch): a calendar date starts at 00:00 UTC. */
export function boundStart(bound: string): number {
  return Date.parse(isCalendarDate(bound) ? `${bound}T00:00:00Z` : bound);
}

/**
 * Exclusive end of a period bound (ms since the epoch): a calendar date includes its whole UTC
 * day. Held at the last storable instant, so 9999-12-31 still makes a query the database takes.
 */
export function boundEnd(bound: string): number {
  const end = isCalendarDate(bound) ? boundStart(bound) + DAY_MS : Date.parse(bound);
  return Math.min(end, LATEST_INSTANT_MS);
}

/** A calendar date (`2026-07-01`, a whole UTC day) or a date-time with offset, within the storable range. */
export function dayOrInstant(error = "Use a date like 2026-07-01") {
  return z
    .union([z.iso.date(), z.iso.datetime({ offset: true })], { error })
    .refine((value) => isStorableInstant(boundStart(value)), OUT_OF_RANGE_MESSAGE);
}
