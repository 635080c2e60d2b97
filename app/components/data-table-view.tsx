import {
  flexRender,
  getCoreRowModel,
  getFacetedRowModel,
  getFacetedUniqueValues,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type Column,
  type ColumnDef,
  type ColumnFiltersState,
  type RowData,
  type SortingState,
} from "@tanstack/react-table";
import { useId, useMemo, useState } from "react";
import { Link } from "react-router";
import { TableScroll } from "./table-scroll";

declare module "@tanstack/react-table" {
  // eslint-disable-next-line @typescript-eslint/no-unused-vars -- the parameters must match TanStack's own declaration
  interface ColumnMeta<TData extends RowData, TValue> {
    /** Right-aligns the column, so figures line up. */
    numeric?: boolean;
  }
}

/** A text box that keeps the rows whose named columns contain the typed text. */
export interface TableSearch {
  label: string;
  placeholder?: string;
  /** Column ids searched; by default every column whose values are text or numbers. */
  columnIds?: string[];
}

/** A choice list that keeps the rows whose column equals the chosen value. */
export interface TableFacet {
  columnId: string;
  label: string;
  /** How a value is shown in the list; the value itself by default. */
  optionLabel?: (value: string) => string;
}

/** What a table is given: its rows, its columns and how it pages, sorts and filters. */
export interface DataTableProps<Row> {
  caption: string;
  columns: ColumnDef<Row, any>[]; // eslint-disable-line @typescript-eslint/no-explicit-any
  rows: Row[];
  page?: number;
  pageCount?: number;
  /** False when the list counted its rows only so far: there are at least `pageCount` pages. */
  pageCountExact?: boolean;
  pageHref?: (page: number) => string;
  /** What an empty list says: a sentence, or an `EmptyState` with the next step. */
  emptyText?: React.ReactNode;
  sortable?: boolean;
  initialSorting?: SortingState;
  search?: TableSearch;
  facets?: TableFacet[];
  /** Known to be wider than its panel (many columns): reachable by keyboard from the first paint, without waiting for a measurement. */
  widerThanPanel?: boolean;
}

/**
 * The one table of Turnledger, on TanStack Table, loaded with the page. A page
 * uses `DataTable` (data-table.tsx), which loads this after the page runs; a table
 * whose controls need JavaScript from the first moment (sorted or filtered in the
 * browser, a cell's button that opens a dialog) uses this directly.
 *
 * Long lists arrive a page at a time from the loader (server-side pagination:
 * `page`, `pageCount`, `pageHref`). Short reference lists (a few hundred rows
 * at most) can instead be sorted and filtered in the browser: `sortable`,
 * `search` and `facets`.
 */
export function DataTableView<Row>({
  caption,
  columns,
  rows,
  page,
  pageCount,
  pageCountExact = true,
  pageHref,
  emptyText = "Nothing here yet.",
  sortable = false,
  initialSorting = [],
  search,
  facets = [],
  widerThanPanel = false,
}: DataTableProps<Row>) {
  const [sorting, setSorting] = useState<SortingState>(initialSorting);
  const [globalFilter, setGlobalFilter] = useState("");
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const filtering = Boolean(search) || facets.length > 0;
  // A facet keeps exact matches ("AWG" is not "AWG-ish").
  const tableColumns = useMemo(
    () =>
      facets.length === 0
        ? columns
        : columns.map((column) =>
            facets.some((facet) => facet.columnId === columnIdOf(column))
              ? { ...column, filterFn: "equalsString" as const }
              : column,
          ),
    [columns, facets],
  );
  const table = useReactTable({
    data: rows,
    columns: tableColumns,
    state: { sorting, globalFilter, columnFilters },
    onSortingChange: setSorting,
    onGlobalFilterChange: setGlobalFilter,
    onColumnFiltersChange: setColumnFilters,
    enableSorting: sortable,
    // The first click sorts ascending (smallest, or A, first) for every column.
    sortDescFirst: false,
    enableFilters: filtering,
    globalFilterFn: "includesString",
    getColumnCanGlobalFilter: search?.columnIds
      ? (column) => search.columnIds!.includes(column.id)
      : undefined,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: sortable ? getSortedRowModel() : undefined,
    getFilteredRowModel: filtering ? getFilteredRowModel() : undefined,
    getFacetedRowModel: facets.length > 0 ? getFacetedRowModel() : undefined,
    getFacetedUniqueValues:
      facets.length > 0 ? getFacetedUniqueValues() : undefined,
    manualPagination: true,
    pageCount: pageCount ?? 1,
  });
  const shown = table.getRowModel().rows;
  return (
    <div className="space-y-2">
      {filtering ? (
        <TableFilters
          search={search}
          searchValue={globalFilter}
          onSearch={setGlobalFilter}
          facets={facets.map((facet) => ({
            facet,
            column: table.getColumn(facet.columnId),
          }))}
          shownCount={shown.length}
          totalCount={rows.length}
        />
      ) : null}
      <div className="panel p-0">
        <TableScroll label={caption} widerThanPanel={widerThanPanel}>
          <table className="data-table">
            <caption className="sr-only">{caption}</caption>
            <thead>
              {table.getHeaderGroups().map((group) => (
                <tr key={group.id}>
                  {group.headers.map((header) => {
                    const direction = header.column.getIsSorted();
                    const content = header.isPlaceholder
                      ? null
                      : flexRender(
                          header.column.columnDef.header,
                          header.getContext(),
                        );
                    return (
                      <th
                        key={header.id}
                        scope="col"
                        className={
                          header.column.columnDef.meta?.numeric
                            ? "text-right"
                            : undefined
                        }
                        aria-sort={
                          direction === "asc"
                            ? "ascending"
                            : direction === "desc"
                              ? "descending"
                              : undefined
                        }
                      >
                        {header.column.getCanSort() ? (
                          <button
                            type="button"
                            onClick={header.column.getToggleSortingHandler()}
                            className="inline-flex items-center gap-1 text-left font-semibold hover:text-copper-700"
                          >
                            {content}
                            <SortMark direction={direction} />
                          </button>
                        ) : (
                          content
                        )}
                      </th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody>
              {shown.length === 0 ? (
                <tr>
                  <td
                    colSpan={columns.length}
                    className="py-6 text-center text-graphite-500"
                  >
                    {filtering && rows.length > 0
                      ? "No row matches the filter."
                      : emptyText}
                  </td>
                </tr>
              ) : (
                shown.map((row) => (
                  <tr key={row.id}>
                    {row.getVisibleCells().map((cell) => (
                      <td
                        key={cell.id}
                        className={
                          cell.column.columnDef.meta?.numeric
                            ? "text-right"
                            : undefined
                        }
                      >
                        {flexRender(
                          cell.column.columnDef.cell,
                          cell.getContext(),
                        )}
                      </td>
                    ))}
                  </tr>
                ))
              )}
            </tbody>
          </table>
        </TableScroll>
        {page && pageCount && pageCount > 1 && pageHref ? (
          <nav
            aria-label="Pages"
            className="flex items-center justify-between border-t border-rule px-3 py-2 text-sm"
          >
            <span className="text-graphite-500">
              {pageCountExact ? (
                <>
                  Page {page} of {pageCount}
                </>
              ) : (
                <>
                  Page {page} of at least {pageCount}
                </>
              )}
            </span>
            <span className="flex gap-2">
              {page > 1 ? (
                <Link className="button-quiet" to={pageHref(page - 1)}>
                  Previous
                </Link>
              ) : null}
              {page < pageCount ? (
                <Link className="button-quiet" to={pageHref(page + 1)}>
                  Next
                </Link>
              ) : null}
            </span>
          </nav>
        ) : null}
      </div>
    </div>
  );
}

function columnIdOf<Row>(column: ColumnDef<Row, unknown>): string | undefined {
  if (column.id) return column.id;
  return "accessorKey" in column && typeof column.accessorKey === "string"
    ? column.accessorKey
    : undefined;
}

function SortMark({ direction }: { direction: false | "asc" | "desc" }) {
  return (
    <span
      aria-hidden="true"
      className={direction ? "text-copper-600" : "text-graphite-300"}
    >
      {direction === "asc" ? "▲" : direction === "desc" ? "▼" : "↕"}
    </span>
  );
}

function TableFilters<Row>({
  search,
  searchValue,
  onSearch,
  facets,
  shownCount,
  totalCount,
}: {
  search?: TableSearch;
  searchValue: string;
  onSearch: (value: string) => void;
  facets: { facet: TableFacet; column: Column<Row, unknown> | undefined }[];
  shownCount: number;
  totalCount: number;
}) {
  const id = useId();
  return (
    <div className="flex flex-wrap items-end gap-4 print:hidden">
      {search ? (
        <div>
          <label htmlFor={`${id}-search`} className="field-label">
            {search.label}
          </label>
          <input
            id={`${id}-search`}
            type="search"
            value={searchValue}
            onChange={(event) => onSearch(event.target.value)}
            placeholder={search.placeholder}
            autoComplete="off"
            className="field-input w-56"
          />
        </div>
      ) : null}
      {facets.map(({ facet, column }) =>
        column ? (
          <div key={facet.columnId}>
            <label htmlFor={`${id}-${facet.columnId}`} className="field-label">
              {facet.label}
            </label>
            <select
              id={`${id}-${facet.columnId}`}
              value={(column.getFilterValue() as string | undefined) ?? ""}
              onChange={(event) =>
                column.setFilterValue(event.target.value || undefined)
              }
              className="field-input w-48"
            >
              <option value="">All</option>
              {[...column.getFacetedUniqueValues().keys()]
                .filter((value): value is string => typeof value === "string")
                .sort()
                .map((value) => (
                  <option key={value} value={value}>
                    {facet.optionLabel ? facet.optionLabel(value) : value}
                  </option>
                ))}
            </select>
          </div>
        ) : null,
      )}
      <p role="status" className="pb-2 text-sm text-graphite-500">
        {shownCount === totalCount
          ? `${totalCount} rows`
          : `${shownCount} of ${totalCount} rows`}
      </p>
    </div>
  );
}
