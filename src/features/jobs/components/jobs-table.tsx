import { createColumnHelper, type SortingState } from "@tanstack/react-table";
import { useId, useState, type ReactNode } from "react";
import { Link } from "react-router-dom";
import type { VisitListParams, VisitSort } from "@shared/schemas/list-pages.ts";
import { visitReasonText, type VisitStatus, type VisitSummary } from "@shared/schemas/visits.ts";
import { VisitStatusBadge } from "@/components/ui/state/visit-status-badge.tsx";
import { PageControls } from "@/components/ui/data-table/page-controls.tsx";
import {
  SortableTable,
  sortableTableFeatures,
  useServerSortedTable,
} from "@/components/ui/data-table/sortable-table.tsx";
import { Button } from "@/components/ui/button/button.tsx";
import { paths } from "@/config/paths.ts";
import { formatDateTime } from "@shared/format/date-time.ts";
import { SearchInput } from "@/components/ui/search-input/search-input.tsx";
import { useCursorPages } from "@/hooks/use-cursor-pages.ts";
import { useDebouncedValue } from "@/hooks/use-debounced-value.ts";
import { useVisits } from "@/lib/api/visits.ts";

interface JobRow extends VisitSummary {
  crew: string;
}

/** The column ids the server sorts by (the table's ids are the server's names). */
const SERVER_SORTS: Record<string, VisitSort> = {
  startedAt: "startedAt",
  equipmentName: "equipmentName",
  reason: "reason",
  status: "status",
};
const DEFAULT_SORT = { id: "startedAt", desc: true };
const DEFAULT_SORTING: SortingState = [DEFAULT_SORT];

/**
 * What the table asks for first (DEFAULT_SORTING, no search): the jobs route's loader fetches it,
 * so the table opens on the same cache entry.
 */
export const firstVisitsPage = (status: VisitStatus | null): VisitListParams => ({
  status: status ?? undefined,
  sort: "startedAt",
  dir: "desc",
});

const column = createColumnHelper<typeof sortableTableFeatures, JobRow>();

const columns = column.columns([
  column.accessor("startedAt", {
    header: "Started",
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
    cell: (info) => <span className="line-clamp-2">{visitReasonText(info.getValue())}</span>,
  }),
  column.accessor("status", {
    header: "Status",
    cell: (info) => <VisitStatusBadge status={info.getValue()} />,
  }),
  // Counted for the page shown only, so the server cannot sort the whole list by them.
  column.accessor("readingCount", {
    header: "Readings",
    enableSorting: false,
    cell: (info) => <span className="num">{info.getValue()}</span>,
  }),
  column.accessor("crew", {
    header: "Crew",
    enableSorting: false,
    cell: (info) => info.getValue() || <span className="text-muted">—</span>,
  }),
]);

/**
 * Visits across all equipment, newest first, a page at a time: the server searches, filters
 * and sorts (an organisation can hold tens of thousands of visits). Cards on phones, a
 * sortable table from tablets up. `empty` shows when the status has no visit at all.
 */
export function JobsTable({ status, empty }: { status: VisitStatus | null; empty: ReactNode }) {
  const [query, setQuery] = useState("");
  const search = useDebouncedValue(query.trim());
  const [sorting, setSorting] = useState<SortingState>(DEFAULT_SORTING);
  const current = sorting[0] ?? DEFAULT_SORT;
  const sort = SERVER_SORTS[current.id] ?? "startedAt";
  const dir = current.desc ? "desc" : "asc";
  const pages = useCursorPages(JSON.stringify([status, search, sort, dir]));
  // Paged by a cursor and searched as typed, keeping the last page on screen meanwhile (useQuery's
  // placeholder): a suspense query would blank the table on each. The first page is the loader's.
  const visits = useVisits({ status: status ?? undefined, q: search || undefined, sort, dir, cursor: pages.cursor });
  const rows: JobRow[] = (visits.data?.visits ?? []).map((visit) => ({
    ...visit,
    crew: visit.technicians.map((person) => person.name).join(", "),
  }));
  const searchId = useId();
  const table = useServerSortedTable(columns, rows, sorting, setSorting);

  if (visits.isPending) {
    return (
      <p role="status" className="rounded-card border-2 border-rule bg-surface p-6 text-center text-muted">
        Loading visits…
      </p>
    );
  }
  if (visits.isError && !visits.data) {
    return (
      <div role="alert" className="space-y-2 rounded-card border-2 border-fault bg-surface p-4">
        <p className="font-semibold text-fault">⚠ The visits did not load: {visits.error.message}</p>
        <Button variant="secondary" onClick={() => void visits.refetch()}>
          Try again
        </Button>
      </div>
    );
  }
  const firstPage = pages.pageNumber === 1;
  if (firstPage && rows.length === 0 && !search && !visits.isPlaceholderData) return <>{empty}</>;
  const nextCursor = visits.data?.nextCursor ?? null;

  return (
    <div className="space-y-4">
      <div>
        <label htmlFor={searchId} className="font-medium">
          Find a visit
        </label>
        <SearchInput id={searchId} value={query} onChange={setQuery} placeholder="Unit, site, reason, technician…" />
      </div>
      {visits.isError && (
        <p role="alert" className="font-medium text-fault">
          ⚠ The visits did not load: {visits.error.message}
        </p>
      )}
      <p className="text-sm text-muted" aria-live="polite">
        {visits.isPlaceholderData
          ? "Loading…"
          : search
            ? `${rows.length}${nextCursor ? "+" : ""} ${rows.length === 1 && !nextCursor ? "visit matches" : "visits match"} “${search}”`
            : `${rows.length}${nextCursor ? "+" : ""} ${rows.length === 1 && !nextCursor ? "visit" : "visits"}`}
      </p>
      {rows.length === 0 ? (
        <p className="rounded-card border-2 border-dashed border-rule p-6 text-center">No visit matches “{search}”.</p>
      ) : (
        <>
          <ul className="space-y-3 md:hidden" aria-label="Visits">
            {rows.map((visit) => (
              <li key={visit.id}>
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
            ))}
          </ul>
          <SortableTable
            table={table}
            caption="Visits, newest first; sortable by start, unit, reason and status"
            words={{ asc: "(oldest or A first)", desc: "(newest or Z first)" }}
          />
        </>
      )}
      <PageControls noun="visits" pages={pages} query={visits} shown={rows.length} />
    </div>
  );
}
