import { formatAmount } from "~/lib/format";
/** "Planned and used": planned against issued quantity and cost per item, with the totals. */
import type { BuildOrderDetails } from "~/build-orders/build-order-details.server";
import { DataTable } from "~/components/data-table";

import { plannedAndUsedColumns } from "./planned-and-used-columns";

export function PlannedAndUsedPanel({ order }: { order: BuildOrderDetails }) {
  return (
    <section aria-labelledby="outcome-heading" className="space-y-2">
      <h2 id="outcome-heading" className="text-lg font-semibold">
        Planned and used
      </h2>
      <DataTable
        caption="Planned versus issued quantity and cost per item"
        columns={plannedAndUsedColumns(order.currency)}
        rows={order.lines}
      />
      <p className="text-sm text-graphite-700">
        Total planned{" "}
        <strong>
          {formatAmount(order.costs.plannedTotal)} {order.currency}
        </strong>{" "}
        at the moving average cost of stock when the order was made, issued{" "}
        <strong>
          {formatAmount(order.costs.actualTotal)} {order.currency}
        </strong>{" "}
        at the moving average cost of each issue.
      </p>
    </section>
  );
}
