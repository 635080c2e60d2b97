import { formatAmount } from "~/lib/format";
/** The order's figures in a row: motors, status, planned cost per motor and what has been issued per motor. */
import type { BuildOrderDetails } from "~/build-orders/build-order-details.server";
import { buildOrderStatusLabels } from "~/build-orders/build-order-status";
import { PriceBasisNote } from "~/components/design/price-basis-note";
import { SummaryFigure } from "~/components/summary-figure";
import { countText } from "~/lib/unit-text";

export function BuildOrderSummary({
  order,
  anyIssued,
}: {
  order: BuildOrderDetails;
  anyIssued: boolean;
}) {
  return (
    <dl className="panel grid grid-cols-2 gap-4 sm:grid-cols-4">
      <SummaryFigure
        label="Motors"
        value={countText(order.quantity, "motor")}
        emphasis
      />
      <SummaryFigure
        label="Status"
        value={buildOrderStatusLabels[order.status]}
      />
      <SummaryFigure
        label="Planned cost per motor"
        value={
          <>
            {formatAmount(order.costs.plannedPerMotor)} {order.currency}
            <PriceBasisNote
              basis="stock-average"
              after=" when the order was made"
              className="block"
            />
            {order.costs.plannedComplete ? null : (
              <span className="block text-xs text-graphite-500">
                some items had no cost yet
              </span>
            )}
          </>
        }
      />
      <SummaryFigure
        label={
          order.status === "complete"
            ? "Actual cost per motor"
            : "Issued so far, per motor"
        }
        value={
          anyIssued
            ? `${formatAmount(order.costs.actualPerMotor)} ${order.currency}`
            : "—"
        }
        emphasis={order.status === "complete"}
      />
    </dl>
  );
}
