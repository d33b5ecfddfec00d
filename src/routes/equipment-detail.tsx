import { MapPin } from "lucide-react";
import { useSuspenseQuery, type QueryClient } from "@tanstack/react-query";
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from "react-router-dom";
import { can } from "@shared/schemas/auth.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { ScreenBoundary } from "@/components/errors/screen-boundary.tsx";
import { Button } from "@/components/ui/button/button.tsx";
import { paths } from "@/config/paths.ts";
import { ChargeReferencePoints } from "@/features/equipment/components/charge-reference-points.tsx";
import { EquipmentNameplate } from "@/features/equipment/components/equipment-nameplate.tsx";
import { LastSettledReadings } from "@/features/equipment/components/last-settled-readings.tsx";
import { EquipmentRefrigerantHistory } from "@/features/register/components/equipment-refrigerant-history.tsx";
import { StartVisitForm } from "@/features/jobs/components/start-visit-form.tsx";
import { VisitList } from "@/features/jobs/components/visit-list.tsx";
import { ApiError } from "@/lib/api/api-client.ts";
import { useMe } from "@/lib/api/auth.ts";
import { chargeReferencesQueryOptions } from "@/lib/api/charge-references.ts";
import { equipmentDetailQueryOptions } from "@/lib/api/equipment.ts";
import { loadQuery } from "@/lib/api/screen-data.ts";
import { useDisplayUnits } from "@/lib/units/use-display-units.ts";

function Panel({ title, id, children }: { title: string; id: string; children: React.ReactNode }) {
  return (
    <section aria-labelledby={id} className="space-y-3">
      <h2 id={id} className="text-xl font-semibold">
        {title}
      </h2>
      <PanelBoundary>{children}</PanelBoundary>
    </section>
  );
}

/** The unit's detail before the screen renders; its charge references are started beside it. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const equipmentId = params.equipmentId ?? "";
    // A panel of its own below the nameplate (ChargeReferencePoints reads it): not waited for.
    void loadQuery(queryClient, chargeReferencesQueryOptions(equipmentId));
    await loadQuery(queryClient, equipmentDetailQueryOptions(equipmentId));
    return null;
  };

function Breadcrumb({ unitName }: { unitName?: string }) {
  return (
    <nav aria-label="Breadcrumb" className="text-sm">
      <Link to={paths.equipment.getHref()} className="text-accent underline underline-offset-4">
        Equipment
      </Link>
      {unitName && <> / {unitName}</>}
    </nav>
  );
}

export default function EquipmentDetailRoute() {
  const { equipmentId = "" } = useParams();
  return (
    <ScreenBoundary
      key={equipmentId}
      pending={
        <div className="space-y-4">
          <Breadcrumb />
          <p role="status" className="text-muted">
            Loading the unit…
          </p>
        </div>
      }
      failed={(error, retry) => {
        const missing = error instanceof ApiError && (error.status === 404 || error.status === 400);
        return (
          <div className="space-y-4">
            <Breadcrumb />
            <h1 className="text-2xl font-semibold">{missing ? "Unit not found" : "The unit did not load"}</h1>
            <p role="alert">
              {missing ? "No unit of your company lives at this address. It may have been removed." : error.message}
            </p>
            {!missing && (
              <Button variant="secondary" onClick={retry}>
                Try again
              </Button>
            )}
          </div>
        );
      }}
    >
      <EquipmentDetail equipmentId={equipmentId} />
    </ScreenBoundary>
  );
}

function EquipmentDetail({ equipmentId }: { equipmentId: string }) {
  const navigate = useNavigate();
  const me = useMe();
  const detail = useSuspenseQuery(equipmentDetailQueryOptions(equipmentId));
  const { units, atmosphericKPa } = useDisplayUnits();
  const mayWrite = me.data ? can(me.data.role, "writeRecords") : false;
  const mayCalibrate = me.data ? can(me.data.role, "setChargeReference") : false;
  const breadcrumb = <Breadcrumb unitName={detail.data.equipment.name} />;

  const { equipment, visits, lastSettled } = detail.data;
  return (
    <div className="space-y-8">
      {breadcrumb}
      <header className="space-y-1">
        <h1 className="text-3xl font-semibold">{equipment.name}</h1>
        <p className="text-muted">
          {equipment.kind.charAt(0).toUpperCase() + equipment.kind.slice(1)} · {equipment.siteName} ·{" "}
          {equipment.customerName}
        </p>
        {equipment.location && (
          <p className="flex items-center gap-1 text-muted">
            <MapPin aria-hidden className="size-4" /> {equipment.location}
          </p>
        )}
      </header>

      {mayWrite && (
        <section
          aria-labelledby="start-visit-heading"
          className="space-y-3 rounded-card border-2 border-accent bg-surface p-4"
        >
          <h2 id="start-visit-heading" className="text-xl font-semibold">
            Start a visit
          </h2>
          <StartVisitForm
            equipmentId={equipment.id}
            onStarted={(visit) => void navigate(paths.visits.detail.getHref(visit.id))}
          />
        </section>
      )}

      <Panel title="Last settled readings" id="settled-heading">
        <LastSettledReadings lastSettled={lastSettled} units={units} />
      </Panel>
      <Panel title="Charge reference points" id="charge-reference-heading">
        <ChargeReferencePoints equipmentId={equipment.id} visits={visits} units={units} canManage={mayCalibrate} />
      </Panel>
      <Panel title="Visits" id="visits-heading">
        <VisitList visits={visits} />
      </Panel>
      <Panel title="Refrigerant history" id="refrigerant-heading">
        <EquipmentRefrigerantHistory equipmentId={equipment.id} />
      </Panel>
      <section
        aria-labelledby="nameplate-heading"
        className="space-y-3 rounded-card border-2 border-rule bg-surface p-4"
      >
        <h2 id="nameplate-heading" className="text-xl font-semibold">
          Nameplate
        </h2>
        <PanelBoundary>
          <EquipmentNameplate equipment={equipment} units={units} atmosphericKPa={atmosphericKPa} />
        </PanelBoundary>
      </section>
    </div>
  );
}
