/** The columns of the buying plan's suggestions: choice, item, quantity, supplier, price, need-by and order-by days, why. */
import { createColumnHelper } from "~/lib/table-columns";
import { Link } from "react-router";
import type { SuggestionJson } from "~/buying-plan/plan-json";
import { formatDay, formatPriceText, formatQuantity } from "~/lib/format";
import { countText, perUnitWord } from "~/lib/unit-text";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

const column = createColumnHelper<SuggestionJson>();

/** The columns; the checkboxes belong to the form `formId` (the draft-orders button), when the reader may order. */
export function suggestionColumns(formId: string | null) {
  return [
    ...(formId
      ? [
          column.display({
            id: "choose",
            header: () => <span className="sr-only">Choose</span>,
            cell: ({ row }) => (
              <input
                type="checkbox"
                name="suggestion"
                value={row.original.key}
                form={formId}
                defaultChecked={
                  row.original.supplierId !== null &&
                  row.original.draftOrders.length === 0
                }
                disabled={row.original.supplierId === null}
                aria-label={`Order ${row.original.sku} for the week of ${formatDay(row.original.needBy)}`}
                className="size-4 accent-copper-600"
              />
            ),
          }),
        ]
      : []),
    column.accessor("sku", {
      header: "Item",
      cell: (info) => (
        <span>
          <Link
            to={`/stock/items/${encodeURIComponent(info.getValue())}`}
            className="font-medium text-copper-700 underline-offset-2 hover:underline"
          >
            {info.getValue()}
          </Link>
          <span className="block text-xs text-graphite-500">
            {info.row.original.name}
          </span>
        </span>
      ),
    }),
    column.accessor("quantity", {
      header: "Buy",
      meta: { numeric: true },
      cell: (info) => {
        const row = info.row.original;
        return (
          <span className="whitespace-nowrap">
            {formatStockQuantity(info.getValue(), row.unit)}
            <span className="block text-xs text-graphite-500">
              {row.packQuantity !== null
                ? `packs of ${formatStockQuantity(row.packQuantity, row.unit)}`
                : null}
              {row.raisedToBreak ? " · cheaper break" : null}
            </span>
          </span>
        );
      },
    }),
    column.accessor("supplier", {
      header: "Supplier",
      cell: (info) =>
        info.getValue() === null ? (
          <span className="text-caution">No price line</span>
        ) : (
          <span>
            {info.getValue()}
            <span className="block text-xs text-graphite-500">
              {info.row.original.supplierSku}
              {info.row.original.leadTimeDays !== null
                ? ` · ${countText(info.row.original.leadTimeDays, "day")}`
                : " · lead time not known"}
            </span>
          </span>
        ),
    }),
    column.accessor("unitPrice", {
      header: "Price",
      meta: { numeric: true },
      cell: (info) => {
        const row = info.row.original;
        if (info.getValue() === null || row.currency === null) return "—";
        return (
          <span className="whitespace-nowrap">
            {formatPriceText(String(info.getValue()))}&nbsp;{row.currency}/
            {perUnitWord(row.unit)}
            <span className="block text-xs text-graphite-500">
              {formatQuantity(row.total ?? 0, row.currency, 2)}
            </span>
          </span>
        );
      },
    }),
    column.accessor("needBy", {
      header: "Needed by",
      cell: (info) => (
        <span className="whitespace-nowrap">{formatDay(info.getValue())}</span>
      ),
    }),
    column.accessor("orderBy", {
      header: "Order by",
      cell: (info) => (
        <span
          className={`whitespace-nowrap ${info.row.original.late ? "font-medium text-danger" : ""}`}
        >
          {formatDay(info.getValue())}
          {info.row.original.late ? (
            <span className="block text-xs">already late</span>
          ) : null}
        </span>
      ),
    }),
    column.accessor("reason", {
      header: "Why",
      cell: (info) => (
        <span className="text-sm">
          {info.getValue()}
          {info.row.original.draftOrders.length > 0 ? (
            <span className="mt-1 block text-xs text-caution">
              Already in draft{" "}
              {info.row.original.draftOrders.map((draft, index) => (
                <span key={draft.id}>
                  {index > 0 ? ", " : ""}
                  <Link
                    to={`/purchase-orders/${draft.id}`}
                    className="underline underline-offset-2"
                  >
                    {draft.number}
                  </Link>
                </span>
              ))}
              : send it, or this stays suggested.
            </span>
          ) : null}
        </span>
      ),
    }),
  ];
}
