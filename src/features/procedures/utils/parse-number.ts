import { parseDecimal } from "@/components/ui/field/number-input.tsx";

/**
 * A typed field as the schema should see it: "" → undefined (left out), text that is not a
 * number → NaN (so the shared schema answers with its own "must be a number" message).
 */
export function toNumber(text: string): number | undefined {
  const parsed = parseDecimal(text);
  return parsed === "invalid" ? Number.NaN : parsed;
}

/** Converted with `convert` only when it is a number. */
export function toConverted(text: string, convert: (value: number) => number): number | undefined {
  const value = toNumber(text);
  return value === undefined || Number.isNaN(value) ? value : convert(value);
}
