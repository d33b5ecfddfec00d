import { LogOut } from "lucide-react";
import { useNavigate } from "react-router-dom";
import { ROLE_LABELS } from "@shared/schemas/auth.ts";
import { paths } from "@/config/paths.ts";
import { useMe, useSignOut } from "@/lib/api/auth.ts";
import { cn } from "@/lib/cn.ts";
import { clearAllDrafts, countDrafts } from "@/lib/drafts/draft-store.ts";
import { useOutboxEntries } from "@/features/offline/use-outbox.ts";

/** Who is signed in (name and role, in words) and the sign-out button. */
export function UserMenu({ compact = false, className }: { compact?: boolean; className?: string }) {
  const me = useMe();
  const signOut = useSignOut();
  const navigate = useNavigate();
  const outboxEntries = useOutboxEntries();
  const user = me.data;
  if (!user) return null;

  const onSignOut = () => {
    // Unsaved values are kept on this device per form; signing out would hand them to the next
    // person on a shared tablet, so it asks first and then clears them.
    const drafts = countDrafts();
    if (
      drafts > 0 &&
      !window.confirm(
        `${drafts === 1 ? "One form holds" : `${drafts} forms hold`} values that are not saved yet. Sign out and discard them?`,
      )
    )
      return;
    // Entries in the outbox are kept for this person (never sent or shown for anyone else), but
    // they reach the server only once this person signs in again on this device: say so.
    const unsent = outboxEntries.length;
    if (
      unsent > 0 &&
      !window.confirm(
        `${unsent === 1 ? "One entry has" : `${unsent} entries have`} not reached the server yet. They stay on this device and are sent when you sign in here again. Sign out now?`,
      )
    )
      return;
    signOut.mutate(undefined, {
      onSuccess: () => clearAllDrafts(),
      onSettled: () => void navigate(paths.signIn.getHref(), { replace: true }),
    });
  };

  return (
    <div className={cn(compact ? "flex items-center" : "space-y-2", className)}>
      <div className={cn("min-w-0 leading-tight", compact && "sr-only")} data-testid="signed-in-user">
        <div className="break-words font-medium">{user.name}</div>
        <div className="truncate text-sm text-muted">{ROLE_LABELS[user.role]}</div>
      </div>
      <button
        type="button"
        onClick={onSignOut}
        disabled={signOut.isPending}
        className={cn(
          "inline-flex min-h-touch min-w-touch items-center justify-center gap-2 rounded-card border-2 border-rule bg-surface px-3 font-medium hover:border-ink",
          !compact && "w-full",
        )}
      >
        <LogOut aria-hidden className="size-5" />
        <span className={cn(compact && "sr-only")}>Sign out</span>
      </button>
    </div>
  );
}
