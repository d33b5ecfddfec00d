import { useState } from "react";
import { useSuspenseQuery, type QueryClient, type UseSuspenseQueryResult } from "@tanstack/react-query";
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from "react-router-dom";
import { type Case, type CaseDraft } from "@shared/schemas/casebook.ts";
import { canCasebook } from "@shared/schemas/casebook-permissions.ts";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { StaleWriteNotice } from "@/components/ui/stale-write/stale-write-notice.tsx";
import { paths } from "@/config/paths.ts";
import { CaseEditor } from "@/features/casebook/components/case-editor.tsx";
import { ApiError } from "@/lib/api/api-client.ts";
import { useMe } from "@/lib/api/auth.ts";
import { caseQueryOptions, loadCaseScreen, useCreateCase, useUpdateCase } from "@/lib/api/casebook.ts";
import { useDisplayUnits } from "@/lib/units/use-display-units.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

/** The case to edit (none for a new one) and its refrigerant's table before the editor renders. */
export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) =>
    loadCaseScreen(queryClient, params.caseId);

function CannotEdit({ message }: { message: string }) {
  return (
    <div role="alert" className="space-y-2">
      <h1 className="text-2xl font-semibold">This case cannot be edited</h1>
      <p>{message}</p>
      <Link to={paths.casebook.getHref()} className="font-medium text-accent underline underline-offset-4">
        Back to the casebook
      </Link>
    </div>
  );
}

/** New case (/casebook/new) or edit one of the company's own (/casebook/cases/:caseId/edit). */
export default function CasebookEditorRoute() {
  const { caseId } = useParams();
  const me = useMe();

  if (me.data && !canCasebook(me.data.role, "author")) {
    return (
      <div role="alert" className="space-y-2">
        <h1 className="text-2xl font-semibold">Only seniors and owners write cases</h1>
        <Link to={paths.casebook.getHref()} className="font-medium text-accent underline underline-offset-4">
          Back to the casebook
        </Link>
      </div>
    );
  }
  if (!caseId) return <EditorScreen />;
  return (
    <ScreenBoundary
      key={caseId}
      pending={<p aria-busy="true">Loading the case…</p>}
      failed={(error) => <CannotEdit message={error.message} />}
    >
      <ExistingCase caseId={caseId} />
    </ScreenBoundary>
  );
}

function ExistingCase({ caseId }: { caseId: string }) {
  const existing = useSuspenseQuery(caseQueryOptions(caseId));
  if (!existing.data.editable) {
    return <CannotEdit message="Built-in and generated cases are read-only. Write your own case instead." />;
  }
  return <EditorScreen existing={existing} />;
}

function EditorScreen({ existing }: { existing?: UseSuspenseQueryResult<Case> }) {
  const caseId = existing?.data.id;
  const navigate = useNavigate();
  const create = useCreateCase();
  const update = useUpdateCase();
  const { units, atmosphericKPa } = useDisplayUnits();
  const [stale, setStale] = useState<string | null>(null);

  const save = async (draft: CaseDraft) => {
    setStale(null);
    try {
      const saved = caseId
        ? await update.mutateAsync({ id: caseId, draft, version: existing?.data.version ?? 0 })
        : await create.mutateAsync(draft);
      void navigate(paths.casebook.case.getHref(saved.id));
    } catch (error) {
      // Someone saved the case after this editor opened it: keep the text in the form, offer the latest.
      if (error instanceof ApiError && error.isStale) return setStale(error.message);
      throw error;
    }
  };
  // The editor keeps everything typed; reloading fetches the saved version to compare against.
  const reload = async () => {
    const fetched = await existing?.refetch();
    setStale(
      `Loaded the version saved ${fetched?.data?.updatedAt ? formatDateTime(fetched.data.updatedAt) : "now"}. Your text is still in the form: open the saved case in a new tab to compare, then save to replace it with what you see here.`,
    );
  };

  return (
    <div className="space-y-5">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to={paths.casebook.getHref()} className="text-accent underline underline-offset-4">
          Casebook
        </Link>
      </nav>
      <header>
        <h1 className="text-2xl font-semibold">{caseId ? "Edit case" : "New case"}</h1>
        <p className="mt-1 max-w-prose text-muted">
          Write the story and the readings; the diagnosis engine works out the answers. Save it as a draft, check the
          preview, then publish it to your company. Leave customer names out.
        </p>
      </header>
      <CaseEditor
        key={caseId ?? "new"}
        item={existing?.data}
        units={units}
        atmosphericKPa={atmosphericKPa}
        pending={create.isPending || update.isPending}
        onSave={save}
        notice={
          stale &&
          caseId && (
            <div className="space-y-2">
              <StaleWriteNotice
                message={stale}
                onReload={() => void reload()}
                reloading={existing?.isFetching ?? false}
              />
              <a
                href={paths.casebook.case.getHref(caseId)}
                target="_blank"
                rel="noreferrer"
                className="font-medium text-accent underline underline-offset-4"
              >
                Open the saved case in a new tab
              </a>
            </div>
          )
        }
      />
    </div>
  );
}
