import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { InviteMemberForm } from "@/features/members/components/invite-member-form.tsx";
import { MembersTable } from "@/features/members/components/members-table.tsx";
import { PendingInvitations } from "@/features/members/components/pending-invitations.tsx";
import { useMe } from "@/lib/api/auth.ts";
import { useInvitations } from "@/lib/api/invitations.ts";
import { useMembers } from "@/lib/api/members.ts";

export default function MembersRoute() {
  const me = useMe();
  const members = useMembers();
  const isOwner = me.data?.role === "owner";
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
      <PanelBoundary>
        {members.isPending && <p>Loading members…</p>}
        {members.isError && (
          <p role="alert" className="font-medium text-fault">
            ⚠ {members.error.message}
          </p>
        )}
        {members.isSuccess && me.data && <MembersTable members={members.data} viewer={me.data} />}
      </PanelBoundary>
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
