import { createColumnHelper, useTable, type SortingState } from "@tanstack/react-table";
import { useDeferredValue, useId, useMemo, useState } from "react";
import { Link } from "react-router-dom";
import { visitReasonText, type VisitSummary } from "@shared/schemas/visits.ts";
import { VisitStatusBadge } from "@/components/ui/state/visit-status-badge.tsx";
import { SortableTable, sortableTableFeatures } from "@/components/ui/data-table/sortable-table.tsx";
import { paths } from "@/config/paths.ts";
import { formatDateTime } from "@shared/format/date-time.ts";
import { SearchInput } from "@/components/ui/search-input/search-input.tsx";

interface JobRow extends VisitSummary {
  startedAtMs: number;
  crew: string;
  searchText: string;
}

const column = createColumnHelper<typeof sortableTableFeatures, JobRow>();

const columns = column.columns([
  column.accessor("startedAtMs", {
    header: "Started",
    sortFn: "basic",
    sortDescFirst: true,
    cell: (info) => (
      <Link
        to={paths.visits.detail.getHref(info.row.original.id)}
        className="num font-semibold text-accent underline underline-offset-4"
      >
        {formatDateTime(info.row.original.startedAt)}
      </Link>
    ),
  }),
  column.accessor("equipmentName", {
    header: "Unit",
    sortFn: "alphanumeric",
    cell: (info) => (
      <span className="flex flex-col">
        <Link
          to={paths.equipment.detail.getHref(info.row.original.equipmentId)}
          className="font-medium underline underline-offset-4"
        >
          {info.getValue()}
        </Link>
        <span className="text-sm text-muted">
          {info.row.original.siteName} · <span className="num">{info.row.original.refrigerant}</span>
        </span>
      </span>
    ),
  }),
  column.accessor("reason", {
    header: "Reason",
    sortFn: "alphanumeric",
    cell: (info) => <span className="line-clamp-2">{visitReasonText(info.getValue())}</span>,
  }),
  column.accessor("status", {
    header: "Status",
    sortFn: "alphanumeric",
    cell: (info) => <VisitStatusBadge status={info.getValue()} />,
  }),
  column.accessor("readingCount", {
    header: "Readings",
    sortFn: "basic",
    cell: (info) => <span className="num">{info.getValue()}</span>,
  }),
  column.accessor("crew", {
    header: "Crew",
    sortFn: "alphanumeric",
    cell: (info) => info.getValue() || <span className="text-muted">—</span>,
  }),
]);



/** Visits across all equipment, newest first; cards on phones, a sortable table from tablets up. */
export function JobsTable({ visits }: { visits: readonly VisitSummary[] }) {
  const rows = useMemo<JobRow[]>(
    () =>
      visits.map((visit) => {
        const crew = visit.technicians.map((person) => person.name).join(", ");
        return {
          ...visit,
          startedAtMs: Date.parse(visit.startedAt),
          crew,
          searchText: [visit.equipmentName, visit.siteName, visit.customerName, visit.refrigerant, visit.reason, crew]
            .join(" ")
            .toLowerCase(),
        };
      }),
    [visits],
  );
  const [query, setQuery] = useState("");
  const deferredQuery = useDeferredValue(query);
  const [sorting, setSorting] = useState<SortingState>([{ id: "startedAtMs", desc: true }]);
  const searchId = useId();
  const table = useTable({
    features: sortableTableFeatures,
    columns,
    data: rows,
    getRowId: (row) => row.id,
    state: { sorting, globalFilter: deferredQuery },
    onSortingChange: setSorting,
    globalFilterFn: (row, _columnId, filterValue: string) =>
      filterValue
        .toLowerCase()
        .split(/\s+/)
        .filter(Boolean)
        .every((word) => row.original.searchText.includes(word)),
  });
  const shown = table.getRowModel().rows;

  return (
    <div className="space-y-4">
      <div>
        <label htmlFor={searchId} className="font-medium">
          Find a visit
        </label>
        <SearchInput id={searchId} value={query} onChange={setQuery} placeholder="Unit, site, reason, technician…" />
      </div>
      <p className="text-sm text-muted" aria-live="polite">
        {shown.length === rows.length
          ? `${rows.length} ${rows.length === 1 ? "visit" : "visits"}`
          : `${shown.length} of ${rows.length} visits`}
      </p>
      {shown.length === 0 ? (
        <p className="rounded-card border-2 border-dashed border-rule p-6 text-center">
          No visit matches “{deferredQuery}”.
        </p>
      ) : (
        <>
          <ul className="space-y-3 md:hidden" aria-label="Visits">
            {shown.map((row) => {
              const visit = row.original;
              return (
                <li key={row.id}>
                  <Link
                    to={paths.visits.detail.getHref(visit.id)}
                    className="block space-y-2 rounded-card border-2 border-rule bg-surface p-4 hover:border-ink"
                  >
                    <span className="flex flex-wrap items-center justify-between gap-2">
                      <span className="font-semibold text-accent underline underline-offset-4">
                        {visit.equipmentName}
                      </span>
                      <VisitStatusBadge status={visit.status} />
                    </span>
                    <span className="block">{visitReasonText(visit.reason)}</span>
                    <span className="block text-sm text-muted">
                      <span className="num">{formatDateTime(visit.startedAt)}</span> · {visit.siteName} ·{" "}
                      <span className="num">{visit.readingCount}</span>{" "}
                      {visit.readingCount === 1 ? "reading" : "readings"}
                      {visit.crew && ` · ${visit.crew}`}
                    </span>
                  </Link>
                </li>
              );
            })}
          </ul>
          <SortableTable table={table} caption="Visits, newest first; sortable by each column" words={{ asc: "(oldest or A first)", desc: "(newest or Z first)" }} />
        </>
      )}
    </div>
  );
}
