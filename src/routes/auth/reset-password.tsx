import { Link, useSearchParams } from "react-router-dom";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { paths } from "@/config/paths.ts";
import { ResetPasswordForm } from "@/features/auth/components/reset-password-form.tsx";

export default function ResetPasswordRoute() {
  const [params] = useSearchParams();
  const token = params.get("token") ?? "";
  return (
    <div className="space-y-4">
      <h1 className="text-3xl font-semibold">Choose a new password</h1>
      {token ? (
        <ResetPasswordForm token={token} />
      ) : (
        <FormAlert>
          This link is incomplete. Open the link from the e-mail again, or{" "}
          <Link to={paths.forgotPassword.getHref()} className="underline underline-offset-4">
            ask for a new one
          </Link>
          .
        </FormAlert>
      )}
    </div>
  );
}
