// From react-router itself: this runs before React DOM's module (src/start-first-screen.ts).
import { matchPath } from "react-router";
import { paths } from "@/config/paths.ts";
import { VISIT_EQUIPMENT_HEADER, VISIT_REFRIGERANT_HEADER } from "@shared/http/visit-headers.ts";
import { startEarlyRequest } from "./api-client.ts";

/** Screens that never ask who is signed in (a mailed link, a forgotten password). */
const WITHOUT_SESSION = [paths.forgotPassword.path, paths.resetPassword.path, paths.acceptInvitation.path];
const RECORD_ID = /^[0-9a-f-]{36}$/i;

/**
 * Sends the first screen's own requests at start-up, before the router asks for the screen's
 * scripts: on a slow link a request sent after them waits for a free connection (six per host)
 * and arrived seconds late. Who is signed in, for every screen that checks; a unit's record; a
 * visit's record and, as soon as its headers arrive, its unit's record and its refrigerant's
 * table. The session check, the screen's loader and its queries then take these up
 * (startEarlyRequest) and parse them with the shared schemas as always; here nothing is parsed.
 */
export function startFirstRequests(pathname: string): void {
  if (!WITHOUT_SESSION.some((path) => matchPath(path, pathname))) void startEarlyRequest("/auth/me");
  const visitId = (matchPath(paths.visits.detail.path, pathname) ?? matchPath(paths.visits.report.path, pathname))
    ?.params.visitId;
  if (visitId && RECORD_ID.test(visitId)) {
    // The tables' import list (62 entries) is needed on a visit's screen only, so it is a chunk
    // of its own, off the sign-in page; asked for beside the visit, it is there when the visit
    // answers, and the table goes out then, not once the common chunk has arrived and run.
    const tables = import("@shared/property-tables/prefetch-refrigerant-table.ts");
    startEarlyRequest(`/visits/${visitId}`)
      .then(async (response) => {
        if (!response.ok) return;
        // Named in the headers (shared/http/visit-headers.ts), so these go out as the headers
        // arrive, not once the body has come and been parsed a second time.
        const equipmentId = response.headers.get(VISIT_EQUIPMENT_HEADER);
        const refrigerant = response.headers.get(VISIT_REFRIGERANT_HEADER);
        if (equipmentId) startUnitRequests(equipmentId);
        if (refrigerant) (await tables).prefetchRefrigerantTable(refrigerant);
      })
      .catch(() => undefined); // the screen's own request reports failures
  }
  const equipmentId = matchPath(paths.equipment.detail.path, pathname)?.params.equipmentId;
  if (equipmentId) startUnitRequests(equipmentId);
}

function startUnitRequests(equipmentId: string): void {
  if (!RECORD_ID.test(equipmentId)) return;
  // Taken up by the screen's own requests, which report a failure.
  void startEarlyRequest(`/equipment/${equipmentId}`);
  void startEarlyRequest(`/equipment/${equipmentId}/charge-references`);
}
