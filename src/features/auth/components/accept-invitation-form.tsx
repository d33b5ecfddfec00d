import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { useNavigate } from "react-router-dom";
import { PASSWORD_MIN_LENGTH, ROLE_LABELS } from "@shared/schemas/auth.ts";
import { AcceptInvitationSchema, type InvitationPreview } from "@shared/schemas/invitations.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, PasswordField, TextField } from "@/components/ui/field/field.tsx";
import { paths } from "@/config/paths.ts";
import { useAcceptInvitation } from "@/lib/api/invitations.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";

const AcceptFormSchema = AcceptInvitationSchema.omit({ token: true });

export function AcceptInvitationForm({ token, preview }: { token: string; preview: InvitationPreview }) {
  const navigate = useNavigate();
  const accept = useAcceptInvitation();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm({ resolver: zodResolver(AcceptFormSchema), defaultValues: { name: "", password: "" } });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await accept.mutateAsync({ token, ...values });
      void navigate(paths.home.getHref(), { replace: true });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["name", "password"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <p>
        You are joining <strong>{preview.organisationName}</strong> as{" "}
        <strong>{ROLE_LABELS[preview.role].toLowerCase()}</strong>.
      </p>
      {formError && <FormAlert>{formError}</FormAlert>}
      <TextField
        label="E-mail"
        type="email"
        value={preview.email}
        readOnly
        autoComplete="username"
        hint="The address the invitation was sent to."
      />
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <PasswordField
        label="Choose a password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        error={errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" size="lg" className="w-full" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? "Joining…" : `Join ${preview.organisationName}`}
      </Button>
    </form>
  );
}
