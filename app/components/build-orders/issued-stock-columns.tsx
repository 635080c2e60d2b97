/** The columns of the order page's "Issued to the build" table: one row per issue, newest first. */
import { createColumnHelper } from "~/lib/table-columns";
import { stockPlaceText } from "~/build-orders/build-order-view";
import { formatDateTime, formatQuantity } from "~/lib/format";
import {
  formatStockQuantity,
  formatUnitCost,
} from "~/stock/stock-quantity-text";
import type { BuildOrderLine } from "./build-order-line-columns";

/** One issue to the order, with the item it took. */
export type IssuedStock = BuildOrderLine["issues"][number] & {
  sku: string;
  unit: string;
};

const issueColumn = createColumnHelper<IssuedStock>();

export const issuedStockColumns = [
  issueColumn.accessor("at", {
    header: "When",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatDateTime(info.getValue())}
      </span>
    ),
  }),
  issueColumn.accessor("sku", {
    header: "Item",
    cell: (info) => (
      <span className="whitespace-nowrap">{info.getValue()}</span>
    ),
  }),
  issueColumn.display({
    id: "place",
    header: "From",
    cell: ({ row }) => stockPlaceText(row.original),
  }),
  issueColumn.accessor("quantity", {
    header: "Issued",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatStockQuantity(info.getValue(), info.row.original.unit)}
      </span>
    ),
    meta: { numeric: true },
  }),
  issueColumn.accessor("grossKg", {
    header: "Spool weighed at",
    cell: (info) => {
      const gross = info.getValue();
      return gross === null ? "—" : formatQuantity(gross, "kg", 3);
    },
    meta: { numeric: true },
  }),
  issueColumn.accessor("unitCost", {
    header: "Average cost then",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatUnitCost(info.getValue(), info.row.original.unit)}
      </span>
    ),
    meta: { numeric: true },
  }),
  issueColumn.accessor("by", { header: "By" }),
];
