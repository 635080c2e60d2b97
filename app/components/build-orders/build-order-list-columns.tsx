/** The columns of the build-order list: reference, design, motors, status, who made it and when, note. */
import { createColumnHelper } from "~/lib/table-columns";
import { Link } from "react-router";
import type { listBuildOrders } from "~/build-orders/build-orders.server";
import { buildOrderReference } from "~/build-orders/build-order-status";
import { formatDateTime } from "~/lib/format";
import { countText } from "~/lib/unit-text";
import { BuildOrderStatusBadge } from "./build-order-status-badge";

export type BuildOrderListRow = Awaited<
  ReturnType<typeof listBuildOrders>
>["buildOrders"][number];

const column = createColumnHelper<BuildOrderListRow>();

export const buildOrderListColumns = [
  column.accessor("id", {
    header: "Order",
    cell: (info) => (
      <Link
        to={`/build-orders/${info.getValue()}`}
        className="font-medium whitespace-nowrap text-copper-700 underline-offset-2 hover:underline"
      >
        {buildOrderReference(info.getValue())}
      </Link>
    ),
  }),
  column.display({
    id: "design",
    header: "Design",
    cell: ({ row }) => (
      <>
        {row.original.design.name}{" "}
        <span className="text-graphite-500">rev. {row.original.revision}</span>
      </>
    ),
  }),
  column.accessor("quantity", {
    header: "Motors",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {countText(info.getValue(), "motor")}
      </span>
    ),
    meta: { numeric: true },
  }),
  column.accessor("status", {
    header: "Status",
    cell: (info) => <BuildOrderStatusBadge status={info.getValue()} />,
  }),
  column.accessor("createdBy", { header: "Made by" }),
  column.accessor("createdAt", {
    header: "Made",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatDateTime(info.getValue())}
      </span>
    ),
  }),
  column.accessor("note", {
    header: "Note",
    cell: (info) => (
      <span className="text-graphite-500">{info.getValue() || ""}</span>
    ),
  }),
];
