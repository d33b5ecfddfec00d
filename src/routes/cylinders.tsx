import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import { Link } from "react-router-dom";
import { can } from "@shared/schemas/auth.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { CautionPanel } from "@/components/ui/caution-panel/caution-panel.tsx";
import { paths } from "@/config/paths.ts";
import { CylinderForm } from "@/features/register/components/cylinder-form.tsx";
import { CylinderList } from "@/features/register/components/cylinder-list.tsx";
import { useMe } from "@/lib/api/auth.ts";
import { cylindersQueryOptions } from "@/lib/api/register.ts";
import { loadQuery } from "@/lib/api/screen-data.ts";

/** The company's cylinders before the screen renders. */
export const clientLoader = (queryClient: QueryClient) => () => loadQuery(queryClient, cylindersQueryOptions());

function Cylinders({ canWrite }: { canWrite: boolean }) {
  const cylinders = useSuspenseQuery(cylindersQueryOptions());
  return <CylinderList cylinders={cylinders.data} canWrite={canWrite} />;
}

export default function CylindersRoute() {
  const me = useMe();
  const canWrite = me.data ? can(me.data.role, "writeRecords") : false;
  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <h1 className="text-3xl font-semibold">Cylinders</h1>
        <p className="text-muted">
          Contents follow the refrigerant register; recovery cylinders are checked against 80 % of their liquid
          capacity.
        </p>
        {canWrite && (
          <Link
            to={paths.register.getHref()}
            className="inline-flex min-h-touch items-center font-medium text-accent underline underline-offset-4"
          >
            Open the refrigerant register and its CSV export
          </Link>
        )}
      </header>
      <CautionPanel topic="recovery-cylinder" />
      <PanelBoundary>
        <ScreenBoundary
          pending={<p aria-busy="true">Loading the cylinders…</p>}
          failed={(error) => (
            <p role="alert" className="font-medium text-fault">
              ⚠ The cylinders did not load: {error.message}
            </p>
          )}
        >
          <Cylinders canWrite={canWrite} />
        </ScreenBoundary>
      </PanelBoundary>
      {canWrite && (
        <section
          aria-labelledby="add-cylinder-heading"
          className="space-y-3 rounded-card border-2 border-accent bg-surface p-4"
        >
          <h2 id="add-cylinder-heading" className="text-xl font-semibold">
            Add a cylinder
          </h2>
          <CylinderForm />
        </section>
      )}
    </div>
  );
}
