/** The fixed lists of the purchase-order tables, importable by browser code. */

/**
 * draft → sent → partly_received → received; cancelled (before anything arrived) or
 * closed_short (ended with less than ordered, nothing more to come).
 */
export const purchaseOrderStatuses = [
  "draft",
  "sent",
  "partly_received",
  "received",
  "cancelled",
  "closed_short",
] as const;

/** Statuses whose open quantities count as stock on order. */
export const openPurchaseOrderStatuses = ["sent", "partly_received"] as const;

/** When the metal base of a wire line's price is fixed: when ordering, or on the delivery day (both common practice). */
export const metalBaseFixings = ["order", "delivery"] as const;

/** Where a line's unit price came from. */
export const linePriceSources = ["price_list", "override"] as const;

export type PurchaseOrderStatus = (typeof purchaseOrderStatuses)[number];
export type MetalBaseFixing = (typeof metalBaseFixings)[number];
export type LinePriceSource = (typeof linePriceSources)[number];
