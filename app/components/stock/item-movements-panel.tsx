/** The item's movements, newest first, a page at a time. */
import { DataTable } from "~/components/data-table";
import { formatQuantity } from "~/lib/format";
import {
  movementColumns,
  type ItemMovementRow,
} from "~/stock/item-page-columns";
import { ReceiptOrderLink, referenceBesides } from "./receipt-order-link";

/** A receipt's order (or "no order") beside the reference, which then leaves out the order's number. */
function receiptOrder(row: ItemMovementRow) {
  const id = row.purchaseOrderId ?? null;
  return {
    mark:
      row.type === "receipt" ? (
        <ReceiptOrderLink type={row.type} purchaseOrderId={id} />
      ) : null,
    reference: referenceBesides(row.reference, id),
  };
}

export function ItemMovementsPanel({
  sku,
  unit,
  movements,
  movementCount,
  page,
  pageCount,
  priceQuantityText,
}: {
  sku: string;
  unit: string;
  movements: ItemMovementRow[];
  movementCount: number;
  page: number;
  pageCount: number;
  /** The quantity the prices are shown for, kept in the page links; "" for the item's own. */
  priceQuantityText: string;
}) {
  return (
    <section aria-labelledby="movements-heading" className="space-y-2">
      <h2 id="movements-heading" className="text-lg font-semibold">
        Movements{" "}
        <span className="font-normal text-graphite-500">
          · {formatQuantity(movementCount, "")}, newest first
        </span>
      </h2>
      <DataTable
        caption={`Movements of ${sku}, newest first`}
        columns={movementColumns(unit, receiptOrder)}
        rows={movements}
        page={page}
        pageCount={pageCount}
        pageHref={(target) =>
          `/stock/items/${encodeURIComponent(sku)}?page=${target}${priceQuantityText ? `&quantity=${encodeURIComponent(priceQuantityText)}` : ""}`
        }
        emptyText="No movements yet."
      />
    </section>
  );
}
