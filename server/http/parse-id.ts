import { z } from "zod";
import { notFound } from "./http-error.ts";

/** A malformed id is simply a record that does not exist (and never reaches Postgres's uuid cast). */
export function parseId(value: unknown, what: string): string {
  const parsed = z.uuid().safeParse(value);
  if (!parsed.success) throw notFound(what);
  return parsed.data;
}
