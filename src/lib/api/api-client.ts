import type { z } from "zod";

/** An API failure carrying the server's own message and, for validation errors, the fields. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = "ApiError";
  }

  /** Someone else saved the record after this copy was read: offer to reload. */
  get isStale(): boolean {
    return this.status === 409;
  }
}

interface RequestOptions<T> {
  method?: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  body?: unknown;
  /** Parses the response, so a server that drifts from the shared contract fails loudly. */
  schema?: z.ZodType<T>;
  signal?: AbortSignal;
  /**
   * The version of the record this change is based on, sent as If-Match; the server answers
   * 409 (ApiError.isStale) when someone saved a newer version meanwhile.
   */
  ifMatch?: number;
  /**
   * The ETag of the copy the caller holds, sent as If-None-Match: a 304 answer (the copy is
   * current) returns undefined. Setting the header makes the browser pass the 304 through
   * instead of answering from its own cache (Fetch standard, "HTTP-network-or-cache fetch").
   */
  ifNoneMatch?: string;
  /** How long a write may go without an answer (default WRITE_TIMEOUT_MS): longer for an upload. */
  timeoutMs?: number;
}

/**
 * GETs sent before the code that reads them has loaded (startEarlyRequest), by path: on a slow
 * link the first screen's data would otherwise wait for its scripts and then queue behind them
 * for one of the browser's six connections. Each is taken up once, by the first apiRequest for
 * the same path, and forgotten after EARLY_REQUEST_TTL_MS if nothing asks for it.
 */
const earlyRequests = new Map<string, Promise<Response>>();
const EARLY_REQUEST_TTL_MS = 30_000;

const sendRequest = (path: string, init: RequestInit) => fetch(`/api${path}`, { credentials: "same-origin", ...init });

/**
 * Starts `GET /api<path>` now, for apiRequest to answer from when the screen asks for it.
 * Returns the response (for a caller to peek at a copy: `response.clone()`).
 */
export function startEarlyRequest(path: string): Promise<Response> {
  const started = earlyRequests.get(path);
  if (started) return started;
  const request = sendRequest(path, { headers: { Accept: "application/json" } });
  // A failure is the asking apiRequest's to report; unasked, it is dropped quietly.
  request.catch(() => undefined);
  earlyRequests.set(path, request);
  setTimeout(() => {
    if (earlyRequests.get(path) === request) earlyRequests.delete(path);
  }, EARLY_REQUEST_TTL_MS);
  return request;
}

/**
 * Drops the early requests not yet taken: sent under the session the page started with, their
 * answers are not the next one's (a visit opened signed out is refused; after signing in it is not).
 */
export function forgetEarlyRequests(): void {
  earlyRequests.clear();
}

/** The early request for a plain GET of `path`, if one was started and not yet taken. */
function takeEarlyRequest(path: string, method: string, conditional: boolean): Promise<Response> | undefined {
  if (method !== "GET" || conditional) return undefined;
  const request = earlyRequests.get(path);
  earlyRequests.delete(path);
  return request;
}

/** A write that has had no answer by then is reported as not confirmed, so no form waits for ever. */
export const WRITE_TIMEOUT_MS = 20_000;
/** An upload's wait for an answer: a 12 MB photo on a weak mobile link takes a minute or more. */
export const UPLOAD_TIMEOUT_MS = 180_000;

/**
 * The one fetch wrapper of the client: JSON in and out (or multipart out, for a FormData body),
 * same-origin cookies, and a typed ApiError with the server's message on any non-2xx answer.
 * Writes without a connection fail at once; writes without an answer within WRITE_TIMEOUT_MS
 * (or `timeoutMs`) fail with a message that says so.
 */
export async function apiRequest<T = unknown>(path: string, options: RequestOptions<T> = {}): Promise<T> {
  const { method = "GET", body, schema, signal, ifMatch, ifNoneMatch, timeoutMs = WRITE_TIMEOUT_MS } = options;
  const headers: Record<string, string> = { Accept: "application/json" };
  // A form's boundary goes in its Content-Type, which the browser writes itself.
  const multipart = body instanceof FormData;
  if (body !== undefined && !multipart) headers["Content-Type"] = "application/json";
  if (ifMatch !== undefined) headers["If-Match"] = `"${ifMatch}"`;
  if (ifNoneMatch !== undefined) headers["If-None-Match"] = ifNoneMatch;
  const write = method !== "GET";
  if (write && typeof navigator !== "undefined" && navigator.onLine === false) {
    throw new ApiError(
      0,
      "No connection: nothing was saved. Your values are kept here; save again when the signal is back.",
    );
  }
  let response: Response;
  try {
    response = await (takeEarlyRequest(path, method, ifNoneMatch !== undefined) ??
      sendRequest(path, {
        method,
        headers,
        body: body === undefined ? undefined : multipart ? body : JSON.stringify(body),
        signal: signal ?? (write ? AbortSignal.timeout(timeoutMs) : undefined),
      }));
  } catch (error) {
    const name = (error as Error).name;
    if (name === "TimeoutError") {
      throw new ApiError(
        0,
        `No answer from the Satura server within ${timeoutMs / 1000} s, so this was not confirmed saved. Your values are kept; check the list before saving again.`,
      );
    }
    if (name === "AbortError") throw error;
    throw new ApiError(
      0,
      "No connection to the Satura server: nothing was confirmed saved. Check the network and try again.",
    );
  }

  if (response.status === 204 || (response.status === 304 && ifNoneMatch !== undefined)) return undefined as T;
  const payload: unknown = await response.json().catch(() => undefined);
  if (!response.ok) {
    const data = (payload ?? {}) as { message?: unknown; fields?: unknown };
    throw new ApiError(
      response.status,
      typeof data.message === "string" ? data.message : `The server answered ${response.status}`,
      (data.fields as Record<string, string> | undefined) ?? {},
    );
  }
  return schema ? schema.parse(payload) : (payload as T);
}

/** A multipart body: the text fields (empty ones left out), then the file under its field name. */
export function formWithFile(
  fields: Record<string, unknown>,
  file: { field: string; blob: Blob; name: string },
): FormData {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) {
    if (value !== undefined && value !== null && value !== "") form.append(name, String(value));
  }
  form.append(file.field, file.blob, file.name);
  return form;
}
