import { closedVisitMessage, STATUSES_OPEN_FOR_ENTRIES, type VisitStatus } from "@shared/schemas/visits.ts";
import { HttpError } from "./http-error.ts";

/**
 * A visit awaiting review or signed off takes no new entries (readings, procedures,
 * refrigerant, photos) and no voids until a senior or owner reopens it. Routes call this
 * early to refuse before any slow work; writeToVisit checks again under the row lock.
 */
export function requireWritableVisit(
  status: VisitStatus,
  allow: readonly VisitStatus[] = STATUSES_OPEN_FOR_ENTRIES,
): void {
  if (!allow.includes(status)) throw new HttpError(409, closedVisitMessage(status));
}
