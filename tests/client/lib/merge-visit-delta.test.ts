import { describe, expect, it } from "vitest";
import type { CircuitLog, Reading, Visit, VisitDelta } from "@shared/schemas/visits.ts";
import { mergeReadingsPage, mergeVisitDelta } from "@/lib/api/merge-visit-delta.ts";

const id = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, "0")}`;
/** Only what the merge looks at: id, time and the void. */
const reading = (n: number, takenAt: string, voided: Reading["voided"] = null) =>
  ({ id: id(n), circuit: 1, takenAt, voided }) as Reading;
/** A circuit's log: only the counts and the cursor matter to the merge. */
const log = (circuit: number, olderCursor: string | null, readingCount = 2) =>
  ({
    circuit,
    readingCount,
    recordCount: readingCount,
    olderCursor,
    points: [],
    trend: null,
    keyReadings: [],
    firstTakenAt: null,
    lastTakenAt: null,
  }) as CircuitLog;

const held = Object.freeze({
  id: id(100),
  status: "open",
  reviewNote: null,
  readingCount: 2,
  revision: "e.4.f",
  readings: Object.freeze([reading(1, "2026-12-02T01:00:00.000Z"), reading(2, "2026-12-02T01:05:00.000Z")]),
  circuitLogs: Object.freeze([log(1, null)]),
  adjustments: Object.freeze([]),
  comments: Object.freeze([]),
  photos: Object.freeze([]),
  events: Object.freeze([]),
}) as unknown as Visit;

const delta = (changes: Partial<VisitDelta>) =>
  ({
    ...held,
    since: held.revision,
    readings: [],
    circuitLogs: undefined,
    adjustments: [],
    comments: [],
    photos: [],
    events: [],
    ...changes,
  }) as VisitDelta;
const VOID = { at: "2026-12-02T01:20:00.000Z", by: null, reason: "typed 3500 for 350 kPa" };

describe("mergeVisitDelta", () => {
  it("appends a new reading and takes the delta's summary and revision", () => {
    const merged = mergeVisitDelta(
      held,
      delta({ readings: [reading(3, "2026-12-02T01:10:00.000Z")], readingCount: 3, revision: "e.5.f" }),
    );
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
    const merged = mergeVisitDelta(
      held,
      delta({ readings: [reading(4, "2026-12-02T01:02:00.000Z"), reading(5, "2026-12-02T00:30:00.000Z")] }),
    );
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

  it("keeps the held circuit logs when the delta brings none, and takes the delta's counts and trend when it does", () => {
    expect(mergeVisitDelta(held, delta({ status: "awaiting-review" })).circuitLogs).toBe(held.circuitLogs);
    const merged = mergeVisitDelta(
      held,
      delta({ readings: [reading(3, "2026-12-02T01:10:00.000Z")], circuitLogs: [log(1, null, 3), log(2, null, 1)] }),
    );
    expect(merged.circuitLogs.map((entry) => [entry.circuit, entry.readingCount])).toEqual([
      [1, 3],
      [2, 1],
    ]);
  });

  it("replaces only the logs of the circuits the delta brings; the others keep theirs", () => {
    const twoCircuits = { ...held, circuitLogs: [log(1, null, 3), log(2, id(7), 120)] };
    const merged = mergeVisitDelta(
      twoCircuits,
      delta({ readings: [reading(3, "2026-12-02T01:10:00.000Z")], circuitLogs: [log(1, null, 4)] }),
    );
    expect(merged.circuitLogs.map((entry) => [entry.circuit, entry.readingCount])).toEqual([
      [1, 4],
      [2, 120],
    ]);
    expect(merged.circuitLogs[1]).toBe(twoCircuits.circuitLogs[1]);
  });

  it("keeps the held cursor of a circuit: the client may hold pages before the server's latest page", () => {
    const paged = { ...held, circuitLogs: [log(1, id(1), 500)] };
    const merged = mergeVisitDelta(
      paged,
      delta({ readings: [reading(3, "2026-12-02T01:10:00.000Z")], circuitLogs: [log(1, id(60), 501)] }),
    );
    expect(merged.circuitLogs[0]).toMatchObject({ olderCursor: id(1), readingCount: 501 });
  });

  it("counts a void of a reading older than the pages held in the logs, and leaves the reading for its page", () => {
    const paged = { ...held, circuitLogs: [log(1, id(1), 500)] };
    const merged = mergeVisitDelta(
      paged,
      delta({ readings: [reading(9, "2026-12-01T23:00:00.000Z", VOID)], circuitLogs: [log(1, id(60), 499)] }),
    );
    expect(merged.readings).toBe(paged.readings);
    expect(merged.circuitLogs[0]!.readingCount).toBe(499);
  });

  it("adds a page of older readings in time order once, and moves the circuit's cursor to the page before it", () => {
    const paged = { ...held, circuitLogs: [log(1, id(1), 4)] };
    const page = {
      readings: [reading(7, "2026-12-02T00:50:00.000Z"), reading(8, "2026-12-02T00:55:00.000Z", VOID)],
      olderCursor: null,
    };
    const merged = mergeReadingsPage(paged, 1, page);
    expect(merged.readings.map((row) => row.id)).toEqual([id(7), id(8), id(1), id(2)]);
    expect(merged.circuitLogs[0]!.olderCursor).toBeNull();
    expect(mergeReadingsPage(merged, 1, page).readings).toHaveLength(4);
  });
});
