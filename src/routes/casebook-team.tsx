import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import { Link } from "react-router-dom";
import { canCasebook } from "@shared/schemas/casebook-permissions.ts";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { paths } from "@/config/paths.ts";
import { TeamProgressList } from "@/features/casebook/components/team-progress.tsx";
import { meQueryOptions, useMe } from "@/lib/api/auth.ts";
import { teamProgressQueryOptions } from "@/lib/api/casebook.ts";
import { loadQuery } from "@/lib/api/screen-data.ts";

/** The team's progress before the screen renders, for those who may see it. */
export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await loadQuery(queryClient, meQueryOptions());
  if (me && canCasebook(me.role, "seeTeamProgress")) await loadQuery(queryClient, teamProgressQueryOptions());
  return null;
};

function Team() {
  return <TeamProgressList team={useSuspenseQuery(teamProgressQueryOptions()).data} />;
}

export default function CasebookTeamRoute() {
  const me = useMe();
  const allowed = me.data ? canCasebook(me.data.role, "seeTeamProgress") : false;
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
      {allowed && (
        <ScreenBoundary
          pending={<p aria-busy="true">Loading…</p>}
          failed={(error) => (
            <p role="alert" className="font-medium text-fault">
              ⚠ {error.message}
            </p>
          )}
        >
          <Team />
        </ScreenBoundary>
      )}
    </div>
  );
}
