import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import {
  AdjustmentSchema,
  CommentSchema,
  PhotoSchema,
  ReadingSchema,
  VisitSchema,
  VisitSummarySchema,
  type AdjustmentCreate,
  type ReadingBody,
  type ReviewAction,
  type Visit,
  type VisitCreate,
  type VisitStatus,
  type VisitSummary,
} from "@shared/schemas/visits.ts";
import { ApiError, apiRequest } from "./api-client.ts";

const VisitListSchema = z.object({ visits: z.array(VisitSummarySchema) });
const VisitEnvelopeSchema = z.object({ visit: VisitSchema });

/** How often an open visit refreshes, so a remote reviewer sees readings within seconds. */
export const LIVE_REFRESH_MS = 4000;

export async function getVisits(filter: { status?: VisitStatus; equipmentId?: string }, signal?: AbortSignal): Promise<VisitSummary[]> {
  const search = new URLSearchParams(Object.entries(filter).filter((entry): entry is [string, string] => Boolean(entry[1])));
  const query = search.size > 0 ? `?${search}` : "";
  return (await apiRequest(`/visits${query}`, { schema: VisitListSchema, signal })).visits;
}

export async function getVisit(id: string, signal?: AbortSignal): Promise<Visit> {
  return (await apiRequest(`/visits/${id}`, { schema: VisitEnvelopeSchema, signal })).visit;
}

export async function createVisit(values: VisitCreate): Promise<Visit> {
  return (await apiRequest("/visits", { method: "POST", body: values, schema: VisitEnvelopeSchema })).visit;
}

export async function createReading({ visitId, ...body }: ReadingBody & { visitId: string }) {
  return (await apiRequest(`/visits/${visitId}/readings`, { method: "POST", body, schema: z.object({ reading: ReadingSchema }) })).reading;
}

export async function createAdjustment({ visitId, ...body }: AdjustmentCreate & { visitId: string }) {
  return (await apiRequest(`/visits/${visitId}/adjustments`, { method: "POST", body, schema: z.object({ adjustment: AdjustmentSchema }) })).adjustment;
}

export async function createComment({ visitId, ...body }: { visitId: string; body: string; readingId?: string | null }) {
  return (await apiRequest(`/visits/${visitId}/comments`, { method: "POST", body, schema: z.object({ comment: CommentSchema }) })).comment;
}

export async function reviewVisit({ visitId, ...action }: ReviewAction & { visitId: string }): Promise<Visit> {
  return (await apiRequest(`/visits/${visitId}/review`, { method: "POST", body: action, schema: VisitEnvelopeSchema })).visit;
}

/** Photos go as multipart form data, so they bypass the JSON wrapper but keep its errors. */
export async function uploadPhoto({ visitId, file, kind, caption }: { visitId: string; file: File; kind: string; caption?: string }) {
  const form = new FormData();
  form.append("kind", kind);
  if (caption) form.append("caption", caption);
  form.append("photo", file);
  const response = await fetch(`/api/visits/${visitId}/photos`, { method: "POST", body: form, credentials: "same-origin" });
  const payload = (await response.json().catch(() => ({}))) as { message?: string; photo?: unknown; fields?: Record<string, string> };
  if (!response.ok) throw new ApiError(response.status, payload.message ?? `Upload failed (${response.status})`, payload.fields ?? {});
  return PhotoSchema.parse(payload.photo);
}

export function sendReport({ visitId, to }: { visitId: string; to: string }): Promise<{ sentTo: string }> {
  return apiRequest(`/visits/${visitId}/report/send`, { method: "POST", body: { to }, schema: z.object({ sentTo: z.string() }) });
}

export const visitsQueryOptions = (filter: { status?: VisitStatus; equipmentId?: string } = {}) =>
  queryOptions({ queryKey: ["visits", "list", filter], queryFn: ({ signal }) => getVisits(filter, signal) });

export const visitQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ["visits", "detail", id],
    queryFn: ({ signal }) => getVisit(id, signal),
    // Live while the visit can still change; a signed-off visit is a closed record.
    refetchInterval: (query) => (query.state.data?.status === "signed-off" ? false : LIVE_REFRESH_MS),
  });

export const useVisits = (filter: { status?: VisitStatus; equipmentId?: string } = {}) => useQuery(visitsQueryOptions(filter));
export const useVisit = (id: string) => useQuery(visitQueryOptions(id));

function useVisitMutation<TVariables extends { visitId: string }, TResult>(mutationFn: (variables: TVariables) => Promise<TResult>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    onSuccess: (_result, variables) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ["visits", "detail", variables.visitId] }),
        queryClient.invalidateQueries({ queryKey: ["visits", "list"] }),
      ]),
  });
}

export const useCreateReading = () => useVisitMutation(createReading);
export const useCreateAdjustment = () => useVisitMutation(createAdjustment);
export const useCreateComment = () => useVisitMutation(createComment);
export const useReviewVisit = () => useVisitMutation(reviewVisit);
export const useUploadPhoto = () => useVisitMutation(uploadPhoto);
export const useSendReport = () => useMutation({ mutationFn: sendReport, meta: { silentErrors: true } });

export function useCreateVisit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createVisit,
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: ["visits"] }), queryClient.invalidateQueries({ queryKey: ["equipment"] })]),
  });
}
