import { useSearchParams } from "react-router-dom";
import { can } from "@shared/schemas/auth.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import { RegisterView, type RegisterFilters } from "@/features/register/components/register-view.tsx";
import { useMe } from "@/lib/api/auth.ts";

export default function RegisterRoute() {
  const me = useMe();
  const [search, setSearch] = useSearchParams();
  const filters: RegisterFilters = {
    from: search.get("from") ?? "",
    to: search.get("to") ?? "",
    technicianId: search.get("technician") ?? "",
  };
  const role = me.data?.role ?? "apprentice";
  const update = (next: RegisterFilters) => {
    const params = new URLSearchParams();
    if (next.from) params.set("from", next.from);
    if (next.to) params.set("to", next.to);
    if (next.technicianId) params.set("technician", next.technicianId);
    setSearch(params, { replace: true });
  };
  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <h1 className="text-3xl font-semibold">Refrigerant register</h1>
        <p className="text-muted">
          Every kilogram recovered, reused, added and sent for reclaim, for the regulator's record keeping.
        </p>
      </header>
      {can(role, "writeRecords") ? (
        <PanelBoundary>
          <RegisterView filters={filters} onChange={update} mayChooseTechnician={can(role, "signOff")} />
        </PanelBoundary>
      ) : (
        <p role="alert">
          Apprentices work under supervision and keep no register of their own; ask your supervisor for the company's
          records.
        </p>
      )}
    </div>
  );
}
