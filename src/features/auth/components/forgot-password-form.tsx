import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Link } from "react-router-dom";
import { PasswordResetRequestSchema } from "@shared/schemas/auth.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, TextField } from "@/components/ui/field/field.tsx";
import { paths } from "@/config/paths.ts";
import { useRequestPasswordReset } from "@/lib/api/auth.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";

export function ForgotPasswordForm() {
  const requestReset = useRequestPasswordReset();
  const [formError, setFormError] = useState<string | null>(null);
  const [sent, setSent] = useState<string | null>(null);
  const form = useForm({ resolver: zodResolver(PasswordResetRequestSchema), defaultValues: { email: "" } });

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      const { message } = await requestReset.mutateAsync(values);
      setSent(message);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["email"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {sent && <FormAlert tone="good">{sent}</FormAlert>}
      {formError && <FormAlert>{formError}</FormAlert>}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        hint="We send a link that works once, for an hour."
        error={form.formState.errors.email?.message}
        {...form.register("email")}
      />
      <Button type="submit" size="lg" className="w-full" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? "Sending…" : "Send the reset link"}
      </Button>
      <Link
        to={paths.signIn.getHref()}
        className="inline-flex min-h-touch items-center text-sm font-medium text-accent underline underline-offset-4"
      >
        Back to sign-in
      </Link>
    </form>
  );
}
