import { describe, expect, it } from "vitest";
import {
  EARLIEST_INSTANT_MS,
  LATEST_INSTANT_MS,
  OUT_OF_RANGE_MESSAGE,
  boundEnd,
  boundStart,
  dayOrInstant,
  instant,
  isStorableInstant,
} from "@shared/schemas/dates.ts";

const messages = (result: { error?: { issues: { message: string }[] } }) =>
  result.error?.issues.map((issue) => issue.message) ?? [];

// PostgreSQL 16 manual §8.5 (timestamptz, no year 0) and the four-digit years of ISO 8601 strings.
describe("dates", () => {
  it("spans 0001-01-01T00:00:00Z to 9999-12-31T23:59:59.999Z", () => {
    expect(new Date(EARLIEST_INSTANT_MS).toISOString()).toBe("0001-01-01T00:00:00.000Z");
    expect(new Date(LATEST_INSTANT_MS).toISOString()).toBe("9999-12-31T23:59:59.999Z");
    expect(isStorableInstant(EARLIEST_INSTANT_MS - 1)).toBe(false);
    expect(isStorableInstant(LATEST_INSTANT_MS + 1)).toBe(false);
    expect(isStorableInstant(Number.NaN)).toBe(false);
  });

  it("accepts ordinary date-times with offsets", () => {
    expect(instant().parse("2026-07-01T09:30:00+10:00")).toBe("2026-07-01T09:30:00+10:00");
    expect(instant().parse("9999-12-31T23:59:59Z")).toBe("9999-12-31T23:59:59Z");
  });

  it("refuses year 0000 and a date-time its offset carries past 9999", () => {
    expect(messages(instant().safeParse("0000-01-01T00:00:00Z"))).toEqual([OUT_OF_RANGE_MESSAGE]);
    expect(messages(instant().safeParse("9999-12-31T23:59:59-14:00"))).toEqual([OUT_OF_RANGE_MESSAGE]);
    expect(messages(instant().safeParse("0001-01-01T00:00:00+01:00"))).toEqual([OUT_OF_RANGE_MESSAGE]);
    expect(instant("When?").safeParse("yesterday").error?.issues[0]?.message).toBe("When?");
  });

  it("takes whole days as bounds, held inside the storable range", () => {
    expect(messages(dayOrInstant().safeParse("0000-01-01"))).toEqual([OUT_OF_RANGE_MESSAGE]);
    expect(dayOrInstant().parse("9999-12-31")).toBe("9999-12-31");
    expect(new Date(boundStart("2026-07-01")).toISOString()).toBe("2026-07-01T00:00:00.000Z");
    expect(new Date(boundEnd("2026-07-01")).toISOString()).toBe("2026-07-02T00:00:00.000Z");
    expect(boundEnd("9999-12-31")).toBe(LATEST_INSTANT_MS);
  });
});
