/**
 * The one way Satura writes dates and times, on every screen, the printed report and the
 * report's e-mail: "2 Dec 2026, 14:05", "2 Dec 2026" or "14:05".
 *
 * Why this shape: a day-month-year with the month as a word cannot be misread the way 12/2/26
 * can (2 December or 12 February?) on a document that crosses borders, and a 24-hour clock has
 * no am/pm to miss (ISO 8601 and ISO 80000-3 write the hour 00–23; the month abbreviations are
 * the common English three-letter ones). Intl's own "medium" and "short" styles change with the
 * browser's language and its ICU version (Node 20 writes "Sept" for en-GB), so Intl is asked only
 * for the numbers in the chosen time zone and the words are ours.
 *
 * Time zone: an organisation or site has no stored zone yet, so screens (the printed report
 * included) write times in the viewer's own zone, the one the phone or laptop is set to, which on
 * a job is the site's. The report's e-mail is written on the server, where no viewer exists: it
 * uses the zone of the person who sends it, passed with the request, and names it; without one it
 * writes UTC and says so.
 */

const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"] as const;

/** What an unreadable instant shows as: a gap, never a crash of the screen around it. */
export const NO_DATE = "—";

/** One Intl formatter per zone (building one costs far more than using it); "" is the viewer's zone. */
const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string | undefined): Intl.DateTimeFormat {
  const key = timeZone ?? "";
  let formatter = formatters.get(key);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat("en-GB", {
      timeZone,
      year: "numeric",
      month: "numeric",
      day: "numeric",
      hour: "2-digit",
      minute: "2-digit",
      // h23, not hour12: false, which some ICU versions write as 24:05 just after midnight.
      hourCycle: "h23",
    });
    formatters.set(key, formatter);
  }
  return formatter;
}

type Instant = string | number | Date;

interface Parts {
  day: number;
  month: number;
  year: number;
  hour: string;
  minute: string;
}

function partsOf(instant: Instant, timeZone: string | undefined): Parts | null {
  const date = instant instanceof Date ? instant : new Date(instant);
  if (Number.isNaN(date.getTime())) return null;
  const found: Record<string, string> = {};
  for (const part of formatterFor(timeZone).formatToParts(date)) found[part.type] = part.value;
  return {
    day: Number(found.day),
    month: Number(found.month),
    year: Number(found.year),
    hour: found.hour ?? "00",
    minute: found.minute ?? "00",
  };
}

const dateOf = (parts: Parts) => `${parts.day} ${MONTHS[parts.month - 1]} ${parts.year}`;
const timeOf = (parts: Parts) => `${parts.hour}:${parts.minute}`;

/**
 * An instant as "2 Dec 2026, 14:05". `timeZone` is an IANA name ("Australia/Sydney", "UTC");
 * left out, the viewer's own zone.
 * @example formatDateTime("2026-12-02T03:05:00Z", "Australia/Sydney") // "2 Dec 2026, 14:05"
 */
export function formatDateTime(instant: Instant, timeZone?: string): string {
  const parts = partsOf(instant, timeZone);
  return parts ? `${dateOf(parts)}, ${timeOf(parts)}` : NO_DATE;
}

/**
 * The calendar day of an instant, as "2 Dec 2026".
 * @example formatDate("2026-12-02T03:05:00Z", "Australia/Sydney") // "2 Dec 2026"
 */
export function formatDate(instant: Instant, timeZone?: string): string {
  const parts = partsOf(instant, timeZone);
  return parts ? dateOf(parts) : NO_DATE;
}

/**
 * The time of day of an instant, as "14:05" (24-hour), for lists within one visit.
 * @example formatTime("2026-12-02T03:05:00Z", "Australia/Sydney") // "14:05"
 */
export function formatTime(instant: Instant, timeZone?: string): string {
  const parts = partsOf(instant, timeZone);
  return parts ? timeOf(parts) : NO_DATE;
}

/**
 * The instant a local calendar day starts, in the viewer's zone: a date input's "YYYY-MM-DD", or
 * the day an instant falls on. A period or a logger's clock times are meant in local days, so
 * they start at local midnight rather than UTC's.
 * @example localDayStart("2026-12-02") // "2026-12-01T13:00:00.000Z" in Sydney (AEDT)
 */
export function localDayStart(day: string | Date): string {
  return localMidnight(day, 0);
}

/** The instant the day after `day` starts, locally: the exclusive end of a period ending on `day`. */
export function localDayEnd(day: string | Date): string {
  return localMidnight(day, 1);
}

function localMidnight(day: string | Date, daysLater: number): string {
  const [year, month, date] =
    typeof day === "string" ? day.split("-").map(Number) : [day.getFullYear(), day.getMonth() + 1, day.getDate()];
  return new Date(year!, month! - 1, date! + daysLater).toISOString();
}

/** Is `name` a time zone this runtime knows (IANA name, e.g. "Pacific/Auckland")? */
export function isTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat("en-GB", { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

/** The viewer's own time zone, e.g. "Australia/Brisbane", as the browser reports it. */
export const viewerTimeZone = (): string => Intl.DateTimeFormat().resolvedOptions().timeZone;
