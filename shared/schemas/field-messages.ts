import type { ZodError } from "zod";

/** The key of a message that belongs to no one field (a check of the whole form or body). */
export const FORM_MESSAGE_KEY = "_";

/**
 * A failed zod parse as one message per field path, e.g. { "suctionPressureKPa": "...",
 * "insulation.0.megohms": "..." }: the first message zod gives for each, under FORM_MESSAGE_KEY
 * when the issue has no path. A field a strict schema does not take is listed under its own name,
 * so the form can say which. The server's 400 body carries this shape (`fields`), and forms that
 * check with the same schema before sending show the same messages under the same keys.
 */
export function fieldMessages(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const prefix = issue.path.length > 0 ? `${issue.path.join(".")}.` : "";
    const keys =
      issue.code === "unrecognized_keys"
        ? issue.keys.map((key) => `${prefix}${key}`)
        : [issue.path.length > 0 ? issue.path.join(".") : FORM_MESSAGE_KEY];
    for (const key of keys) fields[key] ??= issue.message;
  }
  return fields;
}
