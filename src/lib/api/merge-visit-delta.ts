import type { CircuitLog, ReadingsPage, Visit, VisitDelta } from "@shared/schemas/visits.ts";

/**
 * The held copy of a visit with a delta from GET /api/visits/:id?since= applied: the summary
 * and review state replaced, each changed record (a void changes an old one, loaded or not)
 * replaced in place by id, new records put in time order, and the circuit logs (worked out by the
 * server over every reading) replaced when the delta brings them. Lists with no change keep
 * their identity, so screens that depend on them do not recompute.
 */
export function mergeVisitDelta(held: Visit, delta: VisitDelta): Visit {
  const { since: _since, readings, circuitLogs, adjustments, comments, photos, events, ...summary } = delta;
  return {
    ...held,
    ...summary,
    readings: mergeById(held.readings, readings.filter(withinHeldRange(held)), (row) => row.takenAt),
    circuitLogs: circuitLogs ? mergeCircuitLogs(held.circuitLogs, circuitLogs) : held.circuitLogs,
    adjustments: mergeById(held.adjustments, adjustments, (row) => row.at),
    comments: mergeById(held.comments, comments, (row) => row.createdAt),
    photos: mergeById(held.photos, photos, (row) => row.createdAt),
    events: mergeById(held.events, events, (row) => row.at),
  };
}

/**
 * Whether a changed reading belongs in the held list: one it holds (a void), or one in the
 * stretch it holds. A reading older than every held reading of a circuit whose earlier pages
 * are not loaded (a void of an old reading) is left for its page: added alone, it would sit
 * across the gap in the recorded entries. The circuit logs count it either way.
 */
function withinHeldRange(held: Visit) {
  const known = new Set(held.readings.map((row) => row.id));
  const oldest = new Map<number, number>();
  for (const row of held.readings) {
    const ms = Date.parse(row.takenAt);
    if (!(ms >= (oldest.get(row.circuit) ?? Infinity))) oldest.set(row.circuit, ms);
  }
  const paged = new Set(held.circuitLogs.filter((log) => log.olderCursor !== null).map((log) => log.circuit));
  return (row: Visit["readings"][number]) =>
    known.has(row.id) || !paged.has(row.circuit) || Date.parse(row.takenAt) >= (oldest.get(row.circuit) ?? -Infinity);
}

/**
 * The held copy with a page of one circuit's older readings (GET /api/visits/:id/readings)
 * added in time order, and the circuit's cursor moved on to the page before it.
 */
export function mergeReadingsPage(held: Visit, circuit: number, page: ReadingsPage): Visit {
  return {
    ...held,
    readings: mergeById(held.readings, page.readings, (row) => row.takenAt),
    circuitLogs: held.circuitLogs.map((log) =>
      log.circuit === circuit ? { ...log, olderCursor: page.olderCursor } : log,
    ),
  };
}

/**
 * A delta's logs (the circuits that changed) put in place of the held ones, each keeping the
 * held copy's cursor: the server's names the oldest reading of its latest page, and the client
 * may already hold pages before that. Circuits the delta leaves out keep their held logs.
 */
function mergeCircuitLogs(held: readonly CircuitLog[], changed: readonly CircuitLog[]): CircuitLog[] {
  const byCircuit = new Map(changed.map((log) => [log.circuit, log]));
  const merged = held.map((log) => {
    const update = byCircuit.get(log.circuit);
    byCircuit.delete(log.circuit);
    return update ? { ...update, olderCursor: log.olderCursor } : log;
  });
  return [...merged, ...byCircuit.values()].sort((a, b) => a.circuit - b.circuit);
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
  // imported series, or a page of older readings) goes in its place. The sort is stable: equal
  // times keep their stored order.
  return last === undefined || added.every((row) => ms(row) >= ms(last))
    ? combined
    : combined.sort((a, b) => ms(a) - ms(b));
}
