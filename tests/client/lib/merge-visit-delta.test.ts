import { describe, expect, it } from "vitest";
import type { Reading, Visit, VisitDelta } from "@shared/schemas/visits.ts";
import { mergeVisitDelta } from "@/lib/api/merge-visit-delta.ts";

const id = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, "0")}`;
/** Only what the merge looks at: id, time and the void. */
const reading = (n: number, takenAt: string, voided: Reading["voided"] = null) => ({ id: id(n), takenAt, voided }) as Reading;

const held = Object.freeze({
  id: id(100),
  status: "open",
  reviewNote: null,
  readingCount: 2,
  revision: "e.4.f",
  readings: Object.freeze([reading(1, "2026-12-02T01:00:00.000Z"), reading(2, "2026-12-02T01:05:00.000Z")]),
  adjustments: Object.freeze([]),
  comments: Object.freeze([]),
  photos: Object.freeze([]),
  events: Object.freeze([]),
}) as unknown as Visit;

const delta = (changes: Partial<VisitDelta>) => ({ ...held, since: held.revision, readings: [], adjustments: [], comments: [], photos: [], events: [], ...changes }) as VisitDelta;

describe("mergeVisitDelta", () => {
  it("appends a new reading and takes the delta's summary and revision", () => {
    const merged = mergeVisitDelta(held, delta({ readings: [reading(3, "2026-12-02T01:10:00.000Z")], readingCount: 3, revision: "e.5.f" }));
    expect(merged.readings.map((row) => row.id)).toEqual([id(1), id(2), id(3)]);
    expect(merged).toMatchObject({ readingCount: 3, revision: "e.5.f" });
  });

  it("replaces a voided reading in its place instead of adding it twice", () => {
    const void_ = { at: "2026-12-02T01:20:00.000Z", by: null, reason: "typed 3500 for 350 kPa" };
    const merged = mergeVisitDelta(held, delta({ readings: [reading(1, "2026-12-02T01:00:00.000Z", void_)] }));
    expect(merged.readings.map((row) => [row.id, row.voided?.reason ?? null])).toEqual([
      [id(1), "typed 3500 for 350 kPa"],
      [id(2), null],
    ]);
  });

  it("puts a reading entered with an earlier time (or an imported series) in time order", () => {
    const merged = mergeVisitDelta(held, delta({ readings: [reading(4, "2026-12-02T01:02:00.000Z"), reading(5, "2026-12-02T00:30:00.000Z")] }));
    expect(merged.readings.map((row) => row.id)).toEqual([id(5), id(1), id(4), id(2)]);
  });

  it("keeps unchanged lists as they were, so screens built on them do not recompute", () => {
    const merged = mergeVisitDelta(held, delta({ status: "awaiting-review" }));
    expect(merged.readings).toBe(held.readings);
    expect(merged.events).toBe(held.events);
    expect(merged.status).toBe("awaiting-review");
  });

  it("applies the same delta twice without duplicating anything", () => {
    const change = delta({ readings: [reading(3, "2026-12-02T01:10:00.000Z")] });
    const once = mergeVisitDelta(held, change);
    expect(mergeVisitDelta(once, change).readings).toEqual(once.readings);
  });
});
