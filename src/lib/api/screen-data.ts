import { onlineManager, type EnsureQueryDataOptions, type QueryClient, type QueryKey } from "@tanstack/react-query";
import { chargeReferencesQueryOptions } from "./charge-references.ts";
import { equipmentDetailQueryOptions } from "./equipment.ts";
import { ensureRefrigerantTable } from "./refrigerant-tables.ts";
import { visitQueryOptions } from "./visits.ts";

/**
 * A route loader's one step (decision 040): puts a query's data in the cache with
 * `ensureQueryData`, so the screen's `useSuspenseQuery` of the same options renders at once.
 * Never throws: a failed request stays in the cache, and the screen's boundary shows it in the
 * screen's own words (React Router's error page would replace the whole screen). Data kept on
 * the device is used as it is, offline too; offline without it the loader does not wait for the
 * signal (the request would pause until then): the screen shows its loading state meanwhile.
 */
export function loadQuery<TQueryFnData, TError, TData, TQueryKey extends QueryKey>(
  queryClient: QueryClient,
  options: EnsureQueryDataOptions<TQueryFnData, TError, TData, TQueryKey>,
): Promise<TData | undefined> {
  const offline = !onlineManager.isOnline() || (typeof navigator !== "undefined" && !navigator.onLine);
  if (offline && queryClient.getQueryData(options.queryKey) === undefined) {
    return Promise.resolve(undefined);
  }
  return queryClient.ensureQueryData(options).catch(() => undefined);
}

/**
 * A visit (run log, procedures) or its report: the visit, then together its unit and the
 * refrigerant's table (the visit names the unit's refrigerant, so the table need not wait for the
 * unit: one round trip fewer on a slow link). The unit's charge references are started, not
 * waited for: the run log judges without them until they come.
 */
export async function loadVisitScreen(queryClient: QueryClient, visitId: string): Promise<null> {
  const visit = await loadQuery(queryClient, visitQueryOptions(visitId));
  if (!visit) return null;
  void loadQuery(queryClient, chargeReferencesQueryOptions(visit.equipmentId));
  await Promise.all([
    loadQuery(queryClient, equipmentDetailQueryOptions(visit.equipmentId)),
    ensureRefrigerantTable(queryClient, visit.refrigerant),
  ]);
  return null;
}
