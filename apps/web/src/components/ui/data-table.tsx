import {
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  filterFn_includesString,
  globalFilteringFeature,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_basic,
  sortFn_datetime,
  sortFn_text,
  tableFeatures,
  useTable,
  type ColumnDef,
  type RowData,
  type SortingState,
} from "@tanstack/react-table";
import { ArrowDown, ArrowUp, ArrowUpDown } from "lucide-react";
import { useState, type ReactNode } from "react";

/**
 * The features every Waymark table registers: click-to-sort headers and a text filter over the
 * columns marked as searchable. Module-level so the table's models stay stable between renders.
 */
export const tableFeatureSet = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  sortedRowModel: createSortedRowModel(),
  filteredRowModel: createFilteredRowModel(),
  sortFns: {
    alphanumeric: sortFn_alphanumeric,
    text: sortFn_text,
    datetime: sortFn_datetime,
    basic: sortFn_basic,
  },
  filterFns: { includesString: filterFn_includesString },
});

export type TableFeatureSet = typeof tableFeatureSet;

/** A typed column helper for a row shape, bound to the shared feature set. */
export const columnHelper = <T extends RowData>() => createColumnHelper<TableFeatureSet, T>();

/** An ISO date-time string as milliseconds, for sorting; missing or invalid dates sort first. */
export function timeOf(iso: string | null | undefined): number {
  if (!iso) return 0;
  const t = new Date(iso).getTime();
  return Number.isNaN(t) ? 0 : t;
}

interface DataTableProps<T extends RowData> {
  /** Columns from `columnHelper<T>().columns([...])`; keep them at module scope or memoised. */
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ReadonlyArray<ColumnDef<TableFeatureSet, T, any>>;
  data: T[];
  /** What the table lists, for screen readers. */
  label: string;
  getRowId?: (row: T) => string;
  initialSorting?: SortingState;
  /** Text filter (controlled by the parent) over the columns named in `searchColumns`. */
  filter?: string;
  searchColumns?: readonly string[];
  /** Shown in place of the body when there are no rows (after filtering). */
  empty: ReactNode;
  /** Extra classes for a row, e.g. to flag one. */
  rowClassName?: (row: T) => string | undefined;
  testId?: string;
}

/**
 * The one table layout of the web app, on TanStack Table: sortable headers announce their
 * order (aria-sort) and show it with an arrow and in words for screen readers; numbers align
 * right when a column's meta says so.
 */
export function DataTable<T extends RowData>({
  columns,
  data,
  label,
  getRowId,
  initialSorting,
  filter,
  empty,
  rowClassName,
  testId,
  searchColumns,
}: DataTableProps<T>) {
  const [sorting, setSorting] = useState<SortingState>(initialSorting ?? []);
  const table = useTable({
    features: tableFeatureSet,
    columns,
    data,
    getRowId: getRowId ? (row: T) => getRowId(row) : undefined,
    state: { sorting, globalFilter: filter ?? "" },
    onSortingChange: setSorting,
    globalFilterFn: "includesString",
    getColumnCanGlobalFilter: (column) => (searchColumns ?? []).includes(column.id),
    enableSortingRemoval: false,
  });
  const rows = table.getRowModel().rows;
  return (
    // `relative`: screen-reader-only text (absolutely positioned) stays inside the scrolling box.
    <div className="relative max-w-full overflow-x-auto rounded-lg bg-paper shadow-sm">
      <table className="w-full border-collapse text-sm" aria-label={label} data-testid={testId}>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} className="border-b border-ink/15 text-left">
              {group.headers.map((header) => {
                const col = header.column;
                const sorted = col.getIsSorted();
                const align =
                  (col.columnDef.meta as { align?: "right" } | undefined)?.align === "right"
                    ? "text-right"
                    : "text-left";
                return (
                  <th
                    key={header.id}
                    scope="col"
                    className={`px-3 py-2 font-semibold ${align}`}
                    aria-sort={
                      sorted === "asc"
                        ? "ascending"
                        : sorted === "desc"
                          ? "descending"
                          : col.getCanSort()
                            ? "none"
                            : undefined
                    }
                  >
                    {header.isPlaceholder ? null : col.getCanSort() ? (
                      <button
                        type="button"
                        onClick={col.getToggleSortingHandler()}
                        className="inline-flex items-center gap-1 rounded px-1 -mx-1 hover:bg-panel"
                      >
                        <table.FlexRender header={header} />
                        {sorted === "asc" ? (
                          <ArrowUp aria-hidden="true" className="h-3.5 w-3.5" />
                        ) : sorted === "desc" ? (
                          <ArrowDown aria-hidden="true" className="h-3.5 w-3.5" />
                        ) : (
                          <ArrowUpDown aria-hidden="true" className="h-3.5 w-3.5 text-ink-soft" />
                        )}
                        <span className="sr-only">
                          {sorted === "asc"
                            ? ", sorted from low to high"
                            : sorted === "desc"
                              ? ", sorted from high to low"
                              : ", select to sort"}
                        </span>
                      </button>
                    ) : (
                      <table.FlexRender header={header} />
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.length === 0 ? (
            <tr>
              <td colSpan={table.getAllLeafColumns().length} className="px-3 py-6 text-center text-ink-soft">
                {empty}
              </td>
            </tr>
          ) : (
            rows.map((row) => (
              <tr
                key={row.id}
                className={`border-b border-ink/10 last:border-0 ${rowClassName?.(row.original) ?? ""}`}
              >
                {row.getAllCells().map((cell) => {
                  const right =
                    (cell.column.columnDef.meta as { align?: "right" } | undefined)?.align === "right";
                  return (
                    <td key={cell.id} className={`px-3 py-2 align-top ${right ? "text-right" : ""}`}>
                      <table.FlexRender cell={cell} />
                    </td>
                  );
                })}
              </tr>
            ))
          )}
        </tbody>
      </table>
    </div>
  );
}
