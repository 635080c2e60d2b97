/**
 * The life of a purchase order: draft → sent → partly received → received, or
 * cancelled (draft or sent, nothing received yet), or closed short (sent or partly
 * received: nothing more will come). Pure: shared by the server and the pages.
 */
import type { PurchaseOrderStatus } from "~/db/tables/purchase-order-enums";

export const purchaseOrderStatusLabels: Record<PurchaseOrderStatus, string> = {
  draft: "Draft",
  sent: "Sent",
  partly_received: "Partly received",
  received: "Received",
  cancelled: "Cancelled",
  closed_short: "Closed short",
};

/** The order number people write on delivery notes and movements: "PO-000123". */
export function purchaseOrderNumber(id: number): string {
  return `PO-${String(id).padStart(6, "0")}`;
}

/** The order id a typed number names ("PO-000123", "po 123", "123"), or null. */
export function purchaseOrderIdFromNumber(text: string): number | null {
  const match = /^\s*(?:PO[\s-]*)?0*(\d{1,10})\s*$/i.exec(text);
  if (!match) return null;
  const id = Number(match[1]);
  return id >= 1 && id <= 2_147_483_647 ? id : null;
}

/** Lines, notes and currency can be edited only while the order is a draft. */
export function canEdit(status: PurchaseOrderStatus): boolean {
  return status === "draft";
}

/** Deliveries are booked only against a sent order that is not yet received in full. */
export function canReceive(status: PurchaseOrderStatus): boolean {
  return status === "sent" || status === "partly_received";
}

/** Cancelled before anything arrived. */
export function canCancel(status: PurchaseOrderStatus): boolean {
  return status === "draft" || status === "sent";
}

/** Closed short: ends an order that will not be delivered in full. */
export function canCloseShort(status: PurchaseOrderStatus): boolean {
  return status === "sent" || status === "partly_received";
}
