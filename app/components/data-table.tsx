import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
} from "@tanstack/react-table";
import { Link } from "react-router";

/**
 * The one table of Turnledger, on TanStack Table. Rows arrive a page at a
 * time from the loader (server-side pagination); this renders them and the
 * page links.
 */
export function DataTable<Row>({
  caption,
  columns,
  rows,
  page,
  pageCount,
  pageHref,
  emptyText = "Nothing here yet.",
}: {
  caption: string;
  columns: ColumnDef<Row, any>[]; // eslint-disable-line @typescript-eslint/no-explicit-any
  rows: Row[];
  page?: number;
  pageCount?: number;
  pageHref?: (page: number) => string;
  emptyText?: string;
}) {
  const table = useReactTable({
    data: rows,
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualPagination: true,
    pageCount: pageCount ?? 1,
  });
  return (
    <div className="panel overflow-x-auto p-0">
      <table className="data-table">
        <caption className="sr-only">{caption}</caption>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <th key={header.id} scope="col">
                  {header.isPlaceholder
                    ? null
                    : flexRender(header.column.columnDef.header, header.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.length === 0 ? (
            <tr>
              <td colSpan={columns.length} className="py-6 text-center text-graphite-500">
                {emptyText}
              </td>
            </tr>
          ) : (
            table.getRowModel().rows.map((row) => (
              <tr key={row.id}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
                ))}
              </tr>
            ))
          )}
        </tbody>
      </table>
      {page && pageCount && pageCount > 1 && pageHref ? (
        <nav aria-label="Pages" className="flex items-center justify-between border-t border-rule px-3 py-2 text-sm">
          <span className="text-graphite-500">
            Page {page} of {pageCount}
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
  );
}
