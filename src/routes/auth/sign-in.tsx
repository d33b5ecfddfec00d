import { SignInForm } from "@/features/auth/components/sign-in-form.tsx";

export { redirectIfSignedInLoader as clientLoader } from "@/features/auth/utils/session-loaders.ts";

export default function SignInRoute() {
  return (
    <div className="space-y-4">
      <h1 className="text-3xl font-semibold">Sign in</h1>
      <SignInForm />
    </div>
  );
}
