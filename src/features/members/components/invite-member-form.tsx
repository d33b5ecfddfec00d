import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { ROLE_LABELS, ROLES } from "@shared/schemas/auth.ts";
import { CreateInvitationSchema, INVITATION_VALID_DAYS } from "@shared/schemas/invitations.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { FormAlert, SelectField, TextField } from "@/components/ui/field/field.tsx";
import { useCreateInvitation } from "@/lib/api/invitations.ts";
import { applyServerErrors } from "@/lib/form-errors.ts";

export function InviteMemberForm() {
  const create = useCreateInvitation();
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useForm({
    resolver: zodResolver(CreateInvitationSchema),
    defaultValues: { email: "", role: "technician" as const },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    setSentTo(null);
    try {
      const invitation = await create.mutateAsync(values);
      setSentTo(invitation.email);
      form.reset({ email: "", role: values.role });
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, ["email", "role"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-labelledby="invite-heading">
      <h2 id="invite-heading" className="text-xl font-semibold">
        Invite someone
      </h2>
      {sentTo && (
        <FormAlert tone="good">
          Invitation sent to {sentTo}. The link works for {INVITATION_VALID_DAYS} days.
        </FormAlert>
      )}
      {formError && <FormAlert>{formError}</FormAlert>}
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr]">
        <TextField
          label="Their e-mail"
          type="email"
          autoComplete="off"
          inputMode="email"
          error={errors.email?.message}
          {...form.register("email")}
        />
        <SelectField label="Role" error={errors.role?.message} {...form.register("role")}>
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {ROLE_LABELS[role]}
            </option>
          ))}
        </SelectField>
      </div>
      <Button type="submit" disabled={form.formState.isSubmitting}>
        {form.formState.isSubmitting ? "Sending…" : "Send invitation"}
      </Button>
    </form>
  );
}
