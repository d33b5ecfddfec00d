import { get, type FieldErrors, type FieldValues, type Path, type UseFormSetError } from "react-hook-form";
import { ApiError } from "./api/api-client.ts";

/** Whether a message's path is the field's own or under it ("leaks" takes "leaks.0.location"). */
const isUnder = (path: string, field: string) => path === field || path.startsWith(`${field}.`);

/**
 * Puts the server's field messages (400/409 bodies: { message, fields }) under the matching
 * inputs, and returns the message to show above the form when no field took it. A field name
 * takes the messages of its own path and of the paths under it (a list's rows). Values the user
 * typed stay as they are.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): string | null {
  if (!(error instanceof ApiError)) return error instanceof Error ? error.message : "Something went wrong. Try again.";
  let placed = false;
  for (const [name, message] of Object.entries(error.fields)) {
    if (fieldNames.some((field) => isUnder(name, field))) {
      setError(name as Path<T>, { type: "server", message }, { shouldFocus: !placed });
      placed = true;
    }
  }
  return placed ? null : error.message;
}

/** The first message in a react-hook-form error tree, depth first. */
function firstMessage(node: unknown): string | undefined {
  if (typeof node !== "object" || node === null) return undefined;
  if ("message" in node && typeof node.message === "string" && node.message !== "") return node.message;
  for (const [key, child] of Object.entries(node)) {
    if (key === "ref") continue;
    const found = firstMessage(child);
    if (found) return found;
  }
  return undefined;
}

/**
 * The message for a field and everything under it: "note" also shows "note.0", and a list's
 * own message comes before its rows'. Field names are the body's paths, so these are the
 * shared schema's messages (and the server's, same keys: `fieldMessages`).
 */
export function messageAt<T extends FieldValues>(errors: FieldErrors<T>, path: string): string | undefined {
  return firstMessage(get(errors, path));
}
