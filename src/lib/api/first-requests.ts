import type { QueryClient } from "@tanstack/react-query";
import { matchPath } from "react-router-dom";
import { paths } from "@/config/paths.ts";
import { startEarlyRequest } from "./api-client.ts";
import { meQueryOptions } from "./auth.ts";

/** Screens that never ask who is signed in (a mailed link, a forgotten password). */
const WITHOUT_SESSION = [paths.forgotPassword.path, paths.resetPassword.path, paths.acceptInvitation.path];
const RECORD_ID = /^[0-9a-f-]{36}$/i;

/**
 * Sends the first screen's own requests at start-up, before the router asks for the screen's
 * scripts: on a slow link a request sent after them waits for a free connection (six per host)
 * and arrived seconds late. Who is signed in, for every screen that checks; and a visit's or a
 * unit's record, which the screen's loader then takes up (startEarlyRequest). Later requests
 * that need an answer first (the visit's unit) still go from the loaders.
 */
export function startFirstRequests(queryClient: QueryClient, pathname: string): void {
  if (!WITHOUT_SESSION.some((path) => matchPath(path, pathname))) void queryClient.prefetchQuery(meQueryOptions());
  const visitId = (matchPath(paths.visits.detail.path, pathname) ?? matchPath(paths.visits.report.path, pathname))?.params.visitId;
  if (visitId && RECORD_ID.test(visitId)) startEarlyRequest(`/visits/${visitId}`);
  const equipmentId = matchPath(paths.equipment.detail.path, pathname)?.params.equipmentId;
  if (equipmentId && RECORD_ID.test(equipmentId)) {
    startEarlyRequest(`/equipment/${equipmentId}`);
    startEarlyRequest(`/equipment/${equipmentId}/charge-references`);
  }
}
