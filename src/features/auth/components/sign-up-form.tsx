import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Link, useNavigate } from "react-router-dom";
import { PASSWORD_MIN_LENGTH, SignUpSchema } from "@shared/schemas/auth.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, PasswordField, TextField } from "@/components/ui/field/field.tsx";
import { paths } from "@/config/paths.ts";
import { useSignUp } from "@/lib/api/auth.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";

export function SignUpForm() {
  const navigate = useNavigate();
  const signUp = useSignUp();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm({
    resolver: zodResolver(SignUpSchema),
    defaultValues: { organisationName: "", name: "", email: "", password: "" },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await signUp.mutateAsync(values);
      void navigate(paths.home.getHref(), { replace: true });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["organisationName", "name", "email", "password"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError && <FormAlert>{formError}</FormAlert>}
      <TextField
        label="Company name"
        autoComplete="organization"
        error={errors.organisationName?.message}
        {...form.register("organisationName")}
      />
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        error={errors.email?.message}
        {...form.register("email")}
      />
      <PasswordField
        label="Password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. A few unrelated words make a strong one.`}
        error={errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" size="lg" className="w-full" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? "Creating…" : "Create the company account"}
      </Button>
      <p className="text-sm">
        Already have an account?{" "}
        <Link
          to={paths.signIn.getHref()}
          className="inline-flex min-h-touch items-center font-medium text-accent underline underline-offset-4"
        >
          Sign in
        </Link>
      </p>
    </form>
  );
}
