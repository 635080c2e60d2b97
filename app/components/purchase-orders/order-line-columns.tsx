/** The columns of an order's lines: item (ours and the supplier's SKU), quantity, price and its source, total, expected and wanted dates, received and open. */
import { createColumnHelper } from "~/lib/table-columns";
import { Link } from "react-router";
import type { PurchaseOrderView } from "~/purchase-orders/purchase-order-details.server";
import { quantityToNumber } from "~/lib/decimal-amounts";
import { formatDay } from "~/lib/format";
import { formatMoney } from "~/pricing/money";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import { OrderLinePrice } from "./order-line-price";

type Line = PurchaseOrderView["lines"][number];
const column = createColumnHelper<Line>();

const amount = (line: Line, value: bigint) =>
  formatStockQuantity(quantityToNumber(value), line.unit);

export function orderLineColumns(currency: string, showReceipts: boolean) {
  return [
    column.accessor("lineNumber", { header: "Line", meta: { numeric: true } }),
    column.accessor("sku", {
      header: "Item",
      cell: ({ row }) => (
        <div className="min-w-40">
          <Link
            to={`/stock/items/${encodeURIComponent(row.original.sku)}`}
            className="font-medium text-copper-700 underline-offset-2 hover:underline"
          >
            {row.original.sku}
          </Link>
          <div className="text-xs text-graphite-500">{row.original.name}</div>
          <div className="text-xs text-graphite-500">
            Supplier&apos;s SKU: {row.original.supplierSku || "—"}
          </div>
        </div>
      ),
    }),
    column.accessor("quantity", {
      header: "Quantity",
      meta: { numeric: true },
      cell: ({ row }) => (
        <span className="whitespace-nowrap">
          {amount(row.original, row.original.quantity)}
        </span>
      ),
    }),
    column.accessor("unitPrice", {
      header: "Unit price",
      meta: { numeric: true },
      cell: ({ row }) => (
        <OrderLinePrice line={row.original} currency={currency} />
      ),
    }),
    column.accessor("lineTotal", {
      header: "Total",
      meta: { numeric: true },
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatMoney(info.getValue(), currency, { decimals: 2 })}
        </span>
      ),
    }),
    column.accessor("expectedDate", {
      header: "Expected",
      cell: ({ row }) => (
        <span className="whitespace-nowrap">
          {formatDay(row.original.expectedDate)}
          <span className="block text-xs text-graphite-500">
            {row.original.requestedDate
              ? `wanted by ${formatDay(row.original.requestedDate)}`
              : `ordered on + ${row.original.leadTimeDays} d lead time`}
          </span>
        </span>
      ),
    }),
    ...(showReceipts
      ? [
          column.accessor("received", {
            header: "Received",
            meta: { numeric: true },
            cell: ({ row }) => amount(row.original, row.original.received),
          }),
          column.accessor("open", {
            header: "Open",
            meta: { numeric: true },
            cell: ({ row }) => amount(row.original, row.original.open),
          }),
        ]
      : []),
  ];
}
