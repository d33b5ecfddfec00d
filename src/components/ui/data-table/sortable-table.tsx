import {
  columnFilteringFeature,
  createFilteredRowModel,
  createSortedRowModel,
  globalFilteringFeature,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_basic,
  sortFn_datetime,
  sortFn_text,
  tableFeatures,
  type Column,
  type ReactTable,
  type RowData,
} from "@tanstack/react-table";
import { ArrowDown, ArrowUp, ArrowUpDown } from "lucide-react";

/** The features every sortable, filterable list of Satura uses (@tanstack/react-table v9). */
export const sortableTableFeatures = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  sortedRowModel: createSortedRowModel(),
  filteredRowModel: createFilteredRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic, datetime: sortFn_datetime, text: sortFn_text },
});
export type SortableFeatures = typeof sortableTableFeatures;

/** The sort direction as a shape, so it reads without colour. */
export function SortIcon({ direction }: { direction: false | "asc" | "desc" }) {
  if (direction === "asc") return <ArrowUp aria-hidden className="size-4" />;
  if (direction === "desc") return <ArrowDown aria-hidden className="size-4" />;
  return <ArrowUpDown aria-hidden className="size-4 text-muted" />;
}

/** What a screen reader hears for each direction, in the words that fit the list's columns. */
export interface SortWords {
  asc: string;
  desc: string;
}

function SortableHeader<TData extends RowData>({
  column,
  label,
  words,
}: {
  column: Column<SortableFeatures, TData>;
  label: string;
  words: SortWords;
}) {
  const direction = column.getIsSorted();
  return (
    <button
      type="button"
      onClick={column.getToggleSortingHandler()}
      className="-mx-2 inline-flex min-h-touch items-center gap-1 whitespace-nowrap rounded-card px-2 font-semibold hover:bg-sunken"
    >
      {label}
      <SortIcon direction={direction} />
      <span className="sr-only">{direction === "asc" ? words.asc : direction === "desc" ? words.desc : "(sort)"}</span>
    </button>
  );
}

interface SortableTableProps<TData extends RowData> {
  table: ReactTable<SortableFeatures, TData>;
  caption: string;
  words: SortWords;
}

/** The table view of a sortable list (tablets and desktops): headers that sort, the filtered, sorted rows. */
export function SortableTable<TData extends RowData>({ table, caption, words }: SortableTableProps<TData>) {
  return (
    <div className="hidden overflow-x-auto rounded-card border-2 border-rule bg-surface md:block">
      <table className="w-full text-left">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b-2 border-rule">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={
                      sorted === "asc"
                        ? "ascending"
                        : sorted === "desc"
                          ? "descending"
                          : header.column.getCanSort()
                            ? "none"
                            : undefined
                    }
                    className="px-3 py-1"
                  >
                    {header.column.getCanSort() ? (
                      <SortableHeader
                        column={header.column}
                        label={String(header.column.columnDef.header)}
                        words={words}
                      />
                    ) : (
                      // Not sortable (a list paged by the server sorts by what it can read in order).
                      <span className="inline-flex min-h-touch items-center whitespace-nowrap font-semibold">
                        {String(header.column.columnDef.header)}
                      </span>
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-rule last:border-b-0">
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2 align-top">
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
