import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Link } from "react-router-dom";
import { PASSWORD_MIN_LENGTH, PasswordResetConfirmSchema } from "@shared/schemas/auth.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, PasswordField } from "@/components/ui/field/field.tsx";
import { paths } from "@/config/paths.ts";
import { useConfirmPasswordReset } from "@/lib/api/auth.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";

const NewPasswordFormSchema = PasswordResetConfirmSchema.pick({ password: true });

export function ResetPasswordForm({ token }: { token: string }) {
  const confirm = useConfirmPasswordReset();
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const form = useForm({ resolver: zodResolver(NewPasswordFormSchema), defaultValues: { password: "" } });

  const onSubmit = form.handleSubmit(async ({ password }) => {
    setFormError(null);
    try {
      await confirm.mutateAsync({ token, password });
      setDone(true);
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["password"]));
    }
  });

  if (done) {
    return (
      <div className="space-y-4">
        <FormAlert tone="good">
          Your password is changed. Every device that was signed in has been signed out.
        </FormAlert>
        <Link
          to={paths.signIn.getHref()}
          className="inline-flex min-h-touch w-full items-center justify-center rounded-card bg-accent px-4 font-medium text-accent-ink"
        >
          Sign in
        </Link>
      </div>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError && (
        <FormAlert>
          {formError}{" "}
          <Link to={paths.forgotPassword.getHref()} className="underline underline-offset-4">
            Ask for a new link
          </Link>
        </FormAlert>
      )}
      <PasswordField
        label="New password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        error={form.formState.errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" size="lg" className="w-full" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? "Saving…" : "Set the new password"}
      </Button>
    </form>
  );
}
