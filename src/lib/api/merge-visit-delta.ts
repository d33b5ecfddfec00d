import type { Visit, VisitDelta } from "@shared/schemas/visits.ts";

/**
 * The held copy of a visit with a delta from GET /api/visits/:id?since= applied: the summary
 * and review state replaced, each changed record (a void changes an old one) replaced in place
 * by id, new records put in time order. Lists with no change keep their identity, so screens
 * that depend on them do not recompute.
 */
export function mergeVisitDelta(held: Visit, delta: VisitDelta): Visit {
  const { since: _since, readings, adjustments, comments, photos, events, ...summary } = delta;
  return {
    ...held,
    ...summary,
    readings: mergeById(held.readings, readings, (row) => row.takenAt),
    adjustments: mergeById(held.adjustments, adjustments, (row) => row.at),
    comments: mergeById(held.comments, comments, (row) => row.createdAt),
    photos: mergeById(held.photos, photos, (row) => row.createdAt),
    events: mergeById(held.events, events, (row) => row.at),
  };
}

function mergeById<T extends { id: string }>(held: T[], changed: T[], timeOf: (row: T) => string): T[] {
  if (changed.length === 0) return held;
  const replacements = new Map(changed.map((row) => [row.id, row]));
  const merged = held.map((row) => replacements.get(row.id) ?? row);
  const known = new Set(held.map((row) => row.id));
  const added = changed.filter((row) => !known.has(row.id));
  if (added.length === 0) return merged;
  const ms = (row: T) => Date.parse(timeOf(row));
  const last = merged.at(-1);
  const combined = [...merged, ...added];
  // Usually the new records are the latest; a reading entered with an earlier time (or an
  // imported series) goes in its place. The sort is stable: equal times keep their stored order.
  return last === undefined || added.every((row) => ms(row) >= ms(last)) ? combined : combined.sort((a, b) => ms(a) - ms(b));
}
