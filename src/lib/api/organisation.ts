import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import {
  ProcedureSettingsResponseSchema,
  type ProcedureSettingsResponse,
  type ProcedureSettingsUpdate,
} from "@shared/schemas/procedure-records.ts";
import { apiRequest } from "./api-client.ts";

export function getOrganisationSettings(signal?: AbortSignal): Promise<ProcedureSettingsResponse> {
  return apiRequest("/organisation/settings", { schema: ProcedureSettingsResponseSchema, signal });
}

/** Changes only the fields given, over the version the page showed (409 when someone saved since). */
export function updateOrganisationSettings({
  version,
  ...update
}: ProcedureSettingsUpdate & { version: number }): Promise<ProcedureSettingsResponse> {
  return apiRequest("/organisation/settings", {
    method: "PATCH",
    body: update,
    schema: ProcedureSettingsResponseSchema,
    ifMatch: version,
  });
}

export const organisationSettingsQueryOptions = () =>
  queryOptions({ queryKey: ["organisation", "settings"], queryFn: ({ signal }) => getOrganisationSettings(signal) });

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
