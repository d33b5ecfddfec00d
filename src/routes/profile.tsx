import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import type { ReactNode } from "react";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { ProfileForm } from "@/features/profile/components/profile-form.tsx";
import { profileQueryOptions } from "@/lib/api/profile.ts";
import { loadQuery } from "@/lib/api/screen-data.ts";
import { ROLE_LABELS } from "@shared/schemas/auth.ts";

/** The person's profile before the screen renders. */
export const clientLoader = (queryClient: QueryClient) => () => loadQuery(queryClient, profileQueryOptions());

function Page({ who, children }: { who?: ReactNode; children: ReactNode }) {
  return (
    <div className="space-y-6">
      <header>
        <h1 className="text-3xl font-semibold">Profile</h1>
        {who && <p className="mt-1 text-muted">{who}</p>}
      </header>
      {children}
    </div>
  );
}

function Profile() {
  const profile = useSuspenseQuery(profileQueryOptions()).data;
  return (
    <Page
      who={
        <>
          <span className="break-all">{profile.user.email}</span> · {ROLE_LABELS[profile.user.role]} at{" "}
          {profile.organisationName}
        </>
      }
    >
      <ProfileForm profile={profile} />
    </Page>
  );
}

export default function ProfileRoute() {
  return (
    <ScreenBoundary
      pending={
        <Page>
          <p>Loading your settings…</p>
        </Page>
      }
      failed={(error) => (
        <Page>
          <p role="alert" className="font-medium text-fault">
            ⚠ {error.message}
          </p>
        </Page>
      )}
    >
      <Profile />
    </ScreenBoundary>
  );
}
