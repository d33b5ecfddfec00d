import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { ApiError } from "./api/api-client.ts";

/**
 * Puts the server's field messages (400/409 bodies: { message, fields }) under the matching
 * inputs, and returns the message to show above the form when no field took it. Values the
 * user typed stay as they are.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): string | null {
  if (!(error instanceof ApiError)) return error instanceof Error ? error.message : "Something went wrong. Try again.";
  let placed = false;
  for (const [name, message] of Object.entries(error.fields)) {
    if ((fieldNames as readonly string[]).includes(name)) {
      setError(name as Path<T>, { type: "server", message }, { shouldFocus: !placed });
      placed = true;
    }
  }
  return placed ? null : error.message;
}
