/** The columns of the order page's "What the build needs" table: per item, needed, held, issued and where the stock is. */
import { createColumnHelper } from "~/lib/table-columns";
import { Link } from "react-router";
import type { BuildOrderDetails } from "~/build-orders/build-order-details.server";
import { stockPlaceText } from "~/build-orders/build-order-view";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export type BuildOrderLine = BuildOrderDetails["lines"][number];

/** How many places with stock the "Where it is" cell lists before "and N more places". */
const placesShown = 4;

/** A quantity of the line's item, in its unit, on one line. */
export const lineQuantityCell =
  (key: "required" | "reserved" | "issued" | "toReserve" | "available") =>
  (info: { row: { original: BuildOrderLine } }) => (
    <span className="whitespace-nowrap">
      {formatStockQuantity(info.row.original[key], info.row.original.unit)}
    </span>
  );

const lineColumn = createColumnHelper<BuildOrderLine>();

export const buildOrderLineColumns = [
  lineColumn.accessor("sku", {
    header: "Item",
    cell: (info) => (
      <>
        <Link
          to={`/stock/items/${encodeURIComponent(info.getValue())}`}
          className="font-medium whitespace-nowrap text-copper-700 underline-offset-2 hover:underline"
        >
          {info.getValue()}
        </Link>
        <span className="block text-xs text-graphite-500">
          {info.row.original.name}
        </span>
      </>
    ),
  }),
  lineColumn.accessor("required", {
    header: "Needed",
    cell: lineQuantityCell("required"),
    meta: { numeric: true },
  }),
  lineColumn.accessor("reserved", {
    header: "Held",
    cell: lineQuantityCell("reserved"),
    meta: { numeric: true },
  }),
  lineColumn.accessor("issued", {
    header: "Issued",
    cell: lineQuantityCell("issued"),
    meta: { numeric: true },
  }),
  lineColumn.accessor("toReserve", {
    header: "Still to hold",
    cell: lineQuantityCell("toReserve"),
    meta: { numeric: true },
  }),
  lineColumn.accessor("available", {
    header: "Free in store",
    cell: lineQuantityCell("available"),
    meta: { numeric: true },
  }),
  lineColumn.accessor("short", {
    header: "Short",
    cell: (info) =>
      info.getValue() > 0 ? (
        <span className="font-semibold whitespace-nowrap text-danger">
          {formatStockQuantity(info.getValue(), info.row.original.unit)}
        </span>
      ) : (
        <span className="text-graphite-500">—</span>
      ),
    meta: { numeric: true },
  }),
  lineColumn.display({
    id: "where",
    header: "Where it is (oldest lot first)",
    cell: ({ row }) => <StockPlaces line={row.original} />,
  }),
];

/** Where the line's item is in store, oldest lot first: free, and of how much on hand. */
function StockPlaces({ line }: { line: BuildOrderLine }) {
  const stock = line.stock.filter((balance) => balance.onHand > 0);
  if (stock.length === 0)
    return <span className="text-graphite-500">none in store</span>;
  return (
    <ul className="min-w-40 space-y-1 text-xs">
      {stock.slice(0, placesShown).map((balance) => (
        <li key={`${balance.lot ?? ""}|${balance.location}`}>
          <span className="text-graphite-700">{stockPlaceText(balance)}</span>
          <span className="block whitespace-nowrap">
            <span className="font-medium">
              {formatStockQuantity(balance.free, line.unit)}
            </span>{" "}
            free
            {balance.onHold ? (
              <span className="font-medium text-danger"> · lot on hold</span>
            ) : null}
            {balance.reserved > 0 || balance.onHold ? (
              <span className="text-graphite-500">
                {" "}
                of {formatStockQuantity(balance.onHand, line.unit)}
              </span>
            ) : null}
          </span>
        </li>
      ))}
      {stock.length > placesShown ? (
        <li className="text-graphite-500">
          and {stock.length - placesShown} more places
        </li>
      ) : null}
    </ul>
  );
}
