import { queryOptions, useQuery } from "@tanstack/react-query";
import { HealthSchema, type Health } from "@shared/schemas/health.ts";
import { apiRequest } from "./api-client.ts";

export function getHealth(signal?: AbortSignal): Promise<Health> {
  return apiRequest("/health", { schema: HealthSchema, signal });
}

export const healthQueryOptions = () =>
  queryOptions({
    queryKey: ["health"],
    queryFn: ({ signal }) => getHealth(signal),
    refetchInterval: 60_000,
  });

export const useHealth = () => useQuery(healthQueryOptions());
