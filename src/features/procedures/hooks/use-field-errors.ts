import { useState } from "react";

/**
 * Field messages from the last save that vanish as soon as their field is changed: a message
 * describes what is on screen, not what was there when Save was tapped. `typed` maps each body
 * field (the first segment of an error path, e.g. "leaks" for "leaks.0.location") to what is
 * typed now; a message whose field is not in `typed` stays until the next save.
 *
 * @returns the messages still true of the form, and the setter a save calls
 */
export function useFieldErrors(typed: Readonly<Record<string, unknown>>) {
  const [last, setLast] = useState<{ errors: Record<string, string>; typed: Record<string, unknown> }>({
    errors: {},
    typed: {},
  });
  const errors: Record<string, string> = {};
  for (const [path, message] of Object.entries(last.errors)) {
    const field = path.split(".")[0]!;
    if (!(field in typed) || Object.is(typed[field], last.typed[field])) errors[path] = message;
  }
  const setErrors = (next: Record<string, string>) => setLast({ errors: next, typed: { ...typed } });
  return [errors, setErrors] as const;
}
