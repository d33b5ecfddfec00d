import { Plus } from "lucide-react";
import type { QueryClient } from "@tanstack/react-query";
import { Link } from "react-router-dom";
import { can } from "@shared/schemas/auth.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { buttonVariants } from "@/components/ui/button/button.tsx";
import { paths } from "@/config/paths.ts";
import { EquipmentTable, FIRST_EQUIPMENT_PAGE } from "@/features/equipment/components/equipment-table.tsx";
import { useMe } from "@/lib/api/auth.ts";
import { equipmentListQueryOptions } from "@/lib/api/equipment.ts";
import { loadQuery } from "@/lib/api/screen-data.ts";

function AddEquipmentLink() {
  return (
    <Link to={paths.equipment.new.getHref()} className={buttonVariants()}>
      <Plus aria-hidden className="size-5" /> Add equipment
    </Link>
  );
}

/** The table's first page (the table pages, searches and filters itself). */
export const clientLoader = (queryClient: QueryClient) => () =>
  loadQuery(queryClient, equipmentListQueryOptions(FIRST_EQUIPMENT_PAGE));

export default function EquipmentListRoute() {
  const me = useMe();
  const mayWrite = me.data ? can(me.data.role, "writeRecords") : false;
  return (
    <div className="space-y-6">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-3xl font-semibold">Equipment</h1>
          <p className="mt-1 text-muted">
            Every unit your company looks after, with its nameplate, visits and refrigerant.
          </p>
        </div>
        {mayWrite && <AddEquipmentLink />}
      </header>
      <PanelBoundary>
        <EquipmentTable
          empty={
            <div className="space-y-3 rounded-card border-2 border-dashed border-rule p-6 text-center">
              <p className="font-semibold">No equipment yet.</p>
              <p className="text-muted">
                {mayWrite
                  ? "Add the first unit from its nameplate; you can add its site and customer on the way."
                  : "A technician or the owner adds units here."}
              </p>
              {mayWrite && (
                <div className="flex justify-center">
                  <AddEquipmentLink />
                </div>
              )}
            </div>
          }
        />
      </PanelBoundary>
    </div>
  );
}
