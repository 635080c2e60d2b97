/**
 * The table a page shows its list in: `DataTableView` (TanStack Table, about 14 KB
 * gzipped) whose code loads with import() instead of with the page, so it is not
 * first-load JavaScript (docs/decisions/054-data-table-after-hydration.md).
 *
 * The server renders the table whole. In the browser the chunk starts loading as
 * soon as this module runs (before React hydrates the page), and until it has come
 * React keeps the server's table in place (a lazy component inside Suspense), so
 * nothing moves. Meanwhile the table's links and forms work as they do without
 * JavaScript. After a navigation in the browser the chunk is there already.
 *
 * A table whose controls need JavaScript from the first moment (sorted or filtered
 * in the browser, a cell's button that opens a dialog) uses `DataTableView` directly.
 */
import { lazy, Suspense, type ComponentType } from "react";
import { DataTableView, type DataTableProps } from "./data-table-view";

export type {
  DataTableProps,
  TableFacet,
  TableSearch,
} from "./data-table-view";

const loadView = () =>
  import("./data-table-view").then((module) => ({
    default: module.DataTableView as ComponentType<DataTableProps<unknown>>,
  }));

// In the browser: begin loading at once, not when React first renders a table.
if (!import.meta.env.SSR) void loadView();

/** On the server the table itself (rendered whole into the page); in the browser loaded after the page runs. */
const View: ComponentType<DataTableProps<unknown>> = import.meta.env.SSR
  ? (DataTableView as ComponentType<DataTableProps<unknown>>)
  : lazy(loadView);

export function DataTable<Row>(props: DataTableProps<Row>) {
  return (
    // Only after a navigation in the browser, before the chunk has come (rare): the caption holds the place.
    <Suspense
      fallback={
        <div className="panel p-3 text-sm text-graphite-500" aria-busy="true">
          {props.caption}
        </div>
      }
    >
      <View {...(props as DataTableProps<unknown>)} />
    </Suspense>
  );
}
