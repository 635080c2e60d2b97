/** The top of the order page: back to the list, the order's reference, status, what it builds and who made it. */
import { Link } from "react-router";
import type { BuildOrderDetails } from "~/build-orders/build-order-details.server";
import { canReserve } from "~/build-orders/build-order-status";
import { formatDateTime, formatQuantity } from "~/lib/format";
import { BuildOrderStatusBadge } from "./build-order-status-badge";
import { BackLink } from "~/components/back-link";

export function BuildOrderHeading({ order }: { order: BuildOrderDetails }) {
  return (
    <>
      <p className="text-sm">
        <BackLink to="/build-orders">Build orders</BackLink>
      </p>

      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="flex items-center gap-2 text-sm font-medium text-graphite-500">
            Build order{" "}
            <span className="text-graphite-900">{order.reference}</span>
            <BuildOrderStatusBadge status={order.status} />
          </p>
          <h1 className="mt-1 text-2xl font-semibold">
            {formatQuantity(order.quantity, "×")} {order.design.name}{" "}
            <span className="font-normal text-graphite-500">
              revision {order.revision}
            </span>
          </h1>
          <p className="mt-1 text-sm text-graphite-700">
            Made by {order.createdBy} · {formatDateTime(order.createdAt)}
            {order.note ? ` · ${order.note}` : ""}
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          {canReserve(order.status) ? (
            <Link
              to={`/build-orders/${order.id}/pick-list`}
              className="button-quiet"
            >
              Print pick list
            </Link>
          ) : null}
          <Link
            to={`/designs/${order.design.id}/revisions/${order.revision}`}
            className="button-quiet"
          >
            The design
          </Link>
        </div>
      </div>
    </>
  );
}
