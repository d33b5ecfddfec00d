import { CheckCheck, Pencil } from "lucide-react";
import { useState } from "react";
import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import { Link, useParams, type LoaderFunctionArgs } from "react-router-dom";
import { diagnose, workedSolution } from "@shared/engine/index.ts";
import { DIFFICULTY_LABELS, type Attempt } from "@shared/schemas/casebook.ts";
import { canCasebook } from "@shared/schemas/casebook-permissions.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { ScreenFailed } from "@/components/errors/screen-failed.tsx";
import { Button, buttonVariants } from "@/components/ui/button/button.tsx";
import { FormAlert } from "@/components/ui/field/field.tsx";
import { ChargeStateBadge } from "@/components/ui/state/charge-state-badge.tsx";
import { paths } from "@/config/paths.ts";
import { AttemptForm } from "@/features/casebook/components/attempt-form.tsx";
import { AttemptResult } from "@/features/casebook/components/attempt-result.tsx";
import { ChargeToAddPreview } from "@/features/casebook/components/charge-to-add-result.tsx";
import { CaseStory } from "@/features/casebook/components/case-story.tsx";
import { WorkedSteps } from "@/features/casebook/components/worked-steps.tsx";
import { MeasuredCyclePanel } from "@/features/run-log/components/measured-cycle-panel.tsx";
import { useMe } from "@/lib/api/auth.ts";
import { caseQueryOptions, loadCaseScreen, useCreateAttempt, usePublishCase } from "@/lib/api/casebook.ts";
import { useDisplayUnits } from "@/lib/units/use-display-units.ts";
import { StaleWriteNotice } from "@/components/ui/stale-write/stale-write-notice.tsx";
import { ApiError } from "@/lib/api/api-client.ts";

const SOURCE_WORDS = {
  "built-in": "Satura library — shared by every company, read-only",
  organisation: "Your company's case",
  generated: "Generated practice case",
} as const;

/** The case and its refrigerant's table before the screen renders. */
export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    loadCaseScreen(queryClient, params.caseId);

export default function CasebookCaseRoute() {
  const { caseId = "" } = useParams();
  return (
    <ScreenBoundary
      key={caseId}
      pending={<p aria-busy="true">Loading the case…</p>}
      failed={(error, retry) => (
        <ScreenFailed
          title="This case could not be opened"
          error={error}
          retry={retry}
          back={{ to: paths.casebook.getHref(), label: "Back to the casebook" }}
        />
      )}
    >
      <CaseScreen caseId={caseId} />
    </ScreenBoundary>
  );
}

function CaseScreen({ caseId }: { caseId: string }) {
  const item = useSuspenseQuery(caseQueryOptions(caseId));
  const me = useMe();
  const { units, atmosphericKPa } = useDisplayUnits();
  const attempt = useCreateAttempt();
  const publish = usePublishCase();
  const [result, setResult] = useState<Attempt | null>(null);

  const data = item.data;
  const author = me.data ? canCasebook(me.data.role, "author") : false;

  return (
    <div className="space-y-5">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to={paths.casebook.getHref()} className="text-accent underline underline-offset-4">
          Casebook
        </Link>
      </nav>
      <header className="space-y-1">
        <h1 className="text-2xl font-semibold">{data.title}</h1>
        <p className="text-muted">
          {DIFFICULTY_LABELS[data.difficulty]} · {SOURCE_WORDS[data.source]}
          {data.status === "draft" && " · draft, not yet visible to apprentices"}
          {data.authorName && ` · written by ${data.authorName}`}
        </p>
      </header>

      {author && data.expected && (
        <section aria-labelledby="author-heading" className="space-y-3 rounded-card border-2 border-ink bg-surface p-4">
          <h2 id="author-heading" className="text-xl font-semibold">
            Author's preview
          </h2>
          <p className="flex flex-wrap items-center gap-2">
            Expected verdict: <ChargeStateBadge state={data.expected.chargeState} />
          </p>
          {data.chargeQuestion && <ChargeToAddPreview expected={data.expected} />}
          {data.editable && (
            <div className="flex flex-wrap gap-2">
              <Link to={paths.casebook.edit.getHref(data.id)} className={buttonVariants({ variant: "secondary" })}>
                <Pencil aria-hidden className="size-5" /> Edit
              </Link>
              {data.status === "draft" && (
                <Button
                  disabled={publish.isPending}
                  onClick={() => publish.mutate({ id: data.id, version: data.version ?? 0 })}
                >
                  <CheckCheck aria-hidden className="size-5" /> Publish to your company
                </Button>
              )}
            </div>
          )}
          {publish.isError &&
            (publish.error instanceof ApiError && publish.error.isStale ? (
              <StaleWriteNotice
                message={publish.error.message}
                onReload={() => void item.refetch().then(() => publish.reset())}
                reloading={item.isFetching}
              />
            ) : (
              <FormAlert>{publish.error.message}</FormAlert>
            ))}
          {publish.isSuccess && (
            <FormAlert tone="good">Published: apprentices in your company can now attempt it.</FormAlert>
          )}
          <details>
            <summary className="min-h-touch cursor-pointer py-2 font-medium">Show the working</summary>
            <WorkedSteps steps={workedSolution(data.input, diagnose(data.input), data.reasoning)} units={units} />
          </details>
        </section>
      )}

      <PanelBoundary>
        <CaseStory item={data} units={units} atmosphericKPa={atmosphericKPa} />
      </PanelBoundary>

      {data.cycleQuestions.length > 0 && (
        <MeasuredCyclePanel mode={result ? "report" : "quiz"} input={data.input} previousInput={null} units={units} />
      )}

      {result ? (
        <>
          <AttemptResult attempt={result} units={units} chargeKg={data.input.chargeKg} />
          <Button variant="secondary" onClick={() => setResult(null)}>
            Try this case again
          </Button>
        </>
      ) : (
        <AttemptForm
          units={units}
          atmosphericKPa={data.input.atmosphericPressureKPa ?? atmosphericKPa}
          pending={attempt.isPending}
          serverError={attempt.isError ? attempt.error.message : null}
          onSubmit={(answers) => attempt.mutate({ caseId: data.id, answers }, { onSuccess: setResult })}
          cycleQuestions={data.cycleQuestions}
          chargeQuestion={data.chargeQuestion}
        />
      )}
    </div>
  );
}
