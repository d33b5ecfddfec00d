import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import type { AuthUser } from "@shared/schemas/auth.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { InviteMemberForm } from "@/features/members/components/invite-member-form.tsx";
import { MembersTable } from "@/features/members/components/members-table.tsx";
import { PendingInvitations } from "@/features/members/components/pending-invitations.tsx";
import { meQueryOptions, useMe } from "@/lib/api/auth.ts";
import { invitationsQueryOptions, useInvitations } from "@/lib/api/invitations.ts";
import { membersQueryOptions } from "@/lib/api/members.ts";
import { loadQuery } from "@/lib/api/screen-data.ts";

/** The company's members before the screen renders; an owner's pending invitations are started too. */
export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await loadQuery(queryClient, meQueryOptions());
  if (me?.role === "owner") void loadQuery(queryClient, invitationsQueryOptions());
  await loadQuery(queryClient, membersQueryOptions());
  return null;
};

function Members({ viewer }: { viewer: AuthUser }) {
  return <MembersTable members={useSuspenseQuery(membersQueryOptions()).data} viewer={viewer} />;
}

export default function MembersRoute() {
  const me = useMe();
  const isOwner = me.data?.role === "owner";
  // An owner's panel below the list, drawn once it is there (it has no loading line of its own).
  const invitations = useInvitations(isOwner);
  return (
    <div className="space-y-8">
      <header>
        <h1 className="text-3xl font-semibold">Members</h1>
        <p className="mt-1 text-muted">
          {isOwner
            ? "Invite people, set their roles, and remove those who have left."
            : "Everyone in your company and their role. Owners manage this list."}
        </p>
      </header>
      <ScreenBoundary
        pending={<p>Loading members…</p>}
        failed={(error) => (
          <p role="alert" className="font-medium text-fault">
            ⚠ {error.message}
          </p>
        )}
      >
        {me.data && <Members viewer={me.data} />}
      </ScreenBoundary>
      {isOwner && (
        <>
          <PanelBoundary>
            <section className="rounded-card border-2 border-rule bg-surface p-4">
              <InviteMemberForm />
            </section>
          </PanelBoundary>
          <PanelBoundary>
            {invitations.isSuccess && <PendingInvitations invitations={invitations.data} />}
          </PanelBoundary>
        </>
      )}
    </div>
  );
}
