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
  useTable,
  type Column,
  type SortingState,
  type TableOptions,
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

/**
 * A list the server pages, searches and sorts (decision 019): the table shows the rows in the
 * order they came and only asks for a new order, which the screen sends as its query.
 */
export function useServerSortedTable<TData extends RowData & { id: string }>(
  columns: TableOptions<SortableFeatures, TData>["columns"],
  data: TData[],
  sorting: SortingState,
  onSortingChange: TableOptions<SortableFeatures, TData>["onSortingChange"],
) {
  return useTable({
    features: sortableTableFeatures,
    columns,
    data,
    getRowId: (row) => row.id,
    state: { sorting },
    onSortingChange,
    manualSorting: true,
    manualFiltering: true,
  });
}

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
  /** What a screen reader hears for a sorted column; a list none of whose columns sort leaves it out. */
  words?: SortWords;
  /**
   * How the list shows on a phone. Left out, the table is hidden below md and the screen draws its
   * own cards there (jobs, equipment); `stacked`, the table itself shows each row as a card of
   * label-above-value lines below sm, for a short list whose rows need no card of their own (members).
   */
  phones?: "own-cards" | "stacked";
}

const LAYOUT = {
  "own-cards": {
    frame: "hidden overflow-x-auto rounded-card border-2 border-rule bg-surface md:block",
    head: "border-b-2 border-rule",
    header: "px-3 py-1",
    row: "border-b border-rule last:border-b-0",
    cell: "px-3 py-2 align-top",
  },
  stacked: {
    frame: "rounded-card border-2 border-rule bg-surface",
    head: "sr-only border-b-2 border-rule sm:not-sr-only sm:table-header-group",
    header: "px-3 py-2",
    row: "block border-b border-rule py-2 last:border-b-0 sm:table-row sm:py-0",
    cell: "block px-3 py-1 align-middle sm:table-cell sm:py-2",
  },
} as const;

const NO_SORT_WORDS: SortWords = { asc: "(sorted ascending)", desc: "(sorted descending)" };

/**
 * The table view of a list: headers that sort where the column can, the filtered, sorted rows.
 * Every tabular list of Satura draws through it, so headers, sort announcements and row rules
 * read the same everywhere.
 */
export function SortableTable<TData extends RowData>({
  table,
  caption,
  words = NO_SORT_WORDS,
  phones = "own-cards",
}: SortableTableProps<TData>) {
  const layout = LAYOUT[phones];
  return (
    <div className={layout.frame}>
      <table className="w-full text-left">
        <caption className="sr-only">{caption}</caption>
        <thead className={layout.head}>
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
                    className={layout.header}
                  >
                    {header.column.getCanSort() ? (
                      <SortableHeader
                        column={header.column}
                        label={String(header.column.columnDef.header)}
                        words={words}
                      />
                    ) : phones === "stacked" ? (
                      <span className="font-semibold">{String(header.column.columnDef.header)}</span>
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
            <tr key={row.id} className={layout.row}>
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className={layout.cell}>
                  {phones === "stacked" ? (
                    // The column's name above its value, for the card a row becomes on a phone.
                    <span aria-hidden className="block text-sm text-muted sm:hidden">
                      {String(cell.column.columnDef.header ?? "")}
                    </span>
                  ) : null}
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
