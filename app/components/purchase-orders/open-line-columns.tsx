/**
 * Columns of open order lines for the one DataTable: the order (linked), its supplier,
 * what is still to come, when it is expected and how late. Used by the item page's
 * "On order" panel and the late lines page.
 */
import { createColumnHelper } from "~/lib/table-columns";
import { Link } from "react-router";
import { formatDay } from "~/lib/format";
import { daysLateText } from "~/purchase-orders/order-line-dates";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export interface OpenLineRow {
  lineId: number;
  orderId: number;
  order: string;
  supplierId: number;
  supplier: string;
  open: number;
  unit: string;
  expectedDate: string;
  daysLate: number;
  sku?: string;
  name?: string;
}

/** "3 days late" with a clock, in words as well as colour. */
export function LateMark({ days }: { days: number }) {
  return (
    <span className="inline-flex items-center gap-1 whitespace-nowrap rounded border border-caution/50 bg-caution/10 px-1.5 py-0.5 text-xs font-medium text-caution">
      <svg viewBox="0 0 16 16" aria-hidden="true" className="h-3.5 w-3.5">
        <circle
          cx="8"
          cy="8"
          r="6"
          fill="none"
          stroke="currentColor"
          strokeWidth="1.6"
        />
        <path
          d="M8 4.5V8l2.5 1.5"
          fill="none"
          stroke="currentColor"
          strokeWidth="1.6"
          strokeLinecap="round"
        />
      </svg>
      {daysLateText(days)}
    </span>
  );
}

const link = "font-medium text-copper-700 underline-offset-2 hover:underline";
const column = createColumnHelper<OpenLineRow>();

const orderColumn = column.accessor("order", {
  header: "Order",
  cell: (info) => (
    <Link
      to={`/purchase-orders/${info.row.original.orderId}`}
      className={`${link} whitespace-nowrap`}
    >
      {info.getValue()}
    </Link>
  ),
});

const supplierColumn = column.accessor("supplier", {
  header: "Supplier",
  cell: (info) => (
    <Link to={`/suppliers/${info.row.original.supplierId}`} className={link}>
      {info.getValue()}
    </Link>
  ),
});

const itemColumn = column.accessor("sku", {
  header: "Item",
  cell: (info) => (
    <span>
      <Link
        to={`/stock/items/${encodeURIComponent(info.getValue() ?? "")}`}
        className={link}
      >
        {info.getValue()}
      </Link>{" "}
      <span className="text-graphite-500">{info.row.original.name}</span>
    </span>
  ),
});

const openColumn = column.accessor("open", {
  header: "Still to come",
  meta: { numeric: true },
  cell: (info) => (
    <span className="whitespace-nowrap">
      {formatStockQuantity(info.getValue(), info.row.original.unit)}
    </span>
  ),
});

const expectedColumn = column.accessor("expectedDate", {
  header: "Expected",
  cell: (info) => (
    <span className="whitespace-nowrap">{formatDay(info.getValue())}</span>
  ),
});

const lateColumn = column.accessor("daysLate", {
  header: "Late",
  meta: { numeric: true },
  cell: (info) =>
    info.getValue() > 0 ? (
      <LateMark days={info.getValue()} />
    ) : (
      <span className="text-graphite-500">on time so far</span>
    ),
});

/** The item page: the item is known, so no item column. */
export const itemOpenLineColumns = [
  orderColumn,
  supplierColumn,
  openColumn,
  expectedColumn,
  lateColumn,
];

/** The late lines page: every line is late, each names its item. */
export const lateLineColumns = [
  orderColumn,
  supplierColumn,
  itemColumn,
  openColumn,
  expectedColumn,
  lateColumn,
];
