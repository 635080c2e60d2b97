/**
 * TanStack Table's createColumnHelper (the same typed column definitions, built the
 * same way), from a module of its own: @tanstack/table-core is a single module, so a
 * page that imported the helper from it loaded all of TanStack Table with the page,
 * although the table itself loads after the page runs (components/data-table.tsx). Column
 * definitions are made with this one; the ESLint config refuses the library's.
 * See docs/decisions/054-data-table-after-hydration.md.
 */
import type { ColumnHelper, RowData } from "@tanstack/react-table";

export function createColumnHelper<
  TData extends RowData,
>(): ColumnHelper<TData> {
  return {
    accessor: (accessor, column) =>
      typeof accessor === "function"
        ? { ...column, accessorFn: accessor }
        : { ...column, accessorKey: accessor },
    display: (column) => column,
    group: (column) => column,
  } as ColumnHelper<TData>;
}
