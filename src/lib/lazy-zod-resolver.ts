import type { FieldValues, Resolver } from "react-hook-form";
import type { z } from "zod";

/**
 * A react-hook-form resolver that checks with a shared zod schema loaded on the first check,
 * for the public screens' forms: the sign-in screen is the app's first page, and zod with the
 * schemas was a fifth of its scripts. The check itself is `zodResolver(schema)`, the same as
 * every other form's; only its loading moves to the first submit.
 *
 * @example useForm({ resolver: lazyZodResolver(async () => (await import("@shared/schemas/auth.ts")).SignInSchema) })
 */
export function lazyZodResolver<Values extends FieldValues>(
  loadSchema: () => Promise<z.ZodType<Values, Values>>,
): Resolver<Values> {
  let loaded: Promise<Resolver<Values>> | undefined;
  return async (values, context, options) => {
    loaded ??= Promise.all([import("@hookform/resolvers/zod"), loadSchema()]).then(
      ([{ zodResolver }, schema]) => zodResolver(schema) as Resolver<Values>,
    );
    return (await loaded)(values, context, options);
  };
}
