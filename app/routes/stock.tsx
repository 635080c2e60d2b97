import { createColumnHelper } from "~/lib/table-columns";
import { useMemo } from "react";
import { Link, redirect } from "react-router";
import type { Route } from "./+types/stock";
import { requireUser } from "~/auth/guard.server";
import { BelowReorderMark } from "~/components/below-reorder-mark";
import { DataTable } from "~/components/data-table";
import {
  IgnoredFilters,
  ListEmptyText,
} from "~/components/lists/list-search-form";
import { EmptyState } from "~/components/empty-state";
import { SortHeaderLink } from "~/components/sort-header-link";
import { StockListFilter } from "~/components/stock/stock-list-filter";
import { formatQuantity, formatAmount } from "~/lib/format";
import { userCan } from "~/lib/capabilities";
import { companyCurrency } from "~/purchasing/suppliers.server";
import { listItems, type ItemSortKey } from "~/stock/items.server";
import { stockCsvRowLimit } from "~/stock/stock-csv-row-limit";
import {
  exportSearch,
  itemListQueryOf,
  readStockListView,
  sortSearch,
  stockListPageSize,
  stockListSearch,
  type StockListView,
} from "~/stock/stock-list-view";
import {
  formatStockQuantity,
  itemKindLabel,
} from "~/stock/stock-quantity-text";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const { view, ignored } = readStockListView(
    new URL(request.url).searchParams,
  );
  const [{ total, totalExact, items }, currency] = await Promise.all([
    listItems(itemListQueryOf(view)),
    companyCurrency(),
  ]);
  // A search counted only so far (more than `total` match) has at least one more page.
  const pageCount = Math.max(
    1,
    Math.ceil((totalExact ? total : total + 1) / stockListPageSize),
  );
  // A page past the end (the list shrank since the link was made) shows the last one. A
  // count that stopped short is never past the end: it stopped beyond this page.
  if (totalExact && view.page > pageCount)
    throw redirect(`/stock${stockListSearch(view, { page: pageCount })}`);
  return {
    items,
    total,
    totalExact,
    pageCount,
    view,
    ignored,
    currency,
    canCreate: userCan(user, "keepCatalogue"),
  };
}

export const meta: Route.MetaFunction = () => [{ title: "Stock · Turnledger" }];

type Item = Route.ComponentProps["loaderData"]["items"][number];
const column = createColumnHelper<Item>();

function stockColumns(view: StockListView, currency: string) {
  const sortHeader = (label: string, key: ItemSortKey) => () => (
    <SortHeaderLink
      label={label}
      href={`/stock${sortSearch(view, key)}`}
      direction={view.sort === key ? view.order : false}
    />
  );
  return [
    column.accessor("sku", {
      header: sortHeader("SKU", "sku"),
      cell: (info) => (
        <Link
          to={`/stock/items/${encodeURIComponent(info.getValue())}`}
          className="font-medium whitespace-nowrap text-copper-700 underline-offset-2 hover:underline"
        >
          {info.getValue()}
        </Link>
      ),
    }),
    column.accessor("name", {
      header: sortHeader("Name", "name"),
      cell: (info) => (
        <>
          {info.getValue()}
          {info.row.original.active ? null : (
            <span className="ml-2 text-xs text-graphite-500">(archived)</span>
          )}
        </>
      ),
    }),
    column.accessor("kind", {
      header: sortHeader("Kind", "kind"),
      cell: (info) => itemKindLabel(info.getValue()),
    }),
    column.accessor("sizeOrGrade", {
      header: "Size or grade",
      cell: (info) => info.getValue() || "—",
    }),
    column.accessor("onHand", {
      header: sortHeader("On hand", "onHand"),
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatStockQuantity(info.getValue(), info.row.original.unit)}
        </span>
      ),
      meta: { numeric: true },
    }),
    column.accessor("reserved", {
      header: "Reserved",
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatStockQuantity(info.getValue(), info.row.original.unit)}
        </span>
      ),
      meta: { numeric: true },
    }),
    column.accessor("held", {
      header: "On hold",
      cell: (info) =>
        info.getValue() > 0 ? (
          <span className="whitespace-nowrap text-danger">
            {formatStockQuantity(info.getValue(), info.row.original.unit)}
          </span>
        ) : (
          <span className="text-graphite-500">—</span>
        ),
      meta: { numeric: true },
    }),
    column.accessor("available", {
      header: sortHeader("Available", "available"),
      cell: (info) => (
        <span className="whitespace-nowrap font-medium">
          {formatStockQuantity(info.getValue(), info.row.original.unit)}
        </span>
      ),
      meta: { numeric: true },
    }),
    column.accessor("onOrder", {
      // Not sortable: items.on_order has no index (adding one needs a migration).
      header: "On order",
      cell: (info) => (
        <span
          className={`whitespace-nowrap ${info.getValue() > 0 ? "" : "text-graphite-500"}`}
        >
          {formatStockQuantity(info.getValue(), info.row.original.unit)}
        </span>
      ),
      meta: { numeric: true },
    }),
    column.accessor("reorderPoint", {
      header: "Reorder point",
      cell: (info) =>
        info.getValue() > 0 ? (
          <span className="flex flex-col items-end gap-1 whitespace-nowrap">
            {formatStockQuantity(info.getValue(), info.row.original.unit)}
            {info.row.original.belowReorder ? (
              <BelowReorderMark label="Below" />
            ) : null}
          </span>
        ) : (
          <span className="text-graphite-500">not set</span>
        ),
      meta: { numeric: true },
    }),
    column.accessor("value", {
      header: sortHeader(`Value (${currency})`, "value"),
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatAmount(info.getValue())}
        </span>
      ),
      meta: { numeric: true },
    }),
  ];
}

export default function Stock({ loaderData }: Route.ComponentProps) {
  const {
    items,
    total,
    totalExact,
    pageCount,
    view,
    ignored,
    currency,
    canCreate,
  } = loaderData;
  const columns = useMemo(() => stockColumns(view, currency), [view, currency]);
  const first = (view.page - 1) * stockListPageSize + 1;
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-semibold">Stock</h1>
          <p className="mt-1 text-graphite-500">
            Wire, magnets and other parts with what is on hand, reserved for
            build orders, free to use and still to come on sent orders.
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          <a
            href={`/stock/export.csv${exportSearch(view)}`}
            download
            className="button-quiet"
          >
            Export CSV
          </a>
          {canCreate ? (
            <Link to="/stock/items/new" className="button-primary">
              New item
            </Link>
          ) : null}
        </div>
      </div>

      <StockListFilter view={view} />

      <IgnoredFilters names={ignored} />

      <p role="status" className="text-sm text-graphite-700">
        {total === 0
          ? "No item matches."
          : `${totalExact ? "" : "More than "}${formatQuantity(total, total === 1 ? "item" : "items")} · showing ${formatQuantity(first, "")}–${formatQuantity(first + items.length - 1, "")}`}
        {total > stockCsvRowLimit
          ? ` · the CSV export holds the first ${formatQuantity(stockCsvRowLimit, "")} rows of this view`
          : ""}
      </p>

      <DataTable
        caption="Stock items"
        columns={columns}
        rows={items}
        page={view.page}
        pageCount={pageCount}
        pageCountExact={totalExact}
        pageHref={(page) => `/stock${stockListSearch(view, { page })}`}
        emptyText={
          <ListEmptyText
            filtered={
              stockListSearch(view, { page: 1, sort: "sku", order: "asc" }) !==
              ""
            }
            clearHref="/stock"
            emptyText={
              <EmptyState
                message="The catalogue is empty."
                next={{
                  capability: "keepCatalogue",
                  to: "/stock/items/new",
                  label: "Add the first item",
                  does: "add items to the catalogue",
                }}
              />
            }
          />
        }
      />
      <p className="text-xs text-graphite-500">
        Available = on hand − reserved − on hold (lots under a quality block).
        On order = still to come on sent purchase orders. Value = on hand ×
        moving average cost, in {currency} (the company currency).
      </p>
    </div>
  );
}
