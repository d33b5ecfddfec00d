import { describe, expect, it } from "vitest";
import {
  formatDate,
  formatDateTime,
  formatTime,
  isTimeZone,
  localDayEnd,
  localDayStart,
  NO_DATE,
  viewerTimeZone,
} from "@shared/format/date-time.ts";

// Offsets below come from the IANA time zone database (https://www.iana.org/time-zones), as
// published by the states themselves: New South Wales keeps AEST (UTC+10) and, from 02:00 on the
// first Sunday in October to 03:00 on the first Sunday in April, AEDT (UTC+11); Queensland keeps
// AEST all year; New Zealand keeps NZDT (UTC+13) in summer. Every check names its zone, so the
// results do not depend on the machine running the tests.
describe("date-time formatting", () => {
  it("writes an instant as day, short month, year and a 24-hour time", () => {
    // 03:05 UTC is 14:05 AEDT (UTC+11) in Sydney in December.
    expect(formatDateTime("2026-12-02T03:05:00Z", "Australia/Sydney")).toBe("2 Dec 2026, 14:05");
    expect(formatDate("2026-12-02T03:05:00Z", "Australia/Sydney")).toBe("2 Dec 2026");
    expect(formatTime("2026-12-02T03:05:00Z", "Australia/Sydney")).toBe("14:05");
  });

  it("follows the zone it is given, daylight saving included", () => {
    const instant = "2026-12-02T03:05:00Z";
    expect(formatDateTime(instant, "UTC")).toBe("2 Dec 2026, 03:05");
    expect(formatDateTime(instant, "Australia/Brisbane")).toBe("2 Dec 2026, 13:05"); // AEST, no DST
    expect(formatDateTime(instant, "Pacific/Auckland")).toBe("2 Dec 2026, 16:05"); // NZDT
    // The same wall clock in winter: Sydney back on AEST.
    expect(formatDateTime("2026-07-02T03:05:00Z", "Australia/Sydney")).toBe("2 Jul 2026, 13:05");
  });

  it("moves the calendar day when the zone crosses midnight", () => {
    expect(formatDate("2026-12-01T14:30:00Z", "UTC")).toBe("1 Dec 2026");
    expect(formatDateTime("2026-12-01T14:30:00Z", "Australia/Sydney")).toBe("2 Dec 2026, 01:30");
  });

  it("jumps from 01:59 to 03:00 when Sydney's daylight saving starts (4 Oct 2026)", () => {
    expect(formatTime("2026-10-03T15:59:00Z", "Australia/Sydney")).toBe("01:59");
    expect(formatTime("2026-10-03T16:00:00Z", "Australia/Sydney")).toBe("03:00");
  });

  it("writes the first minutes of a day as 00, never 24 or 12 am", () => {
    expect(formatTime("2026-12-02T00:05:00Z", "UTC")).toBe("00:05");
    expect(formatTime("2026-12-02T12:00:00Z", "UTC")).toBe("12:00");
    expect(formatTime("2026-12-02T23:59:00Z", "UTC")).toBe("23:59");
  });

  it("names every month with the same three letters, whatever the runtime's ICU", () => {
    const months = Array.from(
      { length: 12 },
      (_, index) => formatDate(Date.UTC(2026, index, 15, 12), "UTC").split(" ")[1],
    );
    expect(months).toEqual(["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"]);
  });

  it("never writes an all-number date that reads two ways", () => {
    for (let month = 0; month < 12; month++) {
      expect(formatDateTime(new Date(Date.UTC(2026, month, 2, 9, 7)), "UTC")).not.toMatch(
        /\d{1,2}[/.-]\d{1,2}[/.-]\d{2,4}/,
      );
    }
  });

  it("takes an ISO string, a Date or milliseconds for the same instant", () => {
    const ms = Date.parse("2026-12-02T03:05:00Z");
    expect(formatDateTime(ms, "UTC")).toBe("2 Dec 2026, 03:05");
    expect(formatDateTime(new Date(ms), "UTC")).toBe("2 Dec 2026, 03:05");
    // An offset in the string is honoured: 14:05+11:00 is 03:05 UTC.
    expect(formatDateTime("2026-12-02T14:05:00+11:00", "UTC")).toBe("2 Dec 2026, 03:05");
  });

  it("shows a dash for an unreadable instant instead of throwing", () => {
    expect(formatDateTime("not a date")).toBe(NO_DATE);
    expect(formatDate(Number.NaN)).toBe(NO_DATE);
    expect(formatTime("")).toBe(NO_DATE);
  });

  it("uses the viewer's own zone when none is given", () => {
    const instant = "2026-12-02T03:05:00Z";
    expect(formatDateTime(instant)).toBe(formatDateTime(instant, viewerTimeZone()));
  });

  it("knows real zone names and refuses made-up ones", () => {
    expect(isTimeZone("Australia/Sydney")).toBe(true);
    expect(isTimeZone("UTC")).toBe(true);
    expect(isTimeZone("Mars/Olympus_Mons")).toBe(false);
    expect(isTimeZone("")).toBe(false);
  });

  it("starts a local calendar day at the viewer's midnight, from a date input or an instant", () => {
    // Built from local fields, so the check holds in whatever zone the tests run in.
    expect(localDayStart("2026-12-02")).toBe(new Date(2026, 11, 2).toISOString());
    expect(localDayEnd("2026-12-31")).toBe(new Date(2027, 0, 1).toISOString());
    expect(localDayStart(new Date(2026, 11, 2, 14, 5))).toBe(new Date(2026, 11, 2).toISOString());
  });
});
