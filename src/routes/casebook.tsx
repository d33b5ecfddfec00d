import { Plus, Users } from "lucide-react";
import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import type { ReactNode } from "react";
import { Link } from "react-router-dom";
import { canCasebook } from "@shared/schemas/casebook-permissions.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { buttonVariants } from "@/components/ui/button/button.tsx";
import { paths } from "@/config/paths.ts";
import { CaseList } from "@/features/casebook/components/case-list.tsx";
import { GeneratorForm } from "@/features/casebook/components/generator-form.tsx";
import { ProgressPanel } from "@/features/casebook/components/progress-panel.tsx";
import { useMe } from "@/lib/api/auth.ts";
import { casesQueryOptions, progressQueryOptions } from "@/lib/api/casebook.ts";
import { loadQuery } from "@/lib/api/screen-data.ts";

function Loading({ what }: { what: string }) {
  return (
    <p role="status" className="rounded-card border-2 border-rule bg-surface p-6 text-center text-muted">
      Loading {what}…
    </p>
  );
}

function Failed({ message }: { message: string }) {
  return (
    <p role="alert" className="rounded-card border-2 border-fault bg-surface p-4 font-medium text-fault">
      ⚠ {message}
    </p>
  );
}

/** The person's progress and the case library before the screen renders. */
export const clientLoader = (queryClient: QueryClient) => async () => {
  await Promise.all([loadQuery(queryClient, progressQueryOptions()), loadQuery(queryClient, casesQueryOptions())]);
  return null;
};

/** One panel of the screen: its loading line and its failure, each in the panel's place. */
function Panel({ what, children }: { what: string; children: ReactNode }) {
  return (
    <ScreenBoundary pending={<Loading what={what} />} failed={(error) => <Failed message={error.message} />}>
      {children}
    </ScreenBoundary>
  );
}

function Progress() {
  return <ProgressPanel progress={useSuspenseQuery(progressQueryOptions()).data} />;
}

function Cases() {
  return <CaseList cases={useSuspenseQuery(casesQueryOptions()).data} />;
}

export default function CasebookRoute() {
  const me = useMe();
  const role = me.data?.role;
  const author = role ? canCasebook(role, "author") : false;
  return (
    <div className="space-y-6">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-3xl font-semibold">Casebook</h1>
          <p className="mt-1 max-w-prose text-muted">
            Worked cases to practise on: read the story and the gauges, work out saturation, superheat and subcooling,
            name the charge state — then compare your working with the correct one.
          </p>
        </div>
        {author && (
          <div className="flex flex-wrap gap-2">
            <Link to={paths.casebook.team.getHref()} className={buttonVariants({ variant: "secondary" })}>
              <Users aria-hidden className="size-5" /> Team progress
            </Link>
            <Link to={paths.casebook.new.getHref()} className={buttonVariants()}>
              <Plus aria-hidden className="size-5" /> New case
            </Link>
          </div>
        )}
      </header>
      <Panel what="your progress">
        <Progress />
      </Panel>
      <PanelBoundary>
        <GeneratorForm />
      </PanelBoundary>
      <Panel what="the cases">
        <Cases />
      </Panel>
    </div>
  );
}
