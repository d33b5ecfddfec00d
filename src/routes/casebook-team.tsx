import { Link } from "react-router-dom";
import { canCasebook } from "@shared/schemas/casebook.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { paths } from "@/config/paths.ts";
import { TeamProgressList } from "@/features/casebook/components/team-progress.tsx";
import { useMe } from "@/lib/api/auth.ts";
import { useTeamProgress } from "@/lib/api/casebook.ts";

export default function CasebookTeamRoute() {
  const me = useMe();
  const allowed = me.data ? canCasebook(me.data.role, "seeTeamProgress") : false;
  const team = useTeamProgress(allowed);
  return (
    <div className="space-y-5">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to={paths.casebook.getHref()} className="text-accent underline underline-offset-4">
          Casebook
        </Link>
      </nav>
      <header>
        <h1 className="text-2xl font-semibold">Team progress</h1>
        <p className="mt-1 text-muted">Every apprentice in your company, by charge state and refrigerant.</p>
      </header>
      {me.data && !allowed && <p role="alert">Only seniors and owners see the team's progress.</p>}
      <PanelBoundary>
        {allowed && team.isPending && <p aria-busy="true">Loading…</p>}
        {team.isError && (
          <p role="alert" className="font-medium text-fault">
            ⚠ {team.error.message}
          </p>
        )}
        {team.data && <TeamProgressList team={team.data} />}
      </PanelBoundary>
    </div>
  );
}
