/** The columns of the purchase-order list: number, supplier, status, lines, total, ordered on, next expected. */
import { createColumnHelper } from "~/lib/table-columns";
import { Link } from "react-router";
import type { listPurchaseOrders } from "~/purchase-orders/purchase-order-details.server";
import { formatDay } from "~/lib/format";
import { moneyText } from "~/lib/unit-text";
import { PurchaseOrderStatusBadge } from "./purchase-order-status-badge";

export type PurchaseOrderListRow = Awaited<
  ReturnType<typeof listPurchaseOrders>
>["orders"][number];

const column = createColumnHelper<PurchaseOrderListRow>();
const day = (value: string | null) => (value ? formatDay(value) : "—");

export const purchaseOrderListColumns = [
  column.accessor("number", {
    header: "Order",
    cell: ({ row }) => (
      <Link
        to={`/purchase-orders/${row.original.id}`}
        className="font-medium whitespace-nowrap text-copper-700 underline-offset-2 hover:underline"
      >
        {row.original.number}
      </Link>
    ),
  }),
  column.accessor((row) => row.supplier.name, {
    id: "supplier",
    header: "Supplier",
  }),
  column.accessor("status", {
    header: "Status",
    cell: (info) => <PurchaseOrderStatusBadge status={info.getValue()} />,
  }),
  column.accessor("lineCount", {
    header: "Lines",
    meta: { numeric: true },
  }),
  column.accessor("total", {
    header: "Total",
    meta: { numeric: true },
    cell: ({ row }) => (
      <span className="whitespace-nowrap">
        {moneyText(row.original.total, row.original.currency)}
      </span>
    ),
  }),
  column.accessor("orderedOn", {
    header: "Ordered on",
    cell: (info) => (
      <span className="whitespace-nowrap">{day(info.getValue())}</span>
    ),
  }),
  column.accessor("nextExpectedDate", {
    header: "Next expected",
    cell: (info) => (
      <span className="whitespace-nowrap">{day(info.getValue())}</span>
    ),
  }),
];
