import { z } from "zod";

/** `:id` route parameters; a malformed id answers 404 like a missing record. */
export const IdParamsSchema = z.object({ id: z.uuid("Not a valid record id") });

/** Timestamps travel as ISO 8601 strings. */
export const IsoDateSchema = z.iso.datetime({ offset: true });
