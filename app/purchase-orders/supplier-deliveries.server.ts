/** A supplier's delivery record over the last 12 months, for its page (see delivery-performance.ts). */
import { and, eq, gte, isNotNull, or } from "drizzle-orm";
import { db } from "~/db/client.server";
import { purchaseOrderLines, purchaseOrders } from "~/db/schema";
import { startOfDay } from "~/lib/calendar-days";
import { parseQuantity } from "~/lib/decimal-amounts";
import {
  deliveryPerformance,
  performanceWindowStart,
} from "./delivery-performance";

/**
 * The supplier's finished lines in the window (through purchase_orders_supplier_idx), and
 * their on-time and in-full figures. An order closed short was closed at its last change
 * (updated_at): nothing changes a closed order after that.
 */
export async function supplierDeliveryPerformance(
  supplierId: number,
  today: string,
) {
  const since = startOfDay(performanceWindowStart(today));
  const rows = await db
    .select({
      expectedDate: purchaseOrderLines.expectedDate,
      quantity: purchaseOrderLines.quantity,
      received: purchaseOrderLines.received,
      completedAt: purchaseOrderLines.completedAt,
      status: purchaseOrders.status,
      updatedAt: purchaseOrders.updatedAt,
    })
    .from(purchaseOrders)
    .innerJoin(
      purchaseOrderLines,
      eq(purchaseOrderLines.orderId, purchaseOrders.id),
    )
    .where(
      and(
        eq(purchaseOrders.supplierId, supplierId),
        or(
          and(
            isNotNull(purchaseOrderLines.completedAt),
            gte(purchaseOrderLines.completedAt, since),
          ),
          and(
            eq(purchaseOrders.status, "closed_short"),
            gte(purchaseOrders.updatedAt, since),
          ),
        ),
      ),
    );
  return deliveryPerformance(
    rows.map((row) => ({
      expectedDate: row.expectedDate,
      quantity: parseQuantity(row.quantity),
      received: parseQuantity(row.received),
      completedAt: row.completedAt,
      closedShortAt: row.status === "closed_short" ? row.updatedAt : null,
    })),
    today,
  );
}
