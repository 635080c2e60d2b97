import { createColumnHelper } from "~/lib/table-columns";
import { Link } from "react-router";
import { z } from "zod";
import type { Route } from "./+types/alerts";
import { purchaseRequestsBySupplier } from "~/alerts/purchase-requests.server";
import { alertsPageSize, listAlerts } from "~/alerts/stock-alerts.server";
import { requireUser } from "~/auth/guard.server";
import { AlertState } from "~/components/alerts/alert-state";
import { DataTable } from "~/components/data-table";
import {
  IgnoredFilters,
  ListEmptyText,
  ListSearchForm,
} from "~/components/lists/list-search-form";
import { EmptyState } from "~/components/empty-state";
import { OrderFromAlertButton } from "~/components/purchase-orders/order-from-alert-button";
import { formatDateTime } from "~/lib/format";
import { userCan } from "~/lib/capabilities";
import { readPageOrLast } from "~/lib/search-params";
import {
  listHref,
  readListFilters,
  searchPageSchema,
} from "~/lib/list-filters";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

const statuses = ["open", "closed", "all"] as const;

const alertListSchema = searchPageSchema.extend({
  status: z
    .enum(statuses, { error: "status must be open, closed or all." })
    .default("open"),
});

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const { query, ignored } = readListFilters(
    alertListSchema,
    new URL(request.url).searchParams,
  );
  const { status, search } = query;
  const { alerts, total, page, pageCount } = await readPageOrLast(
    query.page,
    alertsPageSize,
    (page) => listAlerts({ status, search, page }),
  );
  const canBuy = userCan(user, "draftPurchaseRequests");
  const requests = canBuy
    ? [...(await purchaseRequestsBySupplier())].map(([supplier, lines]) => ({
        supplier,
        items: lines.length,
      }))
    : [];
  return {
    status,
    search,
    ignored,
    canOrder: userCan(user, "orderPurchases"),
    alerts,
    page,
    pageCount,
    total,
    canBuy,
    requests,
  };
}

export const meta: Route.MetaFunction = () => [
  { title: "Low-stock alerts · Turnledger" },
];

type Alert = Route.ComponentProps["loaderData"]["alerts"][number];
const column = createColumnHelper<Alert>();
const columns = [
  column.accessor("sku", {
    header: "Item",
    cell: (info) => (
      <span>
        <Link
          to={`/stock/items/${encodeURIComponent(info.getValue())}`}
          className="font-medium text-copper-700 underline-offset-2 hover:underline"
        >
          {info.getValue()}
        </Link>{" "}
        <span className="text-graphite-500">{info.row.original.name}</span>
      </span>
    ),
  }),
  column.accessor("status", {
    header: "State",
    cell: (info) => (
      <AlertState
        status={info.getValue()}
        coveredBy={info.row.original.coveredBy}
      />
    ),
  }),
  column.accessor("availableAtOpen", {
    header: "Available when opened",
    meta: { numeric: true },
    cell: (info) =>
      formatStockQuantity(info.getValue(), info.row.original.unit),
  }),
  column.accessor("availableNow", {
    header: "Available now",
    meta: { numeric: true },
    cell: (info) =>
      formatStockQuantity(info.getValue(), info.row.original.unit),
  }),
  column.accessor("reorderPoint", {
    header: "Reorder point",
    meta: { numeric: true },
    cell: (info) =>
      formatStockQuantity(info.getValue(), info.row.original.unit),
  }),
  column.accessor("openedAt", {
    header: "Opened",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatDateTime(info.getValue())}
      </span>
    ),
  }),
  column.accessor("closedAt", {
    header: "Closed",
    cell: (info) => {
      const value = info.getValue();
      return value ? (
        <span className="whitespace-nowrap">{formatDateTime(value)}</span>
      ) : (
        "—"
      );
    },
  }),
  column.accessor("told", {
    header: "Who was told",
    enableSorting: false,
    cell: (info) => {
      const told = info.getValue();
      if (told.length === 0)
        return <span className="text-graphite-500">nobody</span>;
      return (
        <ul className="text-xs">
          {told.map((notice) => (
            <li key={`${notice.email}-${notice.at}`}>
              {notice.name} ({notice.kind === "digest" ? "digest" : "e-mail"},{" "}
              {formatDateTime(notice.at)})
            </li>
          ))}
        </ul>
      );
    },
  }),
];

/** Buyers make a draft purchase order from each open alert. */
const orderColumn = column.display({
  id: "order",
  header: () => <span className="sr-only">Order</span>,
  cell: ({ row }) =>
    row.original.status === "open" ? (
      <OrderFromAlertButton alertId={row.original.id} sku={row.original.sku} />
    ) : null,
});

export default function Alerts({ loaderData }: Route.ComponentProps) {
  const {
    status,
    search,
    ignored,
    alerts,
    page,
    pageCount,
    total,
    canBuy,
    canOrder,
    requests,
  } = loaderData;
  /** The list's address; the open alerts are the default and stay out of it. */
  const alertsHref = (changes: { status?: string; page?: number }) =>
    listHref("/alerts", {
      search,
      status:
        (changes.status ?? status) === "open"
          ? undefined
          : (changes.status ?? status),
      page: changes.page,
    });
  return (
    <div>
      <div className="mb-4 flex flex-wrap items-baseline justify-between gap-3">
        <h1 className="text-2xl font-semibold">Low-stock alerts</h1>
        <nav aria-label="Which alerts" className="flex gap-4 text-sm">
          {statuses.map((choice) => (
            <Link
              key={choice}
              to={alertsHref({ status: choice })}
              aria-current={choice === status ? "page" : undefined}
              className={
                choice === status
                  ? "font-semibold text-graphite-900 underline underline-offset-4"
                  : "font-medium text-copper-700 underline-offset-2 hover:underline"
              }
            >
              {choice === "open"
                ? "Open"
                : choice === "closed"
                  ? "Closed"
                  : "All"}
            </Link>
          ))}
        </nav>
      </div>
      <p className="mb-4 max-w-3xl text-sm text-graphite-700">
        An alert opens when an item&apos;s available stock (on hand less
        reserved) falls below its reorder point, and closes by itself when it is
        back at or above it. Buyers get an e-mail for each new alert, or a daily
        digest, as chosen on their account page. An alert that sent orders due
        within the item&apos;s lead time make good is marked covered and e-mails
        nobody.
      </p>
      {canBuy ? (
        <section aria-labelledby="purchase-requests" className="mb-6 panel">
          <h2 id="purchase-requests" className="mb-2 text-lg font-semibold">
            Draft purchase requests
          </h2>
          {requests.length === 0 ? (
            <p className="text-sm text-graphite-700">
              No supplier quotes an item with an open alert.
            </p>
          ) : (
            <ul className="space-y-1 text-sm">
              {requests.map((request) => (
                <li key={request.supplier}>
                  <a
                    href={`/alerts/purchase-request.csv?supplier=${encodeURIComponent(request.supplier)}`}
                    className="font-medium text-copper-700 underline-offset-2 hover:underline"
                    download
                  >
                    {request.supplier}
                  </a>{" "}
                  <span className="tabular-nums text-graphite-500">
                    · {request.items} item{request.items === 1 ? "" : "s"} (CSV)
                  </span>
                </li>
              ))}
            </ul>
          )}
        </section>
      ) : null}
      <div className="mb-4 space-y-3">
        <ListSearchForm
          path="/alerts"
          label="Search the alerts"
          search={{ value: search, placeholder: "SKU, name or size" }}
          filtered={Boolean(search)}
          keep={{ status: status === "open" ? undefined : status }}
        />
        <IgnoredFilters names={ignored} />
      </div>
      <DataTable
        caption={`${total} ${status === "all" ? "" : `${status} `}alert${total === 1 ? "" : "s"}, newest first`}
        columns={canOrder ? [...columns, orderColumn] : columns}
        rows={alerts}
        page={page}
        pageCount={pageCount}
        pageHref={(next) => alertsHref({ page: next })}
        emptyText={
          <ListEmptyText
            filtered={Boolean(search)}
            clearHref="/alerts"
            emptyText={
              status === "open" ? (
                <EmptyState
                  tone="good"
                  message="No item is below its reorder point: nothing needs ordering."
                />
              ) : (
                <EmptyState message="No alerts here." />
              )
            }
          />
        }
      />
    </div>
  );
}
