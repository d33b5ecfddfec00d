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
}

/**
 * The one fetch wrapper of the client: JSON in and out, same-origin cookies, and a typed
 * ApiError with the server's message on any non-2xx answer.
 */
export async function apiRequest<T = unknown>(path: string, options: RequestOptions<T> = {}): Promise<T> {
  const { method = "GET", body, schema, signal, ifMatch } = options;
  const headers: Record<string, string> = { Accept: "application/json" };
  if (body !== undefined) headers["Content-Type"] = "application/json";
  if (ifMatch !== undefined) headers["If-Match"] = `"${ifMatch}"`;
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      method,
      credentials: "same-origin",
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
      signal,
    });
  } catch (error) {
    if ((error as Error).name === "AbortError") throw error;
    throw new ApiError(0, "No connection to the Satura server. Check the network and try again.");
  }

  if (response.status === 204) return undefined as T;
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
