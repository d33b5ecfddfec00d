import { type QueryClient, queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import {
  ElectricalCheckListSchema,
  ElectricalCheckSchema,
  EvacuationListSchema,
  EvacuationSchema,
  LeakSearchListSchema,
  LeakSearchSchema,
  PressureTestListSchema,
  PressureTestSchema,
  StandingPressureCheckListSchema,
  StandingPressureCheckSchema,
  type ElectricalCheckBody,
  type EvacuationCreate,
  type EvacuationSampleBody,
  type EvacuationUpdate,
  type LeakSearchBody,
  type PressureTestBody,
  type StandingPressureBody,
} from "@shared/schemas/procedure-records.ts";
import { apiRequest } from "./api-client.ts";
import {
  evacuationSamplesPath,
  procedureRecordsKey,
  procedureRecordsPath,
  type ProcedureRecordKind,
} from "./procedure-paths.ts";

type Kind = ProcedureRecordKind;

// ---- requests ---------------------------------------------------------------------------------

export const getElectricalChecks = (visitId: string, signal?: AbortSignal) =>
  apiRequest(procedureRecordsPath("electrical-checks", visitId), { schema: ElectricalCheckListSchema, signal });
export const getLeakSearches = (visitId: string, signal?: AbortSignal) =>
  apiRequest(procedureRecordsPath("leak-searches", visitId), { schema: LeakSearchListSchema, signal });
export const getStandingPressureChecks = (visitId: string, signal?: AbortSignal) =>
  apiRequest(procedureRecordsPath("standing-pressure-checks", visitId), {
    schema: StandingPressureCheckListSchema,
    signal,
  });
export const getPressureTests = (visitId: string, signal?: AbortSignal) =>
  apiRequest(procedureRecordsPath("pressure-tests", visitId), { schema: PressureTestListSchema, signal });
export const getEvacuations = (visitId: string, signal?: AbortSignal) =>
  apiRequest(procedureRecordsPath("evacuations", visitId), { schema: EvacuationListSchema, signal });

export async function createElectricalCheck({ visitId, ...body }: ElectricalCheckBody & { visitId: string }) {
  return (
    await apiRequest(procedureRecordsPath("electrical-checks", visitId), {
      method: "POST",
      body,
      schema: z.object({ electricalCheck: ElectricalCheckSchema }),
    })
  ).electricalCheck;
}

export async function createLeakSearch({ visitId, ...body }: LeakSearchBody & { visitId: string }) {
  return (
    await apiRequest(procedureRecordsPath("leak-searches", visitId), {
      method: "POST",
      body,
      schema: z.object({ leakSearch: LeakSearchSchema }),
    })
  ).leakSearch;
}

export async function createStandingPressureCheck({ visitId, ...body }: StandingPressureBody & { visitId: string }) {
  return (
    await apiRequest(procedureRecordsPath("standing-pressure-checks", visitId), {
      method: "POST",
      body,
      schema: z.object({ standingPressureCheck: StandingPressureCheckSchema }),
    })
  ).standingPressureCheck;
}

export async function createPressureTest({ visitId, ...body }: PressureTestBody & { visitId: string }) {
  return (
    await apiRequest(procedureRecordsPath("pressure-tests", visitId), {
      method: "POST",
      body,
      schema: z.object({ pressureTest: PressureTestSchema }),
    })
  ).pressureTest;
}

const EvacuationEnvelope = z.object({ evacuation: EvacuationSchema });

export async function createEvacuation({ visitId, ...body }: EvacuationCreate & { visitId: string }) {
  return (
    await apiRequest(procedureRecordsPath("evacuations", visitId), { method: "POST", body, schema: EvacuationEnvelope })
  ).evacuation;
}

export async function addEvacuationSample({
  visitId,
  evacuationId,
  ...body
}: EvacuationSampleBody & { visitId: string; evacuationId: string }) {
  return (
    await apiRequest(evacuationSamplesPath(visitId, evacuationId), { method: "POST", body, schema: EvacuationEnvelope })
  ).evacuation;
}

/** Valves off or changes the target or note, naming the version the screen showed (409 if stale). */
export async function updateEvacuation({
  visitId,
  evacuationId,
  version,
  ...body
}: EvacuationUpdate & { visitId: string; evacuationId: string; version: number }) {
  return (
    await apiRequest(`/visits/${visitId}/evacuations/${evacuationId}`, {
      method: "PATCH",
      body,
      schema: EvacuationEnvelope,
      ifMatch: version,
    })
  ).evacuation;
}

// ---- query options ----------------------------------------------------------------------------

export const electricalChecksQueryOptions = (visitId: string) =>
  queryOptions({
    queryKey: procedureRecordsKey("electrical-checks", visitId),
    queryFn: ({ signal }) => getElectricalChecks(visitId, signal),
  });
export const leakSearchesQueryOptions = (visitId: string) =>
  queryOptions({
    queryKey: procedureRecordsKey("leak-searches", visitId),
    queryFn: ({ signal }) => getLeakSearches(visitId, signal),
  });
export const standingPressureChecksQueryOptions = (visitId: string) =>
  queryOptions({
    queryKey: procedureRecordsKey("standing-pressure-checks", visitId),
    queryFn: ({ signal }) => getStandingPressureChecks(visitId, signal),
  });
export const pressureTestsQueryOptions = (visitId: string) =>
  queryOptions({
    queryKey: procedureRecordsKey("pressure-tests", visitId),
    queryFn: ({ signal }) => getPressureTests(visitId, signal),
  });
export const evacuationsQueryOptions = (visitId: string) =>
  queryOptions({
    queryKey: procedureRecordsKey("evacuations", visitId),
    queryFn: ({ signal }) => getEvacuations(visitId, signal),
  });

// ---- hooks ------------------------------------------------------------------------------------

/** Fetches every procedure list of a visit not yet held: what its sections show, ahead of offline use. */
export function prefetchProcedureLists(queryClient: QueryClient, visitId: string): Promise<unknown> {
  return Promise.all([
    queryClient.prefetchQuery(electricalChecksQueryOptions(visitId)),
    queryClient.prefetchQuery(leakSearchesQueryOptions(visitId)),
    queryClient.prefetchQuery(standingPressureChecksQueryOptions(visitId)),
    queryClient.prefetchQuery(pressureTestsQueryOptions(visitId)),
    queryClient.prefetchQuery(evacuationsQueryOptions(visitId)),
  ]);
}

export const useElectricalChecks = (visitId: string) => useQuery(electricalChecksQueryOptions(visitId));
export const useLeakSearches = (visitId: string) => useQuery(leakSearchesQueryOptions(visitId));
export const useStandingPressureChecks = (visitId: string) => useQuery(standingPressureChecksQueryOptions(visitId));
export const usePressureTests = (visitId: string) => useQuery(pressureTestsQueryOptions(visitId));
export const useEvacuations = (visitId: string) => useQuery(evacuationsQueryOptions(visitId));

/** Saves, then refreshes that procedure's list and the visit (the crew may have grown). */
function useProcedureMutation<TVariables extends { visitId: string }, TResult>(
  kind: Kind,
  mutationFn: (variables: TVariables) => Promise<TResult>,
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    // Without a connection the panels keep new records in the device's outbox and say so.
    meta: { keptOffline: true },
    onSuccess: (_result, variables) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: procedureRecordsKey(kind, variables.visitId) }),
        queryClient.invalidateQueries({ queryKey: ["visits", "detail", variables.visitId] }),
      ]),
  });
}

export const useCreateElectricalCheck = () => useProcedureMutation("electrical-checks", createElectricalCheck);
export const useCreateLeakSearch = () => useProcedureMutation("leak-searches", createLeakSearch);
export const useCreateStandingPressureCheck = () =>
  useProcedureMutation("standing-pressure-checks", createStandingPressureCheck);
export const useCreatePressureTest = () => useProcedureMutation("pressure-tests", createPressureTest);
export const useCreateEvacuation = () => useProcedureMutation("evacuations", createEvacuation);
export const useAddEvacuationSample = () => useProcedureMutation("evacuations", addEvacuationSample);
export const useUpdateEvacuation = () => useProcedureMutation("evacuations", updateEvacuation);
