import { Download } from "lucide-react";
import { useId, useState } from "react";
import type { RegisterPageParams, SortDirection } from "@shared/schemas/list-pages.ts";
import { MOVEMENT_KIND_LABELS, type RegisterQuery } from "@shared/schemas/register.ts";
import { buttonVariants } from "@/components/ui/button/button.tsx";
import { PageControls } from "@/components/ui/data-table/page-controls.tsx";
import { SelectField, TextField } from "@/components/ui/field/field.tsx";
import { useCursorPages } from "@/hooks/use-cursor-pages.ts";
import { useMembers } from "@/lib/api/members.ts";
import { registerExportHref, useRegister } from "@/lib/api/register.ts";
import { formatKg } from "../utils/format-register.ts";
import { formatDateTime, localDayEnd, localDayStart } from "@shared/format/date-time.ts";

export interface RegisterFilters {
  /** Local calendar dates (YYYY-MM-DD) as typed in the date inputs; "" = open-ended. */
  from: string;
  to: string;
  technicianId: string;
}

/** The API query for the filters: local days turned into instants with the viewer's offset. */
export function registerQuery(filters: RegisterFilters): RegisterQuery {
  return {
    from: filters.from ? localDayStart(filters.from) : undefined,
    to: filters.to ? localDayEnd(filters.to) : undefined,
    technicianId: filters.technicianId || undefined,
  };
}

/** Latest first on screen, where the last job's entries are looked for; the export reads oldest first. */
const FIRST_DIRECTION: SortDirection = "desc";

/** What the view asks for first for the filters: the register route's loader fetches it. */
export const firstRegisterPage = (filters: RegisterFilters): RegisterPageParams => ({
  ...registerQuery(filters),
  dir: FIRST_DIRECTION,
});

/**
 * The register for a period and technician, with totals by refrigerant over the whole period, its
 * lines a page at a time (the server pages them: a company keeps years of lines), and the CSV
 * export of every line of the period and technician on screen.
 */
export function RegisterView({
  filters,
  onChange,
  mayChooseTechnician,
}: {
  filters: RegisterFilters;
  onChange: (next: RegisterFilters) => void;
  mayChooseTechnician: boolean;
}) {
  const query = registerQuery(filters);
  const [dir, setDir] = useState<SortDirection>(FIRST_DIRECTION);
  const pages = useCursorPages(JSON.stringify([query, dir]));
  // Paged by a cursor, keeping the last page on screen while the next one or another period loads
  // (useQuery's placeholder): a suspense query would blank the view each time. The first page is the loader's.
  const register = useRegister({ ...query, dir, cursor: pages.cursor });
  const members = useMembers();
  const totalsId = useId();
  const backwards = Boolean(filters.from && filters.to && filters.from > filters.to);

  return (
    <div className="space-y-4">
      <form
        className="grid gap-3 sm:grid-cols-3"
        aria-label="Register filters"
        onSubmit={(event) => event.preventDefault()}
      >
        <TextField
          label="From"
          type="date"
          value={filters.from}
          onChange={(event) => onChange({ ...filters, from: event.target.value })}
        />
        <TextField
          label="To (inclusive)"
          type="date"
          value={filters.to}
          error={backwards ? "The end of the period is before its start" : undefined}
          onChange={(event) => onChange({ ...filters, to: event.target.value })}
        />
        {mayChooseTechnician ? (
          <SelectField
            label="Technician"
            value={filters.technicianId}
            onChange={(event) => onChange({ ...filters, technicianId: event.target.value })}
          >
            <option value="">Everyone</option>
            {(members.data ?? []).map((member) => (
              <option key={member.id} value={member.id}>
                {member.name}
              </option>
            ))}
          </SelectField>
        ) : (
          <p className="self-end text-sm text-muted">
            Technicians see and export their own records; owners and seniors keep the company's.
          </p>
        )}
      </form>

      <a
        href={backwards ? undefined : registerExportHref(query)}
        aria-disabled={backwards || undefined}
        className={buttonVariants({ variant: "primary" })}
        download
      >
        <Download aria-hidden className="size-5" /> Export CSV
      </a>

      {register.isPending && <p aria-busy="true">Reading the register…</p>}
      {register.isError && !backwards && (
        <p role="alert" className="font-medium text-fault">
          ⚠ The register did not load: {register.error.message}
        </p>
      )}
      {register.data && (
        <>
          <section aria-labelledby={totalsId} className="space-y-2">
            <h2 id={totalsId} className="text-xl font-semibold">
              Totals for the period
            </h2>
            {register.data.totals.length === 0 ? (
              <p className="text-muted">Nothing recorded in this period.</p>
            ) : (
              <dl className="num grid gap-x-6 gap-y-1 sm:grid-cols-2">
                {register.data.totals.map((total) => (
                  <div
                    key={`${total.refrigerant}-${total.kind}`}
                    className="flex justify-between gap-3 border-b border-rule py-1"
                  >
                    <dt className="font-sans">
                      {total.refrigerant} · {MOVEMENT_KIND_LABELS[total.kind].toLowerCase()}
                    </dt>
                    <dd className="font-semibold">{formatKg(total.kg)}</dd>
                  </div>
                ))}
              </dl>
            )}
          </section>
          {register.data.movements.length > 0 && (
            <div className="flex flex-wrap items-end justify-between gap-3">
              <h2 className="text-xl font-semibold">Entries</h2>
              <SelectField label="Order" value={dir} onChange={(event) => setDir(event.target.value as SortDirection)}>
                <option value="desc">Latest first</option>
                <option value="asc">Oldest first</option>
              </SelectField>
            </div>
          )}
          {register.data.movements.length > 0 && (
            <ul
              aria-label="Register entries"
              className="divide-y-2 divide-rule overflow-hidden rounded-card border-2 border-rule bg-surface"
            >
              {register.data.movements.map((movement) => (
                <li key={movement.id} className="grid gap-1 p-3 md:grid-cols-[11rem_1fr_8rem]">
                  <p className="num text-sm text-muted">{formatDateTime(movement.at)}</p>
                  <div>
                    <p className="font-semibold">
                      {MOVEMENT_KIND_LABELS[movement.kind]} · <span className="num">{movement.refrigerant}</span>
                    </p>
                    <p className="text-sm">
                      {movement.equipmentName ?? "No unit (cylinder handed on)"}
                      {movement.siteName && <> · {movement.siteName}</>}
                      {movement.circuit !== null && <> · circuit {movement.circuit}</>}
                      {movement.cylinder && <> · cylinder {movement.cylinder.label}</>}
                      {movement.technician && <> · {movement.technician.name}</>}
                    </p>
                    {movement.note && <p className="text-sm text-muted">{movement.note}</p>}
                  </div>
                  <p className="num text-lg font-semibold md:text-right">{formatKg(movement.kg)}</p>
                </li>
              ))}
            </ul>
          )}
          <PageControls noun="entries" pages={pages} query={register} shown={register.data.movements.length} />
        </>
      )}
    </div>
  );
}
