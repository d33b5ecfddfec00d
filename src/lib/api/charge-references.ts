import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  ChargeReferencesResponseSchema,
  type ChargeReferenceClear,
  type ChargeReferenceSet,
  type ChargeReferencesResponse,
} from "@shared/schemas/charge-references.ts";
import { apiRequest } from "./api-client.ts";

export function getChargeReferences(equipmentId: string, signal?: AbortSignal): Promise<ChargeReferencesResponse> {
  return apiRequest(`/equipment/${equipmentId}/charge-references`, { schema: ChargeReferencesResponseSchema, signal });
}

export function updateChargeReference(
  equipmentId: string,
  circuit: number,
  body: ChargeReferenceSet,
): Promise<ChargeReferencesResponse> {
  return apiRequest(`/equipment/${equipmentId}/charge-references/${circuit}`, {
    method: "PUT",
    body,
    schema: ChargeReferencesResponseSchema,
  });
}

export function deleteChargeReference(
  equipmentId: string,
  circuit: number,
  body: ChargeReferenceClear,
): Promise<ChargeReferencesResponse> {
  return apiRequest(`/equipment/${equipmentId}/charge-references/${circuit}`, {
    method: "DELETE",
    body,
    schema: ChargeReferencesResponseSchema,
  });
}

export const chargeReferencesQueryOptions = (equipmentId: string) =>
  queryOptions({
    queryKey: ["charge-references", "equipment", equipmentId],
    queryFn: ({ signal }) => getChargeReferences(equipmentId, signal),
  });

export const useChargeReferences = (equipmentId: string) => useQuery(chargeReferencesQueryOptions(equipmentId));

/** Set or clear one circuit's reference point; the unit's references are fetched again before it settles. */
export function useSetChargeReference(equipmentId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ circuit, body }: { circuit: number; body: ChargeReferenceSet }) =>
      updateChargeReference(equipmentId, circuit, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["charge-references", "equipment", equipmentId] }),
  });
}

export function useClearChargeReference(equipmentId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ circuit, body }: { circuit: number; body: ChargeReferenceClear }) =>
      deleteChargeReference(equipmentId, circuit, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["charge-references", "equipment", equipmentId] }),
  });
}
