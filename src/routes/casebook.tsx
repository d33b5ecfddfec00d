import { Plus, Users } from "lucide-react";
import { Link } from "react-router-dom";
import { canCasebook } from "@shared/schemas/casebook.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { buttonVariants } from "@/components/ui/button/button.tsx";
import { paths } from "@/config/paths.ts";
import { CaseList } from "@/features/casebook/components/case-list.tsx";
import { GeneratorForm } from "@/features/casebook/components/generator-form.tsx";
import { ProgressPanel } from "@/features/casebook/components/progress-panel.tsx";
import { useMe } from "@/lib/api/auth.ts";
import { useCases, useProgress } from "@/lib/api/casebook.ts";

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

export default function CasebookRoute() {
  const me = useMe();
  const cases = useCases();
  const progress = useProgress();
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
      <PanelBoundary>
        {progress.isPending ? (
          <Loading what="your progress" />
        ) : progress.isError ? (
          <Failed message={progress.error.message} />
        ) : (
          <ProgressPanel progress={progress.data} />
        )}
      </PanelBoundary>
      <PanelBoundary>
        <GeneratorForm />
      </PanelBoundary>
      <PanelBoundary>
        {cases.isPending ? (
          <Loading what="the cases" />
        ) : cases.isError ? (
          <Failed message={cases.error.message} />
        ) : (
          <CaseList cases={cases.data} />
        )}
      </PanelBoundary>
    </div>
  );
}
