import {
  pino,
  stdSerializers,
  type DestinationStream,
  type Logger,
  type SerializedError,
  type SerializedRequest,
} from "pino";
import type { Env } from "./env.ts";

/**
 * Values that are as good as a password for whoever reads them: the session cookie (request
 * and response), bearer credentials, and proxy credentials. pino replaces them before a line
 * is written (https://getpino.io/#/docs/redaction), so no log sink ever holds a live session.
 */
const REDACTED_PATHS = [
  "req.headers.cookie",
  "req.headers.authorization",
  'req.headers["proxy-authorization"]',
  'res.headers["set-cookie"]',
];

const HIDDEN = "[redacted]";

/**
 * A URL with every query value hidden. Links in mails carry one-time tokens in the query
 * (reset and invitation links), and any query may one day carry another secret, so values
 * are never logged; the path and the parameter names are enough to follow a request.
 */
export function redactUrl(url: string): string {
  const queryStart = url.indexOf("?");
  if (queryStart < 0) return url;
  const query = url
    .slice(queryStart + 1)
    .split("&")
    .map((pair) => {
      const equals = pair.indexOf("=");
      return equals < 0 ? pair : `${pair.slice(0, equals)}=${HIDDEN}`;
    })
    .join("&");
  return `${url.slice(0, queryStart)}?${query}`;
}

/** The request as logged: URL and Referer without query values, and no parsed query object. */
function serializeRequest(request: SerializedRequest): Record<string, unknown> {
  const { referer, ...headers } = request.headers;
  return {
    id: request.id,
    method: request.method,
    url: redactUrl(request.url),
    headers: typeof referer === "string" ? { ...headers, referer: redactUrl(referer) } : headers,
    remoteAddress: request.remoteAddress,
  };
}

interface QueryError extends Error {
  query: string;
  params: unknown[];
}

const isQueryError = (error: unknown): error is QueryError =>
  error instanceof Error &&
  typeof (error as Partial<QueryError>).query === "string" &&
  Array.isArray((error as Partial<QueryError>).params);

/**
 * Errors as logged. A failed database query (DrizzleQueryError) names its parameters in its
 * message and stack: a password hash, a session id or a token hash can be among them, so only
 * the SQL text is kept. The driver's own error beneath it keeps its code and constraint but
 * not its `detail`, which quotes the offending values.
 */
export function serializeError(error: unknown): SerializedError | unknown {
  if (!isQueryError(error)) return stdSerializers.err(error as Error);
  const message = `Failed query: ${error.query}`;
  const frames = (error.stack ?? "").split("\n").filter((line) => line.trimStart().startsWith("at "));
  const cause = error.cause as { message?: unknown; code?: unknown; constraint?: unknown; table?: unknown } | undefined;
  return {
    type: error.constructor.name,
    message,
    stack: [`${error.constructor.name}: ${message}`, ...frames].join("\n"),
    ...(cause
      ? {
          cause: {
            message: String(cause.message ?? ""),
            code: cause.code,
            constraint: cause.constraint,
            table: cause.table,
          },
        }
      : {}),
  };
}

/** Serializers shared by the app's logger and pino-http's request logger. */
export const logSerializers = { req: serializeRequest, err: serializeError };

/**
 * Structured JSON logs (one line each) in production; the same format elsewhere keeps one way.
 * Tests are silent unless they pass a destination to read what would have been logged.
 */
export function createLogger(env: Env, destination?: DestinationStream): Logger {
  const level = env.NODE_ENV === "test" && !destination ? "silent" : env.LOG_LEVEL;
  return pino({ level, redact: { paths: REDACTED_PATHS, censor: HIDDEN }, serializers: logSerializers }, destination);
}
