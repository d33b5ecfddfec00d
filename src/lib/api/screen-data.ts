import type { QueryClient } from "@tanstack/react-query";
import { chargeReferencesQueryOptions } from "./charge-references.ts";
import { equipmentDetailQueryOptions } from "./equipment.ts";
import { ensureRefrigerantTable } from "./refrigerant-tables.ts";
import { visitQueryOptions } from "./visits.ts";

/**
 * What a screen needs before it renders, for the route loaders in src/router.tsx. The router
 * imports this module on its own (a small chunk beside the API client), so the requests start
 * while the screen's script is still downloading instead of after it. Each fills the same cache
 * entries the screen's hooks read. A failed request is never thrown here: the screen shows it in
 * its own words, as it would have without the loader.
 */
const settle = (work: Promise<unknown>) => work.catch(() => null);

/**
 * A visit (run log, procedures) or its report: the visit, then together its unit, the unit's
 * charge references and the refrigerant's table (the visit names the unit's refrigerant, so the
 * table need not wait for the unit: one round trip fewer on a slow link).
 */
export async function prefetchVisitScreen(queryClient: QueryClient, visitId: string): Promise<null> {
  const visit = await queryClient.ensureQueryData(visitQueryOptions(visitId)).catch(() => null);
  if (!visit) return null;
  void settle(queryClient.prefetchQuery(chargeReferencesQueryOptions(visit.equipmentId)));
  await Promise.all([
    settle(queryClient.ensureQueryData(equipmentDetailQueryOptions(visit.equipmentId))),
    ensureRefrigerantTable(queryClient, visit.refrigerant),
  ]);
  return null;
}

/** A P–T table: its refrigerant's table. */
export async function prefetchRefrigerantScreen(queryClient: QueryClient, refrigerantId: string): Promise<null> {
  await ensureRefrigerantTable(queryClient, refrigerantId);
  return null;
}

/** A casebook case, to answer or to edit: the case and its refrigerant's table. */
export async function prefetchCaseScreen(
  queryClient: QueryClient,
  caseId: string | undefined,
  fallbackRefrigerant: string,
): Promise<null> {
  if (!caseId) {
    await ensureRefrigerantTable(queryClient, fallbackRefrigerant);
    return null;
  }
  // The casebook's API module reads the case generator (engine): imported here, not above, so
  // that the other screens' loaders do not wait for the engine's script.
  const { caseQueryOptions } = await import("./casebook.ts");
  const item = await queryClient.ensureQueryData(caseQueryOptions(caseId)).catch(() => null);
  if (item) await ensureRefrigerantTable(queryClient, item.input.refrigerant);
  return null;
}

/** A unit's page: its detail (nameplate, visits, settled readings) and charge references. */
export async function prefetchEquipmentScreen(queryClient: QueryClient, equipmentId: string): Promise<null> {
  await Promise.all([
    settle(queryClient.ensureQueryData(equipmentDetailQueryOptions(equipmentId))),
    settle(queryClient.prefetchQuery(chargeReferencesQueryOptions(equipmentId))),
  ]);
  return null;
}
