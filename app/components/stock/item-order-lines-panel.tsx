/** What is on order for the item: each open line of a sent order, earliest due first, late ones marked. */
import { DataTable } from "~/components/data-table";
import {
  itemOpenLineColumns,
  type OpenLineRow,
} from "~/components/purchase-orders/open-line-columns";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export function ItemOrderLinesPanel({
  sku,
  unit,
  onOrder,
  lines,
  limit,
}: {
  sku: string;
  unit: string;
  onOrder: number;
  lines: OpenLineRow[];
  limit: number;
}) {
  return (
    <section aria-labelledby="on-order-heading" className="space-y-2">
      <h2 id="on-order-heading" className="text-lg font-semibold">
        On order
      </h2>
      <p className="text-sm text-graphite-700">
        {onOrder > 0
          ? `${formatStockQuantity(onOrder, unit)} still to come on sent orders.`
          : "Nothing is on order."}
        {lines.length >= limit
          ? ` The ${limit} lines due first are listed.`
          : ""}
      </p>
      {lines.length > 0 ? (
        <DataTable
          caption={`Open order lines of ${sku}, earliest due first`}
          columns={itemOpenLineColumns}
          rows={lines}
        />
      ) : null}
    </section>
  );
}
