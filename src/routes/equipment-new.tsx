import { Link, useNavigate } from "react-router-dom";
import { can } from "@shared/schemas/auth.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { paths } from "@/config/paths.ts";
import { EquipmentForm } from "@/features/equipment/components/equipment-form.tsx";
import { useMe } from "@/lib/api/auth.ts";

export default function EquipmentNewRoute() {
  const me = useMe();
  const navigate = useNavigate();
  const mayWrite = me.data ? can(me.data.role, "writeRecords") : false;
  return (
    <div className="space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to={paths.equipment.getHref()} className="text-accent underline underline-offset-4">
          Equipment
        </Link>{" "}
        / New unit
      </nav>
      <header>
        <h1 className="text-3xl font-semibold">Add equipment</h1>
        <p className="mt-1 max-w-prose text-muted">
          Copy it from the nameplate. The refrigerant, circuits and metering devices drive every calculation on its
          visits; the rest can be added when you know it.
        </p>
      </header>
      {me.isSuccess && !mayWrite ? (
        <p role="alert" className="rounded-card border-2 border-rule bg-surface p-4">
          Apprentices can read equipment but not add it. Ask a technician or the owner.
        </p>
      ) : (
        <PanelBoundary>
          <EquipmentForm onCreated={(unit) => void navigate(paths.equipment.detail.getHref(unit.id))} />
        </PanelBoundary>
      )}
    </div>
  );
}
