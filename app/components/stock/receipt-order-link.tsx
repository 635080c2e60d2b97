/**
 * What a journal row says about a receipt's purchase order: the order's number, linked to
 * the order, for a receipt booked against one; "no order" for a receipt without (samples,
 * returns from outside); nothing for other movements. The ledger row carries the reference
 * "PO-000123" too, so `referenceBesides` leaves it out of the words beside the link.
 */
import { Link } from "react-router";
import { purchaseOrderNumber } from "~/purchase-orders/purchase-order-status";

export function ReceiptOrderLink({
  type,
  purchaseOrderId,
}: {
  type: string;
  purchaseOrderId: number | null;
}) {
  if (type !== "receipt") return null;
  if (purchaseOrderId === null)
    return <span className="text-graphite-500">no order</span>;
  return (
    <Link
      to={`/purchase-orders/${purchaseOrderId}`}
      className="font-medium text-copper-700 underline-offset-2 hover:underline"
    >
      {purchaseOrderNumber(purchaseOrderId)}
    </Link>
  );
}

/** The row's reference unless it is the order's own number (shown as the link). */
export function referenceBesides(
  reference: string | null,
  purchaseOrderId: number | null,
): string | null {
  return purchaseOrderId !== null &&
    reference === purchaseOrderNumber(purchaseOrderId)
    ? null
    : reference;
}
