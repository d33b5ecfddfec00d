import { ForgotPasswordForm } from "@/features/auth/components/forgot-password-form.tsx";

export default function ForgotPasswordRoute() {
  return (
    <div className="space-y-4">
      <h1 className="text-3xl font-semibold">Reset your password</h1>
      <p className="text-muted">Enter the e-mail address you sign in with.</p>
      <ForgotPasswordForm />
    </div>
  );
}
