import { SignUpForm } from "@/features/auth/components/sign-up-form.tsx";

export { redirectIfSignedInLoader as clientLoader } from "@/features/auth/utils/session-loaders.ts";

export default function SignUpRoute() {
  return (
    <div className="space-y-4">
      <h1 className="text-3xl font-semibold">Create a company account</h1>
      <p className="text-muted">
        For a service company starting on Satura. You become its owner and invite your people afterwards.
      </p>
      <SignUpForm />
    </div>
  );
}
