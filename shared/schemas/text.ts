/**
 * The one schema for text that comes from a client, used by every text field of every request
 * body and query. PostgreSQL refuses two things JSON and JavaScript strings can carry: the NUL
 * character in text (https://www.postgresql.org/docs/current/datatype-character.html) and a lone
 * UTF-16 surrogate in jsonb (it has no UTF-8 form; RFC 8259 §8.2 calls such strings
 * unpredictable). Both are refused here with a field message, so they never reach a query. Other
 * control characters are refused too: nobody types them, and they garble reports and CSV exports.
 */
import { z } from "zod";

/** C0 controls, DEL and C1 controls: none belongs in a name, a label or an id. */
// eslint-disable-next-line no-control-regex -- finding control characters is the point
const SINGLE_LINE_CONTROLS = /[\u0000-\u001F\u007F-\u009F]/;
/** The same, except tab, line feed and carriage return, which notes and comments may hold. */
// eslint-disable-next-line no-control-regex -- as above
const MULTI_LINE_CONTROLS = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/;
/** A high surrogate not followed by a low one, or a low surrogate not preceded by a high one. */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export const SINGLE_LINE_MESSAGE = "Keep this to one line, without tabs or control characters";
export const CONTROL_CHARACTER_MESSAGE = "Remove the control characters (such as NUL) from this text";
export const BROKEN_CHARACTER_MESSAGE = "This text holds a broken character (a lone UTF-16 surrogate); type it again";

export interface TextOptions {
  /** Notes, comments, reasons and addresses may hold tabs and line breaks; names and labels may not. */
  multiline?: boolean;
  /** Leading and trailing white space is dropped (default). Passwords keep theirs. */
  trim?: boolean;
  /** The message when the value is not a string at all. */
  error?: string;
}

/** Does this text hold no lone surrogate and no control character (but tab and line breaks when multi-line)? */
export function isCleanText(value: string, multiline = false): boolean {
  return !LONE_SURROGATE.test(value) && !(multiline ? MULTI_LINE_CONTROLS : SINGLE_LINE_CONTROLS).test(value);
}

/**
 * A text field: a string, trimmed unless told otherwise, without control characters or lone
 * surrogates. Chain `.min()`, `.max()`, `.optional()` … as on `z.string()`.
 */
export function text(options: TextOptions = {}): z.ZodString {
  const base = z.string(options.error ? { error: options.error } : undefined);
  const trimmed = options.trim === false ? base : base.trim();
  return trimmed
    .refine((value) => !LONE_SURROGATE.test(value), BROKEN_CHARACTER_MESSAGE)
    .refine(
      (value) => !(options.multiline ? MULTI_LINE_CONTROLS : SINGLE_LINE_CONTROLS).test(value),
      options.multiline ? CONTROL_CHARACTER_MESSAGE : SINGLE_LINE_MESSAGE,
    );
}
