import { Link } from "react-router";
import type { Route } from "./+types/purchase-orders";
import { requireUser } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import { ListEmptyText } from "~/components/lists/list-search-form";
import { isFiltered } from "~/lib/list-filters";
import { EmptyState } from "~/components/empty-state";
import { PurchaseOrderFilters } from "~/components/purchase-orders/purchase-order-filters";
import { purchaseOrderListColumns } from "~/components/purchase-orders/purchase-order-list-columns";
import { userCan } from "~/lib/capabilities";
import { readPageOrLast } from "~/lib/search-params";
import { countText } from "~/lib/unit-text";
import { listPurchaseOrders } from "~/purchase-orders/purchase-order-details.server";
import {
  purchaseOrderListHref,
  purchaseOrderListQueryFrom,
} from "~/purchase-orders/purchase-order-list-address";
import { purchaseOrderStatusLabels } from "~/purchase-orders/purchase-order-status";
import { listSuppliers } from "~/purchasing/suppliers.server";

const pageSize = 25;

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const { filter, page } = purchaseOrderListQueryFrom(
    new URL(request.url).searchParams,
  );
  const [list, suppliers] = await Promise.all([
    readPageOrLast(page, pageSize, (asked) =>
      listPurchaseOrders({ ...filter, page: asked, pageSize }),
    ),
    listSuppliers(),
  ]);
  return {
    orders: list.orders,
    total: list.total,
    page: list.page,
    pageCount: list.pageCount,
    filter,
    suppliers: suppliers.map(({ id, name }) => ({ id, name })),
    canOrder: userCan(user, "orderPurchases"),
  };
}

export const meta: Route.MetaFunction = () => [
  { title: "Purchase orders · Turnledger" },
];

export default function PurchaseOrders({ loaderData }: Route.ComponentProps) {
  const { orders, total, page, pageCount, filter, suppliers, canOrder } =
    loaderData;
  return (
    <section aria-labelledby="purchase-orders-heading" className="space-y-4">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h1 id="purchase-orders-heading" className="text-2xl font-semibold">
            Purchase orders
          </h1>
          <p className="mt-1 text-graphite-500">
            What we ordered from suppliers, what is still to come and when.
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          <Link to="/purchase-orders/late" className="button-quiet">
            Late lines
          </Link>
          {canOrder ? (
            <Link to="/purchase-orders/new" className="button-primary">
              New order
            </Link>
          ) : null}
        </div>
      </div>
      <PurchaseOrderFilters filter={filter} suppliers={suppliers} />
      <DataTable
        caption="Purchase orders, newest first"
        columns={purchaseOrderListColumns}
        rows={orders}
        page={page}
        pageCount={pageCount}
        pageHref={(target) => purchaseOrderListHref(filter, target)}
        emptyText={
          filter.status && !filter.search && !filter.supplierId ? (
            <EmptyState
              message={`No order is ${purchaseOrderStatusLabels[filter.status].toLowerCase()}.`}
              clear={{ to: "/purchase-orders", label: "Show every order" }}
            />
          ) : (
            <ListEmptyText
              filtered={isFiltered({ ...filter })}
              clearHref="/purchase-orders"
              emptyText={
                <EmptyState
                  message="No purchase orders yet."
                  next={{
                    capability: "orderPurchases",
                    to: "/purchase-orders/new",
                    label: "Write a purchase order",
                    does: "write purchase orders",
                  }}
                />
              }
            />
          )
        }
      />
      {total > 0 ? (
        <p className="text-sm text-graphite-500">{countText(total, "order")}</p>
      ) : null}
    </section>
  );
}
