import { useState } from "react";
import { useForm } from "react-hook-form";
import { Link, useNavigate, useSearchParams } from "react-router-dom";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, PasswordField, TextField } from "@/components/ui/field/field.tsx";
import { paths } from "@/config/paths.ts";
import { useSignIn } from "@/lib/api/auth.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";
import { lazyZodResolver } from "@/lib/lazy-zod-resolver.ts";
import { safeNext } from "../utils/safe-next.ts";

// The app's first screen: its schema (and zod) load on the first submit (lazy-zod-resolver.ts).
const signInResolver = lazyZodResolver(async () => (await import("@shared/schemas/auth.ts")).SignInSchema);

export function SignInForm() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const signIn = useSignIn();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm({ resolver: signInResolver, defaultValues: { email: "", password: "" } });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await signIn.mutateAsync(values);
      void navigate(safeNext(params.get("next")), { replace: true });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["email", "password"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError && <FormAlert>{formError}</FormAlert>}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        inputMode="email"
        error={errors.email?.message}
        {...form.register("email")}
      />
      <PasswordField
        label="Password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" size="lg" className="w-full" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? "Signing in…" : "Sign in"}
      </Button>
      <p className="flex flex-wrap justify-between gap-2 text-sm">
        <Link
          to={paths.forgotPassword.getHref()}
          className="inline-flex min-h-touch items-center font-medium text-accent underline underline-offset-4"
        >
          Forgot your password?
        </Link>
        <Link
          to={paths.signUp.getHref()}
          className="inline-flex min-h-touch items-center font-medium text-accent underline underline-offset-4"
        >
          New company? Create an account
        </Link>
      </p>
    </form>
  );
}
