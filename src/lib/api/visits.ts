import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import {
  AdjustmentSchema,
  CommentSchema,
  PhotoSchema,
  ReadingSchema,
  ReadingsPageSchema,
  VisitEventSchema,
  VisitDetailResponseSchema,
  VisitSchema,
  type AdjustmentCreate,
  type ReadingBody,
  type ReadingsPage,
  type ReadingsPageQuery,
  type ReviewAction,
  type Visit,
  type VisitCreate,
  type VoidBody,
} from "@shared/schemas/visits.ts";
import { ImportSummarySchema, type ColumnMapping, type ImportSummary } from "@shared/schemas/readings-import.ts";
import { VisitPageSchema, type VisitListParams, type VisitPage } from "@shared/schemas/list-pages.ts";
import { ApiError, apiRequest, formWithFile, UPLOAD_TIMEOUT_MS } from "./api-client.ts";
import { listQueryString } from "./list-params.ts";
import { mergeReadingsPage, mergeVisitDelta } from "./merge-visit-delta.ts";
import { localDayStart, viewerTimeZone } from "@shared/format/date-time.ts";

const VisitEnvelopeSchema = z.object({ visit: VisitSchema });

/** How often an open visit refreshes, so a remote reviewer sees readings within seconds. */
export const LIVE_REFRESH_MS = 4000;

/** One page of the company's visits (see shared/schemas/list-pages.ts for the parameters). */
export async function getVisits(params: VisitListParams = {}, signal?: AbortSignal): Promise<VisitPage> {
  return apiRequest(`/visits${listQueryString(params)}`, { schema: VisitPageSchema, signal });
}

/**
 * The visit. With the copy already held, asks only for what changed since its revision: the
 * server answers 304 (nothing changed: the held copy is returned as it is), a delta (merged into
 * the held copy) or, when it cannot build on that revision, the whole visit.
 */
export async function getVisit(id: string, signal?: AbortSignal, held?: Visit): Promise<Visit> {
  if (!held) return (await apiRequest(`/visits/${id}`, { schema: VisitEnvelopeSchema, signal })).visit;
  const answer = await apiRequest(`/visits/${id}?since=${encodeURIComponent(held.revision)}`, {
    schema: VisitDetailResponseSchema,
    signal,
    ifNoneMatch: `W/"${held.revision}"`,
  });
  if (answer === undefined) return held;
  return "delta" in answer ? mergeVisitDelta(held, answer.delta) : answer.visit;
}

/** A page of one circuit's readings taken before the reading `before` (see circuitLogs' olderCursor). */
export async function getVisitReadings(
  { visitId, circuit, before, limit }: ReadingsPageQuery & { visitId: string },
  signal?: AbortSignal,
): Promise<ReadingsPage> {
  const query = new URLSearchParams({ circuit: String(circuit), before, ...(limit ? { limit: String(limit) } : {}) });
  return apiRequest(`/visits/${visitId}/readings?${query}`, { schema: ReadingsPageSchema, signal });
}

export async function createVisit(values: VisitCreate): Promise<Visit> {
  return (await apiRequest("/visits", { method: "POST", body: values, schema: VisitEnvelopeSchema })).visit;
}

/** Where a visit's readings and adjustments are created; the outbox sends kept entries there too. */
export const readingsPath = (visitId: string) => `/visits/${visitId}/readings`;
export const adjustmentsPath = (visitId: string) => `/visits/${visitId}/adjustments`;

export async function createReading({ visitId, ...body }: ReadingBody & { visitId: string }) {
  return (
    await apiRequest(readingsPath(visitId), { method: "POST", body, schema: z.object({ reading: ReadingSchema }) })
  ).reading;
}

export async function createAdjustment({ visitId, ...body }: AdjustmentCreate & { visitId: string }) {
  return (
    await apiRequest(adjustmentsPath(visitId), {
      method: "POST",
      body,
      schema: z.object({ adjustment: AdjustmentSchema }),
    })
  ).adjustment;
}

/** Where a visit's comments are posted. */
export const commentsPath = (visitId: string) => `/visits/${visitId}/comments`;

export async function createComment({
  visitId,
  ...body
}: {
  visitId: string;
  body: string;
  readingId?: string | null;
  clientId?: string;
}) {
  return (
    await apiRequest(commentsPath(visitId), { method: "POST", body, schema: z.object({ comment: CommentSchema }) })
  ).comment;
}

/** Voids one of the visit's records with a reason (it stays on the record, struck through). */
/** Where a visit's voids are sent. */
export const voidsPath = (visitId: string) => `/visits/${visitId}/voids`;

export async function voidRecord({ visitId, ...body }: VoidBody & { visitId: string }) {
  return (await apiRequest(voidsPath(visitId), { method: "POST", body, schema: z.object({ event: VisitEventSchema }) }))
    .event;
}

export async function reviewVisit({ visitId, ...action }: ReviewAction & { visitId: string }): Promise<Visit> {
  return (await apiRequest(`/visits/${visitId}/review`, { method: "POST", body: action, schema: VisitEnvelopeSchema }))
    .visit;
}

/** Where a visit's photos are sent. */
export const photosPath = (visitId: string) => `/visits/${visitId}/photos`;

/** What goes beside a photo's file: the outbox keeps these as the entry's body. */
export interface PhotoFields {
  kind: string;
  caption?: string;
  clientId: string;
  /** When it was added on the device. */
  takenAt: string;
}

/** Photos go as multipart form data, with the JSON wrapper's errors. */
export async function uploadPhoto({ visitId, file, ...fields }: PhotoFields & { visitId: string; file: File }) {
  const body = formWithFile({ ...fields }, { field: "photo", blob: file, name: file.name });
  return (
    await apiRequest(photosPath(visitId), {
      method: "POST",
      body,
      timeoutMs: UPLOAD_TIMEOUT_MS,
      schema: z.object({ photo: PhotoSchema }),
    })
  ).photo;
}

/**
 * Imports a CSV series with its column mapping (the browser previews the file itself, so it is
 * sent once); a 422 (problems, nothing stored) still returns its summary.
 */
export async function importReadings({
  visitId,
  file,
  circuit,
  mode,
  mapping,
}: {
  visitId: string;
  file: File;
  circuit: number;
  mode: "all" | "valid-only";
  mapping: ColumnMapping;
}): Promise<ImportSummary> {
  const form = new FormData();
  form.append("circuit", String(circuit));
  // Today's local midnight, so a logger's "10:05" lands on the right instant.
  form.append("dayStart", localDayStart(new Date()));
  form.append("mode", mode);
  form.append("mapping", JSON.stringify(mapping));
  form.append("file", file);
  const response = await fetch(`/api/visits/${visitId}/readings/import`, {
    method: "POST",
    body: form,
    credentials: "same-origin",
  });
  const payload = (await response.json().catch(() => ({}))) as { message?: string; fields?: Record<string, string> };
  if (!response.ok && response.status !== 422)
    throw new ApiError(response.status, payload.message ?? `Import failed (${response.status})`, payload.fields ?? {});
  return ImportSummarySchema.parse(payload);
}

export function sendReport({ visitId, to }: { visitId: string; to: string }): Promise<{ sentTo: string }> {
  // The sender's zone, so the e-mail's times match the report on their screen.
  return apiRequest(`/visits/${visitId}/report/send`, {
    method: "POST",
    body: { to, timeZone: viewerTimeZone() },
    schema: z.object({ sentTo: z.string() }),
  });
}

const IN_PROGRESS = "open,sent-back";
/** Today's first list: the company's visits still open, a short first page (the jobs page holds the rest). */
export const OPEN_VISITS_FIRST_PAGE: VisitListParams = { status: IN_PROGRESS, limit: 10 };
/** The visits one person is on the crew of and still open: few, so one page holds them all. */
export const MY_OPEN_VISITS: VisitListParams = { status: IN_PROGRESS, crew: "me", limit: 50 };

/** The key holds every parameter, cursor included: each page of each order is its own entry. */
export const visitsQueryOptions = (params: VisitListParams = {}) =>
  queryOptions({ queryKey: ["visits", "list", params], queryFn: ({ signal }) => getVisits(params, signal) });

export const visitQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ["visits", "detail", id],
    // The refresh builds on the copy in the cache, so a poll costs what changed, not the whole visit.
    queryFn: ({ signal, client, queryKey }) => getVisit(id, signal, client.getQueryData<Visit>(queryKey)),
    // Live while the visit can still change; a signed-off visit is a closed record.
    refetchInterval: (query) => (query.state.data?.status === "signed-off" ? false : LIVE_REFRESH_MS),
  });

/** A page of visits; while the next page (or another order) loads, the last one stays on screen. */
export const useVisits = (params: VisitListParams = {}, { enabled = true } = {}) =>
  useQuery({ ...visitsQueryOptions(params), placeholderData: keepPreviousData, enabled });
export const useVisit = (id: string) => useQuery(visitQueryOptions(id));

function useVisitMutation<TVariables extends { visitId: string }, TResult>(
  mutationFn: (variables: TVariables) => Promise<TResult>,
  alsoRefresh: readonly string[][] = [],
  meta: { silentErrors?: boolean; keptOffline?: boolean } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    meta,
    onSuccess: (_result, variables) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ["visits", "detail", variables.visitId] }),
        queryClient.invalidateQueries({ queryKey: ["visits", "list"] }),
        ...alsoRefresh.map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      ]),
  });
}

// A stored reading may make a circuit's settled readings after a weigh-in its charge reference
// point (calibrated on the server), so the units' reference points are fetched again too.
// The run log says itself what became of a save (stored, kept on the device, or refused), so no toast.
export const useCreateReading = () => useVisitMutation(createReading, [["charge-references"]], { silentErrors: true });
// A charge adjustment is also a register movement: the visit's refrigerant and the cylinders change with it.
// Without a connection the form keeps it in the device's outbox (src/features/offline/outbox-store.ts).
export const useCreateAdjustment = () =>
  useVisitMutation(createAdjustment, [["register"], ["cylinders"], ["equipment"]], { keptOffline: true });
export const useCreateComment = () => useVisitMutation(createComment);
export const useReviewVisit = () => useVisitMutation(reviewVisit);

/**
 * A void changes what the visit's sections show (procedures, refrigerant balance), so it
 * refreshes those as well as the visit.
 */
export function useVoidRecord() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: voidRecord,
    meta: { silentErrors: true },
    onSuccess: (_event, variables) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ["visits", "detail", variables.visitId] }),
        queryClient.invalidateQueries({ queryKey: ["visits", "list"] }),
        queryClient.invalidateQueries({ queryKey: ["procedures"] }),
        queryClient.invalidateQueries({ queryKey: ["register"] }),
        queryClient.invalidateQueries({ queryKey: ["cylinders"] }),
        queryClient.invalidateQueries({ queryKey: ["equipment"] }),
      ]),
  });
}
/**
 * "Show earlier entries": fetches the page of a circuit's readings before the oldest held and
 * merges it into the cached visit, so every screen reading the visit sees them and the next
 * refresh still asks only for what changed.
 */
export function useEarlierReadings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (variables: { visitId: string; circuit: number; before: string }) => getVisitReadings(variables),
    onSuccess: (page, { visitId, circuit }) =>
      queryClient.setQueryData<Visit>(["visits", "detail", visitId], (held) =>
        held ? mergeReadingsPage(held, circuit, page) : held,
      ),
  });
}
export const useUploadPhoto = () => useVisitMutation(uploadPhoto);
export const useImportReadings = () => useVisitMutation(importReadings);
export const useSendReport = () => useMutation({ mutationFn: sendReport, meta: { silentErrors: true } });

export function useCreateVisit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createVisit,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ["visits"] }),
        queryClient.invalidateQueries({ queryKey: ["equipment"] }),
      ]),
  });
}
