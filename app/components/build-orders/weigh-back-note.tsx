/** What weighing the spool back will issue, shown before the form is sent. */
import type { HeldSpot } from "~/build-orders/build-order-view";
import { formatQuantity } from "~/lib/format";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export function WeighBackNote({
  spot,
  netNowKg,
  issueKg,
}: {
  spot: HeldSpot;
  netNowKg: number;
  issueKg: number;
}) {
  return (
    <p role="status" className="rounded-md bg-graphite-50 px-4 py-3 text-sm">
      {issueKg > 0 ? (
        <>
          Issue <strong>{formatQuantity(issueKg, "kg", 3)}</strong>: the spool
          held {formatQuantity(spot.onHand, "kg", 3)} net and now holds{" "}
          {formatQuantity(netNowKg, "kg", 3)}.
          {issueKg > spot.quantity ? (
            <span className="mt-1 block text-danger">
              That is more than the {formatStockQuantity(spot.quantity, "kg")}{" "}
              held for this order here.
            </span>
          ) : null}
        </>
      ) : (
        <span className="text-danger">
          The spool weighs as much as or more than its recorded net: nothing to
          issue.
        </span>
      )}
    </p>
  );
}
