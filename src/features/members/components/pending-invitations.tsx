import { ROLE_LABELS } from "@shared/schemas/auth.ts";
import type { Invitation } from "@shared/schemas/invitations.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { useRevokeInvitation } from "@/lib/api/invitations.ts";
import { formatDate } from "@shared/format/date-time.ts";

export function PendingInvitations({ invitations }: { invitations: Invitation[] }) {
  const revoke = useRevokeInvitation();
  return (
    <section aria-labelledby="pending-heading" className="space-y-2">
      <h2 id="pending-heading" className="text-xl font-semibold">
        Waiting to join
      </h2>
      {invitations.length === 0 ? (
        <p className="text-muted">No open invitations.</p>
      ) : (
        <ul className="divide-y divide-rule rounded-card border-2 border-rule bg-surface">
          {invitations.map((invitation) => (
            <li key={invitation.id} className="flex flex-wrap items-center justify-between gap-2 p-3">
              <div className="min-w-0">
                <div className="break-all font-medium">{invitation.email}</div>
                <div className="text-sm text-muted">
                  {ROLE_LABELS[invitation.role]} · link valid until{" "}
                  <span className="num">{formatDate(invitation.expiresAt)}</span>
                </div>
              </div>
              <Button
                variant="secondary"
                disabled={revoke.isPending}
                onClick={() => revoke.mutate(invitation.id)}
                aria-label={`Withdraw the invitation to ${invitation.email}`}
              >
                Withdraw
              </Button>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
