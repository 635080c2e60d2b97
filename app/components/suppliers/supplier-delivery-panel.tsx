/** How the supplier has delivered over the last 12 months: on time and in full, with what is counted. */
import { SummaryFigure } from "~/components/summary-figure";
import { formatDay } from "~/lib/format";
import {
  rateText,
  type DeliveryPerformance,
} from "~/purchase-orders/delivery-performance";

export function SupplierDeliveryPanel({
  performance,
}: {
  performance: DeliveryPerformance;
}) {
  const { lines, onTime, inFull, from, to } = performance;
  return (
    <section aria-labelledby="deliveries-heading" className="panel space-y-2">
      <h2 id="deliveries-heading" className="text-lg font-semibold">
        Deliveries{" "}
        <span className="font-normal text-graphite-500">
          · {formatDay(from)} to {formatDay(to)}
        </span>
      </h2>
      {lines === 0 ? (
        <p className="text-sm text-graphite-700">
          No deliveries in the last 12 months.
        </p>
      ) : (
        <>
          <dl className="grid grid-cols-2 gap-4">
            <SummaryFigure
              label="On time"
              value={rateText(onTime, lines)}
              emphasis
            />
            <SummaryFigure
              label="In full"
              value={rateText(inFull, lines)}
              emphasis
            />
          </dl>
          <p className="text-xs text-graphite-500">
            Order lines finished in these 12 months: received in full, or closed
            short. On time: received in full on or before the expected day. In
            full: at least the ordered quantity; a line closed short is neither.
          </p>
        </>
      )}
    </section>
  );
}
