import { queryOptions, useQuery, type QueryClient } from "@tanstack/react-query";
import { isKnownRefrigerant } from "@shared/property-tables/refrigerant-catalogue.ts";

/**
 * A refrigerant's saturation table as a query: each table is its own chunk, fetched once and
 * never stale. Route loaders load the refrigerant a screen computes with before it renders
 * (`ensureQueryData`); a form whose refrigerant can change loads the new one with
 * `useRefrigerantTable` and computes once it is there. Screens that only list or pick
 * refrigerants read the catalogue and load no table.
 */
export const refrigerantTableQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ["refrigerant-tables", id],
    // The engine registers the table; imported here on demand, so that a route loader importing
    // this module can send its requests before the engine's script has arrived.
    queryFn: async () => (await import("@shared/engine/index.ts")).loadRefrigerant(id),
    staleTime: Infinity,
    gcTime: Infinity,
  });

/** The table's metadata once loaded (then the engine's lookups run for it); idle for an unknown id. */
export const useRefrigerantTable = (id: string) =>
  useQuery({ ...refrigerantTableQueryOptions(id), enabled: isKnownRefrigerant(id) });

/** Loads a table for a route loader; a failure is left for the screen to show, never thrown. */
export function ensureRefrigerantTable(queryClient: QueryClient, id: string): Promise<unknown> {
  if (!isKnownRefrigerant(id)) return Promise.resolve(null);
  return queryClient.ensureQueryData(refrigerantTableQueryOptions(id)).catch(() => null);
}
