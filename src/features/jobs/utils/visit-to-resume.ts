import { acceptsEntries, type VisitSummary } from "@shared/schemas/visits.ts";

/**
 * The visit to pick up again: of those still taking entries (open or sent back), the one the
 * signed-in person last recorded something on. Visits they never touched are not offered —
 * opening a colleague's run log by mistake is worse than one more tap.
 */
export function visitToResume(visits: readonly VisitSummary[]): VisitSummary | null {
  let best: VisitSummary | null = null;
  for (const visit of visits) {
    if (!acceptsEntries(visit.status) || visit.yourLastActivityAt === null) continue;
    if (!best || Date.parse(visit.yourLastActivityAt) > Date.parse(best.yourLastActivityAt!)) best = visit;
  }
  return best;
}
