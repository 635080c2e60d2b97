/** Column definitions for the lot tables (the one DataTable): balances, where used, a build order's lots. */
import { createColumnHelper } from "~/lib/table-columns";
import { Link } from "react-router";
import { formatDateTime, formatDay } from "~/lib/format";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import type { LotDetails } from "~/lots/lot-details.server";
import type { BuildOrderLot, LotUse } from "~/lots/where-used.server";

const link = "font-medium text-copper-700 underline-offset-2 hover:underline";
/** The day, with the full time on hover (the CSV and the API give the time). */
const when = (value: string | null) =>
  value ? (
    <time
      dateTime={value}
      title={formatDateTime(value)}
      className="whitespace-nowrap"
    >
      {formatDay(value)}
    </time>
  ) : (
    "—"
  );
const amount = (value: number, unit: string) => (
  <span className="whitespace-nowrap">{formatStockQuantity(value, unit)}</span>
);

type Balance = LotDetails["balances"][number];
const balance = createColumnHelper<Balance>();

export function lotBalanceColumns(unit: string) {
  return [
    balance.accessor("location", {
      header: "Location",
      cell: (info) => (
        <>
          <span className="font-medium">{info.getValue()}</span>{" "}
          <span className="text-graphite-500">
            {info.row.original.locationName}
          </span>
        </>
      ),
    }),
    balance.accessor("onHand", {
      header: "On hand",
      cell: (info) => amount(info.getValue(), unit),
      meta: { numeric: true },
    }),
    balance.accessor("reserved", {
      header: "Reserved",
      cell: (info) => amount(info.getValue(), unit),
      meta: { numeric: true },
    }),
  ];
}

const use = createColumnHelper<LotUse>();

export const lotUseColumns = [
  use.accessor("reference", {
    header: "Build order",
    cell: (info) => (
      <Link
        to={`/build-orders/${info.row.original.buildOrderId}`}
        className={link}
      >
        {info.getValue()}
      </Link>
    ),
  }),
  use.accessor("design", {
    header: "Design",
    cell: (info) => `${info.getValue()} rev. ${info.row.original.revision}`,
  }),
  use.accessor("motorQuantity", {
    header: "Motors",
    meta: { numeric: true },
  }),
  use.accessor("issued", {
    header: "Issued",
    cell: (info) => amount(info.getValue(), info.row.original.unit),
    meta: { numeric: true },
  }),
  use.accessor("returned", {
    header: "Returned",
    cell: (info) => amount(info.getValue(), info.row.original.unit),
    meta: { numeric: true },
  }),
  use.accessor("net", {
    header: "Used (net)",
    cell: (info) => (
      <strong>{amount(info.getValue(), info.row.original.unit)}</strong>
    ),
    meta: { numeric: true },
  }),
  use.accessor("firstIssuedAt", {
    header: "First issued",
    cell: (info) => when(info.getValue()),
  }),
  use.accessor("lastMovementAt", {
    header: "Last movement",
    cell: (info) => when(info.getValue()),
  }),
];

const orderLot = createColumnHelper<BuildOrderLot>();

export const buildOrderLotColumns = [
  orderLot.accessor("lot", {
    header: "Lot",
    cell: (info) => (
      <>
        <Link to={`/stock/lots/${info.row.original.lotId}`} className={link}>
          {info.getValue()}
        </Link>
        {info.row.original.onHold ? (
          <span className="ml-1 text-xs font-semibold text-danger">
            on hold
          </span>
        ) : null}
      </>
    ),
  }),
  orderLot.accessor("sku", {
    header: "Item",
    cell: (info) => (
      <span className="whitespace-nowrap">{info.getValue()}</span>
    ),
  }),
  orderLot.display({
    id: "supplier",
    header: "Supplier and their lot",
    cell: ({ row }) =>
      [row.original.supplier?.name, row.original.supplierBatch]
        .filter(Boolean)
        .join(" · ") || "—",
  }),
  orderLot.accessor("net", {
    header: "Used (net)",
    cell: (info) => amount(info.getValue(), info.row.original.unit),
    meta: { numeric: true },
  }),
  orderLot.accessor("returned", {
    header: "Returned",
    cell: (info) => amount(info.getValue(), info.row.original.unit),
    meta: { numeric: true },
  }),
  orderLot.accessor("firstIssuedAt", {
    header: "First issued",
    cell: (info) => when(info.getValue()),
  }),
];
