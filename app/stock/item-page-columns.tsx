/**
 * The item page's two tables: where the stock is (by location and lot, a wire spool's
 * tare too) and the item's movements. Column definitions for the one DataTable.
 */
import { createColumnHelper } from "~/lib/table-columns";
import type { ReactNode } from "react";
import { Link } from "react-router";
import type { MovementType } from "~/db/tables/stock-enums";
import { formatDateTime, formatQuantity } from "~/lib/format";
import {
  formatSignedStockQuantity,
  formatStockQuantity,
  formatUnitCost,
  movementTypeLabels,
} from "./stock-quantity-text";

/** A lot number linked to its page; "—" for stock not kept in lots. */
export function LotLink({
  lotId,
  lot,
}: {
  lotId: number | undefined;
  lot: string | null;
}) {
  if (!lot) return "—";
  if (!lotId) return lot;
  return (
    <Link
      to={`/stock/lots/${lotId}`}
      className="text-copper-700 underline-offset-2 hover:underline"
    >
      {lot}
    </Link>
  );
}

/** One lot (or none) at one location. */
export interface ItemBalanceRow {
  location: string;
  locationName: string;
  /** The lot's id (0 when the item is not kept in lots): its page is /stock/lots/:id. */
  lotId?: number;
  lot: string | null;
  tareKg: number | null;
  onHand: number;
  reserved: number;
  /** Why the lot is on hold (quality block, decision 039); null when it is free. */
  holdReason: string | null;
}

/** A lot on hold: the mark, its reason as a tooltip and in words below. */
function LotOnHold({ lot, reason }: { lot: ReactNode; reason: string }) {
  return (
    <>
      <span className="font-medium">{lot}</span>{" "}
      <span
        title={reason}
        className="whitespace-nowrap rounded border border-danger/40 bg-sheet px-1.5 py-0.5 text-xs font-medium text-danger"
      >
        On hold
      </span>
      <span className="mt-0.5 block text-xs text-danger">{reason}</span>
    </>
  );
}

/** One movement of the item, with the item's on hand after it. */
export interface ItemMovementRow {
  /** ISO time. */
  createdAt: string;
  type: MovementType;
  lotId?: number;
  lot: string | null;
  location: string;
  quantity: number;
  itemOnHandAfter: number;
  unitCost: number | null;
  reference: string | null;
  note: string | null;
  user: string;
  /** The purchase order a receipt was booked against; null for one without and other movements. */
  purchaseOrderId?: number | null;
}

export function balanceColumns(unit: string, isWire: boolean) {
  const column = createColumnHelper<ItemBalanceRow>();
  return [
    column.accessor("location", {
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
    column.accessor("lot", {
      header: "Lot",
      cell: (info) => {
        const { lotId, holdReason } = info.row.original;
        const lot = <LotLink lotId={lotId} lot={info.getValue()} />;
        return holdReason === null ? (
          lot
        ) : (
          <LotOnHold lot={lot} reason={holdReason} />
        );
      },
    }),
    ...(isWire
      ? [
          column.accessor("tareKg", {
            header: "Spool tare",
            cell: (info) => {
              const tare = info.getValue();
              return tare === null ? "—" : formatQuantity(tare, "kg", 3);
            },
            meta: { numeric: true },
          }),
        ]
      : []),
    column.accessor("onHand", {
      header: "On hand",
      cell: (info) => formatStockQuantity(info.getValue(), unit),
      meta: { numeric: true },
    }),
    column.accessor("reserved", {
      header: "Reserved",
      cell: (info) => formatStockQuantity(info.getValue(), unit),
      meta: { numeric: true },
    }),
  ];
}

/**
 * The movement columns; `receiptOrder` (from the page) names a receipt's purchase order, or
 * says it had none, ahead of the reference and note, and gives the reference it leaves.
 */
export function movementColumns(
  unit: string,
  receiptOrder?: (row: ItemMovementRow) => {
    mark: ReactNode;
    reference: string | null;
  },
) {
  const column = createColumnHelper<ItemMovementRow>();
  return [
    column.accessor("createdAt", {
      header: "When",
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatDateTime(info.getValue())}
        </span>
      ),
    }),
    column.accessor("type", {
      header: "Movement",
      cell: (info) => movementTypeLabels[info.getValue()] ?? info.getValue(),
    }),
    column.accessor("lot", {
      header: "Lot",
      cell: (info) => (
        <LotLink lotId={info.row.original.lotId} lot={info.getValue()} />
      ),
    }),
    column.accessor("location", { header: "Location" }),
    column.accessor("quantity", {
      header: "Change",
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatSignedStockQuantity(info.getValue(), unit)}
        </span>
      ),
      meta: { numeric: true },
    }),
    column.accessor("itemOnHandAfter", {
      header: "On hand after",
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatStockQuantity(info.getValue(), unit)}
        </span>
      ),
      meta: { numeric: true },
    }),
    column.accessor("unitCost", {
      header: "Unit cost",
      cell: (info) => {
        const cost = info.getValue();
        return cost === null ? (
          "—"
        ) : (
          <span className="whitespace-nowrap">
            {formatUnitCost(cost, unit)}
          </span>
        );
      },
      meta: { numeric: true },
    }),
    column.display({
      id: "reference",
      header: "Reference and note",
      cell: ({ row }) => {
        const order = receiptOrder?.(row.original);
        const words = [
          order ? order.reference : row.original.reference,
          row.original.note,
        ]
          .filter(Boolean)
          .join(" · ");
        if (!order?.mark) return words || "—";
        return (
          <>
            {order.mark}
            {words ? ` · ${words}` : null}
          </>
        );
      },
    }),
    column.accessor("user", { header: "By" }),
  ];
}
