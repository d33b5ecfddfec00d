import { ROLE_LABELS } from "@shared/schemas/auth.ts";
import type { TeamProgress } from "@shared/schemas/casebook.ts";
import { ProgressPanel } from "./progress-panel.tsx";
import { formatDateTime } from "@shared/format/date-time.ts";

/** Every apprentice's progress (and anyone else who practises), one panel per person. */
export function TeamProgressList({ team }: { team: TeamProgress }) {
  if (team.people.length === 0) return <p className="text-muted">No apprentices in your company yet.</p>;
  return (
    <ul className="space-y-4">
      {team.people.map(({ user, progress, lastAttemptAt }) => (
        <li key={user.id} className="space-y-1">
          <p className="text-sm text-muted">
            {ROLE_LABELS[user.role]}
            {lastAttemptAt ? ` · last attempt ${formatDateTime(lastAttemptAt)}` : " · no attempts yet"}
          </p>
          <ProgressPanel progress={progress} title={user.name} />
        </li>
      ))}
    </ul>
  );
}
