/** "What the build needs": per item, needed, held, issued and where the stock is. */
import type { BuildOrderDetails } from "~/build-orders/build-order-details.server";
import { canReserve } from "~/build-orders/build-order-status";
import { DataTable } from "~/components/data-table";
import { buildOrderLineColumns } from "./build-order-line-columns";

export function NeedsPanel({ order }: { order: BuildOrderDetails }) {
  const shortCount = order.lines.filter((line) => line.short > 0).length;
  return (
    <section aria-labelledby="lines-heading" className="space-y-2">
      <h2 id="lines-heading" className="text-lg font-semibold">
        What the build needs
      </h2>
      <p className="text-sm text-graphite-500">
        Per motor × {order.quantity}; wire is the mass drawn from stock, scrap
        included.{" "}
        {shortCount > 0 && canReserve(order.status)
          ? `${shortCount} ${shortCount === 1 ? "item is" : "items are"} short.`
          : null}
      </p>
      <DataTable
        caption={`What ${order.reference} needs, holds and has been issued, and where the stock is`}
        columns={buildOrderLineColumns}
        rows={order.lines}
      />
    </section>
  );
}
