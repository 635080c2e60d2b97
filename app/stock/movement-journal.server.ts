/** Reading the movement journal, newest first, a page at a time. */
import { and, desc, eq, gte, lt, type SQL } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  items,
  locations,
  lots,
  purchaseReceiptLines,
  purchaseReceipts,
  stockMovements,
  users,
} from "~/db/schema";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import { dayAfter, startOfDay } from "~/lib/calendar-days";
import type { MovementJournalQuery } from "./movement-journal-query";

/**
 * One page of movements matching the filters. Returns `hasMore` rather than a
 * total: counting a million-row journal for every page would cost more than the page.
 */
export async function listMovements(
  query: MovementJournalQuery & { itemId?: number },
) {
  const conditions: SQL[] = [];
  if (query.type) conditions.push(eq(stockMovements.type, query.type));
  if (query.itemId !== undefined)
    conditions.push(eq(stockMovements.itemId, query.itemId));
  if (query.sku) {
    const [item] = await db
      .select({ id: items.id })
      .from(items)
      .where(eq(items.sku, query.sku))
      .limit(1);
    conditions.push(eq(stockMovements.itemId, item?.id ?? -1));
  }
  if (query.user) {
    const [user] = await db
      .select({ id: users.id })
      .from(users)
      .where(eq(users.email, query.user.toLowerCase()))
      .limit(1);
    conditions.push(eq(stockMovements.userId, user?.id ?? ""));
  }
  if (query.from)
    conditions.push(gte(stockMovements.createdAt, startOfDay(query.from)));
  if (query.to)
    conditions.push(
      lt(stockMovements.createdAt, startOfDay(dayAfter(query.to))),
    );

  const rows = await db
    .select({
      id: stockMovements.id,
      type: stockMovements.type,
      sku: items.sku,
      itemName: items.name,
      unit: items.unit,
      lotId: stockMovements.lotId,
      lot: lots.lotNumber,
      location: locations.code,
      quantity: stockMovements.quantity,
      unitCost: stockMovements.unitCost,
      countedQuantity: stockMovements.countedQuantity,
      grossKg: stockMovements.grossKg,
      itemOnHandAfter: stockMovements.itemOnHandAfter,
      transferId: stockMovements.transferId,
      reference: stockMovements.reference,
      note: stockMovements.note,
      user: users.name,
      createdAt: stockMovements.createdAt,
      /** The purchase order a receipt was booked against; null for one without (and every other movement). */
      purchaseOrderId: purchaseReceipts.orderId,
    })
    .from(stockMovements)
    .innerJoin(items, eq(items.id, stockMovements.itemId))
    .innerJoin(locations, eq(locations.id, stockMovements.locationId))
    .innerJoin(users, eq(users.id, stockMovements.userId))
    .leftJoin(lots, eq(lots.id, stockMovements.lotId))
    .leftJoin(
      purchaseReceiptLines,
      eq(purchaseReceiptLines.movementId, stockMovements.id),
    )
    .leftJoin(
      purchaseReceipts,
      eq(purchaseReceipts.id, purchaseReceiptLines.receiptId),
    )
    .where(conditions.length > 0 ? and(...conditions) : undefined)
    .orderBy(desc(stockMovements.createdAt), desc(stockMovements.id))
    .limit(query.pageSize + 1)
    .offset((query.page - 1) * query.pageSize);

  const quantity = (text: string | null) =>
    text === null ? null : quantityToNumber(parseQuantity(text));
  return {
    hasMore: rows.length > query.pageSize,
    movements: rows.slice(0, query.pageSize).map((row) => ({
      ...row,
      quantity: quantity(row.quantity)!,
      unitCost: row.unitCost === null ? null : Number(row.unitCost),
      countedQuantity: quantity(row.countedQuantity),
      grossKg: quantity(row.grossKg),
      itemOnHandAfter: quantity(row.itemOnHandAfter)!,
      createdAt: row.createdAt.toISOString(),
    })),
  };
}
