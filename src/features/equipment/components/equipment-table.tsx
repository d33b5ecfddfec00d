import { createColumnHelper, type SortingState } from "@tanstack/react-table";
import { useId, useMemo, useState, type ReactNode } from "react";
import { Link } from "react-router-dom";
import { REFRIGERANT_CATALOGUE } from "@shared/property-tables/refrigerant-catalogue.ts";
import type { SafetyClass } from "@shared/content/safety-classes.ts";
import { EQUIPMENT_KINDS, type Equipment } from "@shared/schemas/equipment.ts";
import type { EquipmentListParams, EquipmentSort } from "@shared/schemas/list-pages.ts";
import { Button } from "@/components/ui/button/button.tsx";
import { PageControls } from "@/components/ui/data-table/page-controls.tsx";
import { SafetyBadge } from "@/components/ui/safety-badge/safety-badge.tsx";
import {
  SortableTable,
  sortableTableFeatures,
  SortIcon,
  useServerSortedTable,
} from "@/components/ui/data-table/sortable-table.tsx";
import { paths } from "@/config/paths.ts";
import { formatNumber } from "@/lib/units/display-units.ts";
import { capitalise, meteringSummary, totalFactoryChargeKg } from "../utils/nameplate-text.ts";
import { SearchInput } from "@/components/ui/search-input/search-input.tsx";
import { useCursorPages } from "@/hooks/use-cursor-pages.ts";
import { useDebouncedValue } from "@/hooks/use-debounced-value.ts";
import { useEquipmentList } from "@/lib/api/equipment.ts";

/** One table row: the unit plus what the columns show. */
export interface EquipmentRow {
  id: string;
  name: string;
  kind: string;
  place: string;
  siteName: string;
  customerName: string;
  refrigerant: string;
  safetyClass: SafetyClass | null;
  circuitCount: number;
  metering: string;
  totalChargeKg: number;
}

export function toEquipmentRows(equipment: readonly Equipment[]): EquipmentRow[] {
  const classes = new Map(REFRIGERANT_CATALOGUE.map((info) => [info.id, info.safety.class]));
  return equipment.map((unit) => ({
    id: unit.id,
    name: unit.name,
    kind: unit.kind,
    place: `${unit.siteName} · ${unit.customerName}`,
    siteName: unit.siteName,
    customerName: unit.customerName,
    refrigerant: unit.refrigerant,
    safetyClass: classes.get(unit.refrigerant) ?? null,
    circuitCount: unit.circuits.length,
    metering: meteringSummary(unit.circuits),
    totalChargeKg: totalFactoryChargeKg(unit.circuits),
  }));
}

const column = createColumnHelper<typeof sortableTableFeatures, EquipmentRow>();

const columns = column.columns([
  column.accessor("name", {
    header: "Unit",
    cell: (info) => (
      <Link
        to={paths.equipment.detail.getHref(info.row.original.id)}
        className="font-semibold text-accent underline underline-offset-4"
      >
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor("kind", {
    header: "Kind",
    cell: (info) => <span>{capitalise(info.getValue())}</span>,
  }),
  column.accessor("place", {
    header: "Site · customer",
    cell: (info) => (
      <span className="flex flex-col">
        <span>{info.row.original.siteName}</span>
        <span className="text-sm text-muted">{info.row.original.customerName}</span>
      </span>
    ),
  }),
  column.accessor("refrigerant", {
    header: "Refrigerant",
    cell: (info) => (
      <span className="flex flex-wrap items-center gap-2">
        <span className="num font-semibold">{info.getValue()}</span>
        {info.row.original.safetyClass && <SafetyBadge safetyClass={info.row.original.safetyClass} />}
      </span>
    ),
  }),
  column.accessor("circuitCount", {
    header: "Circuits · metering",
    cell: (info) => <span className="num">{info.row.original.metering}</span>,
  }),
  column.accessor("totalChargeKg", {
    header: "Factory charge",
    cell: (info) => <span className="num">{formatNumber(info.getValue(), 2)} kg</span>,
  }),
]);

/**
 * What the table asks for first (its default sort below, no search or kind): the equipment
 * route's loader fetches it, so the table opens on the same cache entry.
 */
export const FIRST_EQUIPMENT_PAGE: EquipmentListParams = { sort: "name", dir: "asc" };

/** The server's sort for each column id. */
const SERVER_SORTS: Record<string, EquipmentSort> = {
  name: "name",
  kind: "kind",
  place: "place",
  refrigerant: "refrigerant",
  circuitCount: "circuits",
  totalChargeKg: "factoryCharge",
};

const SORT_CHOICES = [
  { value: "name", label: "Unit name" },
  { value: "place", label: "Site" },
  { value: "refrigerant", label: "Refrigerant" },
  { value: "totalChargeKg", label: "Factory charge" },
] as const;

/**
 * The company's units: a sortable table on tablets and desktops, a column of cards on phones
 * (a wide table is unreadable at arm's length on a roof), both showing the page the server
 * searched, filtered and sorted (an organisation can look after thousands of units).
 * `empty` shows when the company has no unit at all.
 */
export function EquipmentTable({ empty }: { empty?: ReactNode }) {
  const [query, setQuery] = useState("");
  const [kind, setKind] = useState("");
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);
  const search = useDebouncedValue(query.trim());
  const current = sorting[0] ?? { id: "name", desc: false };
  const sort = SERVER_SORTS[current.id] ?? "name";
  const dir = current.desc ? "desc" : "asc";
  const pages = useCursorPages(JSON.stringify([search, kind, sort, dir]));
  // Paged by a cursor and searched as typed, keeping the last page on screen meanwhile (useQuery's
  // placeholder): a suspense query would blank the table on each. The first page is the loader's.
  const list = useEquipmentList({
    q: search || undefined,
    kind: (kind || undefined) as (typeof EQUIPMENT_KINDS)[number] | undefined,
    sort,
    dir,
    cursor: pages.cursor,
  });
  const rows = useMemo(() => toEquipmentRows(list.data?.equipment ?? []), [list.data]);
  const searchId = useId();
  const kindId = useId();
  const sortId = useId();

  const table = useServerSortedTable(columns, rows, sorting, setSorting);
  const shown = table.getRowModel().rows;
  const nextCursor = list.data?.nextCursor ?? null;

  if (list.isPending) {
    return (
      <p role="status" className="rounded-card border-2 border-rule bg-surface p-6 text-center text-muted">
        Loading equipment…
      </p>
    );
  }
  if (list.isError && !list.data) {
    return (
      <div role="alert" className="space-y-2 rounded-card border-2 border-fault bg-surface p-4">
        <p className="font-semibold text-fault">⚠ The equipment list did not load: {list.error.message}</p>
        <Button variant="secondary" onClick={() => void list.refetch()}>
          Try again
        </Button>
      </div>
    );
  }
  if (pages.pageNumber === 1 && rows.length === 0 && !search && !kind && !list.isPlaceholderData && empty)
    return <>{empty}</>;

  return (
    <div className="space-y-4">
      <div className="grid gap-3 sm:grid-cols-[1fr_auto]">
        <div>
          <label htmlFor={searchId} className="font-medium">
            Find a unit
          </label>
          <SearchInput id={searchId} value={query} onChange={setQuery} placeholder="Name, site, R32, serial…" />
        </div>
        <div>
          <label htmlFor={kindId} className="font-medium">
            Kind
          </label>
          <select
            id={kindId}
            value={kind}
            onChange={(event) => setKind(event.target.value)}
            className="mt-1 block min-h-14 w-full rounded-card border-2 border-rule bg-surface px-3 text-base"
          >
            <option value="">All kinds</option>
            {EQUIPMENT_KINDS.map((candidate) => (
              <option key={candidate} value={candidate}>
                {capitalise(candidate)}
              </option>
            ))}
          </select>
        </div>
      </div>

      {list.isError && (
        <p role="alert" className="font-medium text-fault">
          ⚠ The equipment list did not load: {list.error.message}
        </p>
      )}
      <p className="text-sm text-muted" aria-live="polite">
        {list.isPlaceholderData
          ? "Loading…"
          : `${rows.length}${nextCursor ? "+" : ""} ${rows.length === 1 && !nextCursor ? "unit" : "units"}${search || kind ? " found" : ""}`}
      </p>

      {shown.length === 0 ? (
        <p className="rounded-card border-2 border-dashed border-rule p-6 text-center">
          No unit matches{search ? ` “${search}”` : ""}
          {kind ? ` among ${kind} units` : ""}. Clear the search or choose all kinds.
        </p>
      ) : (
        <>
          {/* Phones: cards, with a sort choice in place of the column headers. */}
          <div className="space-y-3 md:hidden">
            <div className="flex items-end gap-2">
              <div className="flex-1">
                <label htmlFor={sortId} className="text-sm font-medium">
                  Sort by
                </label>
                <select
                  id={sortId}
                  value={current?.id ?? "name"}
                  onChange={(event) => setSorting([{ id: event.target.value, desc: false }])}
                  className="mt-1 block min-h-touch w-full rounded-card border-2 border-rule bg-surface px-3"
                >
                  {SORT_CHOICES.map((choice) => (
                    <option key={choice.value} value={choice.value}>
                      {choice.label}
                    </option>
                  ))}
                </select>
              </div>
              <button
                type="button"
                onClick={() => setSorting([{ id: current?.id ?? "name", desc: !current?.desc }])}
                className="inline-flex min-h-touch items-center gap-1 rounded-card border-2 border-rule bg-surface px-3 font-medium"
              >
                <SortIcon direction={current?.desc ? "desc" : "asc"} />
                {current?.desc ? "Descending" : "Ascending"}
              </button>
            </div>
            <ul className="space-y-3" aria-label="Equipment">
              {shown.map((row) => {
                const unit = row.original;
                return (
                  <li key={row.id}>
                    <Link
                      to={paths.equipment.detail.getHref(unit.id)}
                      className="block space-y-2 rounded-card border-2 border-rule bg-surface p-4 hover:border-ink"
                    >
                      <span className="block text-lg font-semibold text-accent underline underline-offset-4">
                        {unit.name}
                      </span>
                      <span className="block text-sm text-muted">
                        {capitalise(unit.kind)} · {unit.siteName} · {unit.customerName}
                      </span>
                      <span className="flex flex-wrap items-center gap-2">
                        <span className="num font-semibold">{unit.refrigerant}</span>
                        {unit.safetyClass && <SafetyBadge safetyClass={unit.safetyClass} />}
                        <span className="num text-sm">
                          {unit.metering} · {formatNumber(unit.totalChargeKg, 2)} kg
                        </span>
                      </span>
                    </Link>
                  </li>
                );
              })}
            </ul>
          </div>

          {/* Tablets and desktops: the table. */}
          <SortableTable
            table={table}
            caption="Equipment, sortable by each column"
            words={{ asc: "(sorted A to Z, low to high)", desc: "(sorted Z to A, high to low)" }}
          />
        </>
      )}
      <PageControls noun="units" pages={pages} query={list} shown={rows.length} />
    </div>
  );
}
