import type { VisitStatus } from "@shared/schemas/visits.ts";
import { HttpError } from "./http-error.ts";

/** A signed-off visit is a closed record: nothing more is written to it (readings, procedures, photos). */
export function requireWritableVisit(status: VisitStatus): void {
  if (status === "signed-off") throw new HttpError(409, "This visit is signed off; start a new visit to record more");
}
