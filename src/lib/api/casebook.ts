import { queryOptions, useMutation, useQuery, useQueryClient, type QueryClient } from "@tanstack/react-query";
import { z } from "zod";
import {
  AttemptSchema,
  AttemptSummarySchema,
  CaseSchema,
  CaseSummarySchema,
  ProgressSchema,
  TeamProgressSchema,
  type Attempt,
  type AttemptCreate,
  type AttemptSummary,
  type Case,
  type CaseDraftInput,
  type CaseSummary,
  type GenerateCase,
  type Progress,
  type TeamProgress,
} from "@shared/schemas/casebook.ts";
import { apiRequest } from "./api-client.ts";
import { ensureRefrigerantTable } from "./refrigerant-tables.ts";
import { loadQuery } from "./screen-data.ts";

const CaseEnvelopeSchema = z.object({ case: CaseSchema });
const AttemptEnvelopeSchema = z.object({ attempt: AttemptSchema });
const caseUrl = (id: string) => `/cases/${encodeURIComponent(id)}`;

export async function getCases(signal?: AbortSignal): Promise<CaseSummary[]> {
  return (await apiRequest("/cases", { schema: z.object({ cases: z.array(CaseSummarySchema) }), signal })).cases;
}

export async function getCase(id: string, signal?: AbortSignal): Promise<Case> {
  return (await apiRequest(caseUrl(id), { schema: CaseEnvelopeSchema, signal })).case;
}

export async function createCase(draft: CaseDraftInput): Promise<Case> {
  return (await apiRequest("/cases", { method: "POST", body: draft, schema: CaseEnvelopeSchema })).case;
}

/** Saves a case over the version the editor opened (409 when someone saved since). */
export async function updateCase({
  id,
  draft,
  version,
}: {
  id: string;
  draft: CaseDraftInput;
  version: number;
}): Promise<Case> {
  return (await apiRequest(caseUrl(id), { method: "PUT", body: draft, schema: CaseEnvelopeSchema, ifMatch: version }))
    .case;
}

export async function publishCase({ id, version }: { id: string; version: number }): Promise<Case> {
  return (await apiRequest(`${caseUrl(id)}/publish`, { method: "POST", schema: CaseEnvelopeSchema, ifMatch: version }))
    .case;
}

export async function createCaseFromReading(readingId: string): Promise<Case> {
  return (await apiRequest("/cases/from-reading", { method: "POST", body: { readingId }, schema: CaseEnvelopeSchema }))
    .case;
}

export async function generateCase(options: GenerateCase): Promise<Case> {
  return (await apiRequest("/cases/generate", { method: "POST", body: options, schema: CaseEnvelopeSchema })).case;
}

export async function createAttempt(values: AttemptCreate): Promise<Attempt> {
  return (await apiRequest("/attempts", { method: "POST", body: values, schema: AttemptEnvelopeSchema })).attempt;
}

export async function getAttempts(userId?: string, signal?: AbortSignal): Promise<AttemptSummary[]> {
  const query = userId ? `?userId=${encodeURIComponent(userId)}` : "";
  return (
    await apiRequest(`/attempts${query}`, { schema: z.object({ attempts: z.array(AttemptSummarySchema) }), signal })
  ).attempts;
}

export async function getAttempt(id: string, signal?: AbortSignal): Promise<Attempt> {
  return (await apiRequest(`/attempts/${encodeURIComponent(id)}`, { schema: AttemptEnvelopeSchema, signal })).attempt;
}

export async function getProgress(signal?: AbortSignal): Promise<Progress> {
  return (await apiRequest("/attempts/progress", { schema: z.object({ progress: ProgressSchema }), signal })).progress;
}

export async function getTeamProgress(signal?: AbortSignal): Promise<TeamProgress> {
  return apiRequest("/attempts/progress/team", { schema: TeamProgressSchema, signal });
}

export const casesQueryOptions = () =>
  queryOptions({ queryKey: ["cases", "list"], queryFn: ({ signal }) => getCases(signal) });
export const caseQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ["cases", "detail", id],
    queryFn: ({ signal }) => getCase(id, signal),
    // A generated case never changes: its id is its seed.
    staleTime: id.startsWith("gen~") ? Infinity : undefined,
  });
export const attemptsQueryOptions = (userId?: string) =>
  queryOptions({
    queryKey: ["attempts", "list", { userId: userId ?? null }],
    queryFn: ({ signal }) => getAttempts(userId, signal),
  });
export const attemptQueryOptions = (id: string) =>
  queryOptions({ queryKey: ["attempts", "detail", id], queryFn: ({ signal }) => getAttempt(id, signal) });
export const progressQueryOptions = () =>
  queryOptions({ queryKey: ["attempts", "progress", "mine"], queryFn: ({ signal }) => getProgress(signal) });
export const teamProgressQueryOptions = () =>
  queryOptions({ queryKey: ["attempts", "progress", "team"], queryFn: ({ signal }) => getTeamProgress(signal) });

/** A new case starts on this refrigerant (case-editor.tsx): its table is loaded with the editor. */
const NEW_CASE_REFRIGERANT = "R410A";

/**
 * The loader of a case's screens (answer, edit; new without an id): the case and its
 * refrigerant's table. The screens read the case with `useSuspenseQuery(caseQueryOptions(id))`.
 */
export async function loadCaseScreen(queryClient: QueryClient, caseId: string | undefined): Promise<null> {
  const item = caseId ? await loadQuery(queryClient, caseQueryOptions(caseId)) : undefined;
  if (caseId && !item) return null;
  await ensureRefrigerantTable(queryClient, item?.input.refrigerant ?? NEW_CASE_REFRIGERANT);
  return null;
}

export const useAttempts = (userId?: string) => useQuery(attemptsQueryOptions(userId));
export const useAttempt = (id: string) => useQuery(attemptQueryOptions(id));

/** Case changes touch the library list and that case. */
function useCaseMutation<TVariables>(mutationFn: (variables: TVariables) => Promise<Case>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    meta: { silentErrors: true },
    onSuccess: (saved) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ["cases", "list"] }),
        queryClient.invalidateQueries({ queryKey: ["cases", "detail", saved.id] }),
      ]),
  });
}

export const useCreateCase = () => useCaseMutation(createCase);
export const useUpdateCase = () => useCaseMutation(updateCase);
export const usePublishCase = () => useCaseMutation(publishCase);
export const useCreateCaseFromReading = () => useCaseMutation(createCaseFromReading);

export function useGenerateCase() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: generateCase,
    meta: { silentErrors: true },
    // Seed the detail cache so the attempt screen opens without a second request.
    onSuccess: (made) => queryClient.setQueryData(caseQueryOptions(made.id).queryKey, made),
  });
}

export function useCreateAttempt() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createAttempt,
    meta: { silentErrors: true },
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ["attempts"] }),
        queryClient.invalidateQueries({ queryKey: ["cases", "list"] }),
      ]),
  });
}
