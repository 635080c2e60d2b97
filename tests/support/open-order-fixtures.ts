/**
 * Purchase orders written straight into the test database, as sending would leave them
 * (status sent or partly received, items.on_order raised by what is still open), for
 * tests of what reads orders: on order, covered alerts, late lines, delivery records.
 */
import { eq, sql } from "drizzle-orm";
import {
  items,
  purchaseOrderLines,
  purchaseOrders,
  suppliers,
} from "~/db/schema";
import type { PurchaseOrderStatus } from "~/db/tables/purchase-order-enums";
import { addDays } from "~/lib/calendar-days";
import { testDb } from "./test-database";

export const today = () => new Date().toISOString().slice(0, 10);
/** The day `days` from today (UTC), "YYYY-MM-DD". */
export const dayFromToday = (days: number) => addDays(today(), days);

export async function supplierWithLeadTime(
  name: string,
  leadTimeDays: number | null,
): Promise<number> {
  const [created] = await testDb()
    .insert(suppliers)
    .values({ name, currency: "EUR", leadTimeDays })
    .$returningId();
  return created!.id;
}

export async function itemIdOf(sku: string): Promise<number> {
  const [row] = await testDb()
    .select({ id: items.id })
    .from(items)
    .where(eq(items.sku, sku));
  return row!.id;
}

export interface FixtureLine {
  sku: string;
  quantity: string;
  received?: string;
  expectedDate: string;
  completedAt?: Date | null;
}

/**
 * An order with its lines; when its status is sent or partly received, each item's
 * on_order rises by what is still open on its line (as sending and receiving keep it).
 */
export async function insertOrder(input: {
  supplierId: number;
  userId: string;
  status: PurchaseOrderStatus;
  lines: FixtureLine[];
  updatedAt?: Date;
}): Promise<{ id: number; lineIds: number[] }> {
  const db = testDb();
  const [order] = await db
    .insert(purchaseOrders)
    .values({
      supplierId: input.supplierId,
      status: input.status,
      currency: "EUR",
      orderedOn: input.status === "draft" ? null : dayFromToday(-30),
      sentAt: input.status === "draft" ? null : new Date(),
      userId: input.userId,
      updatedAt: input.updatedAt ?? new Date(),
    })
    .$returningId();
  const lineIds: number[] = [];
  const open = input.status === "sent" || input.status === "partly_received";
  for (const [index, line] of input.lines.entries()) {
    const itemId = await itemIdOf(line.sku);
    const [created] = await db
      .insert(purchaseOrderLines)
      .values({
        orderId: order!.id,
        lineNumber: index + 1,
        itemId,
        quantity: line.quantity,
        unitPrice: "1.0000",
        priceSource: "price_list",
        expectedDate: line.expectedDate,
        received: line.received ?? "0",
        completedAt: line.completedAt ?? null,
      })
      .$returningId();
    lineIds.push(created!.id);
    if (open)
      await db
        .update(items)
        .set({
          onOrder: sql`${items.onOrder} + GREATEST(0, ${line.quantity} - ${line.received ?? "0"})`,
        })
        .where(eq(items.id, itemId));
  }
  return { id: order!.id, lineIds };
}
