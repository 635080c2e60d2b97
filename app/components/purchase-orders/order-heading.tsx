/** The order's heading: number, supplier and status; who drafted it, when it went out, why it ended; print and receive links. */
import { Link } from "react-router";
import type { PurchaseOrderView } from "~/purchase-orders/purchase-order-details.server";
import { formatDateTime, formatDay } from "~/lib/format";
import { formatMoney } from "~/pricing/money";
import { PurchaseOrderStatusBadge } from "./purchase-order-status-badge";
import { BackLink } from "~/components/back-link";

export function OrderHeading({
  order,
  canReceiveHere,
}: {
  order: PurchaseOrderView;
  /** A storekeeper, and the order is waiting for deliveries. */
  canReceiveHere: boolean;
}) {
  return (
    <header className="space-y-2">
      <p className="text-sm">
        <BackLink to="/purchase-orders">Purchase orders</BackLink>
      </p>
      <div className="flex flex-wrap items-start justify-between gap-3">
        <h1 className="flex flex-wrap items-center gap-3 text-2xl font-semibold">
          {order.number}
          <span className="font-normal text-graphite-700">
            {order.supplier.name}
          </span>
          <PurchaseOrderStatusBadge status={order.status} />
        </h1>
        <div className="flex flex-wrap gap-2">
          {canReceiveHere ? (
            <Link
              to={`/stock/receive?order=${order.number}`}
              className="button-primary"
            >
              Receive against this order
            </Link>
          ) : null}
          <Link
            to={`/purchase-orders/${order.id}/print`}
            className="button-quiet"
          >
            Printable order
          </Link>
        </div>
      </div>
      <p className="text-sm text-graphite-700">
        Drafted by {order.createdBy}, {formatDateTime(order.createdAt)}
        {order.orderedOn
          ? ` · ordered on ${formatDay(order.orderedOn)}`
          : ""} ·{" "}
        <Link
          to={`/suppliers/${order.supplier.id}`}
          className="text-copper-700 underline underline-offset-2"
        >
          supplier&apos;s page
        </Link>{" "}
        · total{" "}
        <strong>
          {formatMoney(order.total, order.currency, { decimals: 2 })}
        </strong>
      </p>
      {order.endReason ? (
        <p className="text-sm text-caution">
          {order.status === "cancelled" ? "Cancelled" : "Closed short"}:{" "}
          {order.endReason}
        </p>
      ) : null}
      {order.notes ? (
        <p className="text-sm whitespace-pre-line">Notes: {order.notes}</p>
      ) : null}
    </header>
  );
}
