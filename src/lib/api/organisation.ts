import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { ProcedureSettingsResponseSchema, type ProcedureSettingsResponse, type ProcedureSettingsUpdate } from "@shared/schemas/procedure-records.ts";
import { apiRequest } from "./api-client.ts";

export function getOrganisationSettings(signal?: AbortSignal): Promise<ProcedureSettingsResponse> {
  return apiRequest("/organisation/settings", { schema: ProcedureSettingsResponseSchema, signal });
}

export function updateOrganisationSettings(update: ProcedureSettingsUpdate): Promise<ProcedureSettingsResponse> {
  return apiRequest("/organisation/settings", { method: "PUT", body: update, schema: ProcedureSettingsResponseSchema });
}

export const organisationSettingsQueryOptions = () =>
  queryOptions({ queryKey: ["organisation", "settings"], queryFn: ({ signal }) => getOrganisationSettings(signal) });

export const useOrganisationSettings = () => useQuery(organisationSettingsQueryOptions());

export function useUpdateOrganisationSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateOrganisationSettings,
    meta: { silentErrors: true },
    onSuccess: (saved) => {
      queryClient.setQueryData(organisationSettingsQueryOptions().queryKey, saved);
      // Procedure forms read their defaults from the visit's procedure lists.
      return queryClient.invalidateQueries({ queryKey: ["procedures"] });
    },
  });
}
