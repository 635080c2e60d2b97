import { formatAmount } from "~/lib/format";
/** The columns of the order page's "Planned and used" table: per item, planned against issued quantity and cost. */
import { createColumnHelper } from "~/lib/table-columns";
import { formatSignedStockQuantity } from "~/stock/stock-quantity-text";
import {
  lineQuantityCell,
  type BuildOrderLine,
} from "./build-order-line-columns";

/** The columns, with the order's currency in the cost headers. */
export function plannedAndUsedColumns(currency: string) {
  const column = createColumnHelper<BuildOrderLine>();
  return [
    column.accessor("sku", {
      header: "Item",
      cell: (info) => (
        <span className="font-medium whitespace-nowrap">{info.getValue()}</span>
      ),
    }),
    column.accessor("required", {
      header: "Planned",
      cell: lineQuantityCell("required"),
      meta: { numeric: true },
    }),
    column.accessor("issued", {
      header: "Used (issued)",
      cell: lineQuantityCell("issued"),
      meta: { numeric: true },
    }),
    column.accessor("difference", {
      header: "Difference",
      cell: (info) => {
        const value = info.getValue();
        return (
          <span
            className={`whitespace-nowrap ${value > 0 ? "text-caution" : ""}`}
          >
            {formatSignedStockQuantity(value, info.row.original.unit)}
          </span>
        );
      },
      meta: { numeric: true },
    }),
    column.accessor("plannedCost", {
      header: `Planned cost (${currency})`,
      cell: (info) => {
        const cost = info.getValue();
        return cost === null ? (
          <span className="text-graphite-500">no cost yet</span>
        ) : (
          formatAmount(cost)
        );
      },
      meta: { numeric: true },
    }),
    column.accessor("actualCost", {
      header: `Actual cost (${currency})`,
      cell: (info) => formatAmount(info.getValue()),
      meta: { numeric: true },
    }),
  ];
}
