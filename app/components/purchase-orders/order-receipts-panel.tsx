/** Deliveries booked against the order: when, by whom, what of which line, each with its movements in the journal. */
import { Link } from "react-router";
import type { PurchaseOrderView } from "~/purchase-orders/purchase-order-details.server";
import { quantityToNumber } from "~/lib/decimal-amounts";
import { formatDay } from "~/lib/format";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export function OrderReceiptsPanel({
  order,
  canPrintLabels = false,
}: {
  order: PurchaseOrderView;
  /** Offer each delivery's lot labels (app/routes/labels-lots.tsx). */
  canPrintLabels?: boolean;
}) {
  const lineOf = new Map(order.lines.map((line) => [line.id, line]));
  return (
    <section aria-labelledby="order-receipts-heading" className="panel">
      <h2 id="order-receipts-heading" className="mb-3 text-lg font-semibold">
        Deliveries received
      </h2>
      {order.receipts.length === 0 ? (
        <p className="text-sm text-graphite-500">Nothing received yet.</p>
      ) : (
        <ol className="space-y-3">
          {order.receipts.map((receipt) => (
            <li key={receipt.id} className="text-sm">
              <p className="font-medium">
                {formatDay(receipt.receivedOn)} · {receipt.person}
                {canPrintLabels ? (
                  <>
                    {" · "}
                    <Link
                      to={`/labels/lots?receipt=${receipt.id}`}
                      className="font-normal text-copper-700 underline underline-offset-2"
                    >
                      Print labels
                    </Link>
                  </>
                ) : null}
              </p>
              <ul className="text-graphite-700">
                {receipt.lines.map((part) => {
                  const line = lineOf.get(part.orderLineId);
                  if (!line) return null;
                  const journal = new URLSearchParams({
                    type: "receipt",
                    sku: line.sku,
                    from: receipt.receivedOn,
                    to: receipt.receivedOn,
                  });
                  return (
                    <li key={part.movementId}>
                      Line {line.lineNumber}:{" "}
                      {formatStockQuantity(
                        quantityToNumber(part.quantity),
                        line.unit,
                      )}{" "}
                      of {line.sku} ·{" "}
                      <Link
                        to={`/stock/journal?${journal}`}
                        className="text-copper-700 underline underline-offset-2"
                      >
                        in the journal
                      </Link>
                    </li>
                  );
                })}
              </ul>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
