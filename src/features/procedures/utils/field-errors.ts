import type { z } from "zod";

/** One message per field path ("insulation.0.megohms"), the first zod gives; the same shape as the server's 400 body. */
export function fieldErrorsOf(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.join(".") : "_";
    fields[key] ??= issue.message;
  }
  return fields;
}

/** Messages for a field and everything under it ("supplyVolts" also shows "supplyVolts.1"). */
export function errorFor(errors: Record<string, string>, path: string): string | undefined {
  if (errors[path]) return errors[path];
  const nested = Object.keys(errors).find((key) => key.startsWith(`${path}.`));
  return nested ? errors[nested] : undefined;
}
