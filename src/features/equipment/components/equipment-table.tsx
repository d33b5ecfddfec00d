import { createColumnHelper, useTable, type SortingState } from "@tanstack/react-table";
import { useDeferredValue, useId, useMemo, useState } from "react";
import { Link } from "react-router-dom";
import { REFRIGERANT_CATALOGUE } from "@shared/property-tables/refrigerant-catalogue.ts";
import type { SafetyClass } from "@shared/content/safety-classes.ts";
import { EQUIPMENT_KINDS, type Equipment } from "@shared/schemas/equipment.ts";
import { SafetyBadge } from "@/components/ui/safety-badge/safety-badge.tsx";
import { SortableTable, sortableTableFeatures, SortIcon } from "@/components/ui/data-table/sortable-table.tsx";
import { paths } from "@/config/paths.ts";
import { formatNumber } from "@/lib/units/display-units.ts";
import {
  capitalise,
  equipmentSearchText,
  matchesSearch,
  meteringSummary,
  totalFactoryChargeKg,
} from "../utils/nameplate-text.ts";
import { SearchInput } from "@/components/ui/search-input/search-input.tsx";

/** One table row: the unit plus what the columns sort and search by. */
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
  searchText: string;
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
    searchText: equipmentSearchText(unit),
  }));
}

const column = createColumnHelper<typeof sortableTableFeatures, EquipmentRow>();

const columns = column.columns([
  column.accessor("name", {
    header: "Unit",
    sortFn: "alphanumeric",
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
    sortFn: "text",
    // The kind filter is a choice from a list, so it matches the whole word exactly.
    filterFn: (row, columnId, value: string) => row.getValue(columnId) === value,
    cell: (info) => <span>{capitalise(info.getValue())}</span>,
  }),
  column.accessor("place", {
    header: "Site · customer",
    sortFn: "text",
    cell: (info) => (
      <span className="flex flex-col">
        <span>{info.row.original.siteName}</span>
        <span className="text-sm text-muted">{info.row.original.customerName}</span>
      </span>
    ),
  }),
  column.accessor("refrigerant", {
    header: "Refrigerant",
    sortFn: "alphanumeric",
    cell: (info) => (
      <span className="flex flex-wrap items-center gap-2">
        <span className="num font-semibold">{info.getValue()}</span>
        {info.row.original.safetyClass && <SafetyBadge safetyClass={info.row.original.safetyClass} />}
      </span>
    ),
  }),
  column.accessor("circuitCount", {
    header: "Circuits · metering",
    sortFn: "basic",
    cell: (info) => <span className="num">{info.row.original.metering}</span>,
  }),
  column.accessor("totalChargeKg", {
    header: "Factory charge",
    sortFn: "basic",
    cell: (info) => <span className="num">{formatNumber(info.getValue(), 2)} kg</span>,
  }),
]);

const SORT_CHOICES = [
  { value: "name", label: "Unit name" },
  { value: "place", label: "Site" },
  { value: "refrigerant", label: "Refrigerant" },
  { value: "totalChargeKg", label: "Factory charge" },
] as const;



/**
 * The company's units: a sortable table on tablets and desktops, a column of cards on phones
 * (a wide table is unreadable at arm's length on a roof), both fed by the same filtered,
 * sorted row model.
 */
export function EquipmentTable({ equipment }: { equipment: readonly Equipment[] }) {
  const rows = useMemo(() => toEquipmentRows(equipment), [equipment]);
  const [query, setQuery] = useState("");
  const [kind, setKind] = useState("");
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);
  const deferredQuery = useDeferredValue(query);
  const searchId = useId();
  const kindId = useId();
  const sortId = useId();

  const columnFilters = useMemo(() => (kind ? [{ id: "kind", value: kind }] : []), [kind]);
  const table = useTable({
    features: sortableTableFeatures,
    columns,
    data: rows,
    getRowId: (row) => row.id,
    state: { sorting, globalFilter: deferredQuery, columnFilters },
    onSortingChange: setSorting,
    // The search looks at every word of the unit (serial and model too), not only the columns shown.
    globalFilterFn: (row, _columnId, filterValue: string) => matchesSearch(row.original.searchText, filterValue),
  });
  const shown = table.getRowModel().rows;
  const kindsPresent = EQUIPMENT_KINDS.filter((candidate) => rows.some((row) => row.kind === candidate));
  const current = sorting[0];

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
            {kindsPresent.map((candidate) => (
              <option key={candidate} value={candidate}>
                {capitalise(candidate)}
              </option>
            ))}
          </select>
        </div>
      </div>

      <p className="text-sm text-muted" aria-live="polite">
        {shown.length === rows.length
          ? `${rows.length} ${rows.length === 1 ? "unit" : "units"}`
          : `${shown.length} of ${rows.length} units`}
      </p>

      {shown.length === 0 ? (
        <p className="rounded-card border-2 border-dashed border-rule p-6 text-center">
          No unit matches{deferredQuery ? ` “${deferredQuery}”` : ""}
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
          <SortableTable table={table} caption="Equipment, sortable by each column" words={{ asc: "(sorted A to Z, low to high)", desc: "(sorted Z to A, high to low)" }} />
        </>
      )}
    </div>
  );
}
