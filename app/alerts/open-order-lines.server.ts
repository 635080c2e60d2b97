/**
 * What is still to come on sent orders, per item, for the low-stock check: each open
 * line (order sent or partly received, received < quantity) with its expected day.
 * Reads the lines through purchase_order_lines_item_idx (item, expected date).
 */
import { and, eq, gt, inArray, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { purchaseOrderLines, purchaseOrders } from "~/db/schema";
import { openPurchaseOrderStatuses } from "~/db/tables/purchase-order-enums";
import { parseQuantity } from "~/lib/decimal-amounts";
import type { OpenOrderLine } from "./low-stock";

/** Open order lines of these items, by item id. */
export async function openOrderLinesOf(
  itemIds: readonly number[],
): Promise<Map<number, OpenOrderLine[]>> {
  const byItem = new Map<number, OpenOrderLine[]>();
  if (itemIds.length === 0) return byItem;
  const rows = await db
    .select({
      itemId: purchaseOrderLines.itemId,
      orderId: purchaseOrderLines.orderId,
      expectedDate: purchaseOrderLines.expectedDate,
      quantity: purchaseOrderLines.quantity,
      received: purchaseOrderLines.received,
    })
    .from(purchaseOrderLines)
    .innerJoin(
      purchaseOrders,
      eq(purchaseOrders.id, purchaseOrderLines.orderId),
    )
    .where(
      and(
        inArray(purchaseOrderLines.itemId, [...itemIds]),
        inArray(purchaseOrders.status, [...openPurchaseOrderStatuses]),
        gt(purchaseOrderLines.quantity, sql`${purchaseOrderLines.received}`),
      ),
    );
  for (const row of rows) {
    const open = parseQuantity(row.quantity) - parseQuantity(row.received);
    const lines = byItem.get(row.itemId) ?? [];
    lines.push({ orderId: row.orderId, expectedDate: row.expectedDate, open });
    byItem.set(row.itemId, lines);
  }
  return byItem;
}

/**
 * The day a covering order is due for an item: the latest expected day of that order's
 * open lines for the item (one line in nearly every order), so by then all of it is due.
 * Null when the order has no open line for the item any more.
 */
export async function coverDueDays(
  covers: readonly { itemId: number; orderId: number }[],
): Promise<Map<string, string>> {
  const due = new Map<string, string>();
  if (covers.length === 0) return due;
  const rows = await db
    .select({
      itemId: purchaseOrderLines.itemId,
      orderId: purchaseOrderLines.orderId,
      due: sql<string>`MAX(${purchaseOrderLines.expectedDate})`,
    })
    .from(purchaseOrderLines)
    .where(
      and(
        inArray(purchaseOrderLines.orderId, [
          ...new Set(covers.map((cover) => cover.orderId)),
        ]),
        gt(purchaseOrderLines.quantity, sql`${purchaseOrderLines.received}`),
      ),
    )
    .groupBy(purchaseOrderLines.itemId, purchaseOrderLines.orderId);
  for (const row of rows) {
    due.set(`${row.itemId}:${row.orderId}`, String(row.due).slice(0, 10));
  }
  return due;
}
