import { Link, useSearchParams } from "react-router-dom";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { paths } from "@/config/paths.ts";
import { AcceptInvitationForm } from "@/features/auth/components/accept-invitation-form.tsx";
import { useInvitationPreview } from "@/lib/api/invitations.ts";

export default function AcceptInvitationRoute() {
  const [params] = useSearchParams();
  const token = params.get("token") ?? "";
  const preview = useInvitationPreview(token);
  return (
    <div className="space-y-4">
      <h1 className="text-3xl font-semibold">Join your team on Satura</h1>
      {!token && <FormAlert>This invitation link is incomplete. Open the link from the e-mail again.</FormAlert>}
      {token && preview.isPending && <p>Checking the invitation…</p>}
      {preview.isError && (
        <FormAlert>
          {preview.error.message}{" "}
          <Link to={paths.signIn.getHref()} className="underline underline-offset-4">
            Go to sign-in
          </Link>
        </FormAlert>
      )}
      {preview.isSuccess && <AcceptInvitationForm token={token} preview={preview.data} />}
    </div>
  );
}
