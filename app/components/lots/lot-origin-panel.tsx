/** Where a lot came from: supplier and its lot or heat, the receipt, the purchase order. */
import { Link } from "react-router";
import { formatDateTime, formatDay, formatQuantity } from "~/lib/format";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import type { LotDetails } from "~/lots/lot-details.server";

const link = "text-copper-700 underline-offset-2 hover:underline";

export function LotOriginPanel({ lot }: { lot: LotDetails }) {
  const rows: [string, React.ReactNode][] = [
    [
      "Item",
      <Link
        key="item"
        to={`/stock/items/${encodeURIComponent(lot.item.sku)}`}
        className={link}
      >
        {lot.item.sku}
      </Link>,
    ],
    [
      "Supplier",
      lot.supplier ? (
        <Link
          key="supplier"
          to={`/suppliers/${lot.supplier.id}`}
          className={link}
        >
          {lot.supplier.name}
        </Link>
      ) : (
        "Not recorded"
      ),
    ],
    ["Supplier's lot or heat", lot.supplierBatch ?? "Not recorded"],
    [
      "Received",
      lot.receipt
        ? `${formatDateTime(lot.receipt.at)}: ${formatStockQuantity(lot.receipt.quantity, lot.item.unit)} into ${lot.receipt.location}${lot.receipt.reference ? ` (${lot.receipt.reference})` : ""}, movement ${lot.receipt.movementId}`
        : lot.receivedOn
          ? formatDay(lot.receivedOn)
          : "Not recorded",
    ],
    [
      "Purchase order",
      lot.purchaseOrder ? (
        <Link
          key="order"
          to={`/purchase-orders/${lot.purchaseOrder.id}`}
          className={link}
        >
          {lot.purchaseOrder.number}
        </Link>
      ) : (
        "None (received without an order)"
      ),
    ],
  ];
  if (lot.spoolType) rows.push(["Spool type", lot.spoolType]);
  if (lot.tareKg !== null)
    rows.push(["Spool tare", formatQuantity(lot.tareKg, "kg", 3)]);
  return (
    <section aria-labelledby="origin-heading" className="panel">
      <h2 id="origin-heading" className="mb-2 text-lg font-semibold">
        Where it came from
      </h2>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        {rows.map(([term, value]) => (
          <div key={term} className="contents">
            <dt className="text-graphite-500">{term}</dt>
            <dd>{value}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
