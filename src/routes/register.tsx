import type { QueryClient } from "@tanstack/react-query";
import { useSearchParams, type LoaderFunctionArgs } from "react-router-dom";
import { can } from "@shared/schemas/auth.ts";
import { PanelBoundary } from "@/components/errors/panel-boundary.tsx";
import {
  firstRegisterPage,
  RegisterView,
  type RegisterFilters,
} from "@/features/register/components/register-view.tsx";
import { meQueryOptions, useMe } from "@/lib/api/auth.ts";
import { membersQueryOptions } from "@/lib/api/members.ts";
import { registerQueryOptions } from "@/lib/api/register.ts";
import { loadQuery } from "@/lib/api/screen-data.ts";

/** The filters in the address ("" = open-ended, everyone). */
const filtersIn = (search: URLSearchParams): RegisterFilters => ({
  from: search.get("from") ?? "",
  to: search.get("to") ?? "",
  technicianId: search.get("technician") ?? "",
});

/**
 * The register's first page for the filters in the address, for those who keep one; a senior's
 * technician choices are started too (the view pages and filters itself).
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await loadQuery(queryClient, meQueryOptions());
    if (!me || !can(me.role, "writeRecords")) return null;
    if (can(me.role, "signOff")) void loadQuery(queryClient, membersQueryOptions());
    await loadQuery(queryClient, registerQueryOptions(firstRegisterPage(filtersIn(new URL(request.url).searchParams))));
    return null;
  };

export default function RegisterRoute() {
  const me = useMe();
  const [search, setSearch] = useSearchParams();
  const filters = filtersIn(search);
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
