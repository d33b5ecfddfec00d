/**
 * A route's first step: the visit or the unit its path names, within the caller's company, or a
 * 404. Another company's record reads as missing, never as forbidden, so its existence is not
 * told; a malformed id is a 400 (parseId).
 */
import type { Database } from "../db/client.ts";
import { getEquipment } from "../db/equipment.ts";
import { findVisit } from "../db/visits.ts";
import { notFound } from "../http/http-error.ts";
import { parseId } from "../http/parse-id.ts";

/** The visit named by a path's raw id, or 404. */
export async function loadVisit(db: Database, organisationId: string, rawId: unknown) {
  const visit = await findVisit(db, organisationId, parseId(rawId, "Visit"));
  if (!visit) throw notFound("Visit");
  return visit;
}

/** The unit named by a path's raw id (or a visit's equipmentId), or 404. */
export async function loadUnit(db: Database, organisationId: string, rawId: unknown) {
  const unit = await getEquipment(db, organisationId, parseId(rawId, "Equipment"));
  if (!unit) throw notFound("Equipment");
  return unit;
}

/** The visit a path names and the unit it is on. */
export async function loadVisitAndUnit(db: Database, organisationId: string, rawId: unknown) {
  const visit = await loadVisit(db, organisationId, rawId);
  return { visit, unit: await loadUnit(db, organisationId, visit.equipmentId) };
}
