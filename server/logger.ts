import { pino, type Logger } from "pino";
import type { Env } from "./env.ts";

/** Structured JSON logs (one line each) in production; the same format elsewhere keeps one way. */
export function createLogger(env: Env): Logger {
  return pino({ level: env.NODE_ENV === "test" ? "silent" : env.LOG_LEVEL });
}
