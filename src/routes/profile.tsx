import { ProfileForm } from "@/features/profile/components/profile-form.tsx";
import { useProfile } from "@/lib/api/profile.ts";
import { ROLE_LABELS } from "@shared/schemas/auth.ts";

export default function ProfileRoute() {
  const profile = useProfile();
  return (
    <div className="space-y-6">
      <header>
        <h1 className="text-3xl font-semibold">Profile</h1>
        {profile.isSuccess && (
          <p className="mt-1 text-muted">
            <span className="break-all">{profile.data.user.email}</span> · {ROLE_LABELS[profile.data.user.role]} at{" "}
            {profile.data.organisationName}
          </p>
        )}
      </header>
      {profile.isPending && <p>Loading your settings…</p>}
      {profile.isError && (
        <p role="alert" className="font-medium text-fault">
          ⚠ {profile.error.message}
        </p>
      )}
      {profile.isSuccess && <ProfileForm profile={profile.data} />}
    </div>
  );
}
