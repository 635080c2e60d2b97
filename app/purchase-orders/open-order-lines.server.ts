/**
 * Open order lines for reading: an item's lines still to come (the item page), and every
 * line whose expected day has passed (the late lines page). A line is open while its order
 * is sent or partly received and less than its quantity has arrived.
 */
import { and, asc, count, eq, gt, inArray, lt, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  items,
  purchaseOrderLines,
  purchaseOrders,
  suppliers,
} from "~/db/schema";
import { openPurchaseOrderStatuses } from "~/db/tables/purchase-order-enums";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import { daysLate } from "./order-line-dates";
import { purchaseOrderNumber } from "./purchase-order-status";

const openLine = and(
  inArray(purchaseOrders.status, [...openPurchaseOrderStatuses]),
  gt(purchaseOrderLines.quantity, sql`${purchaseOrderLines.received}`),
);

const lineColumns = {
  lineId: purchaseOrderLines.id,
  orderId: purchaseOrderLines.orderId,
  lineNumber: purchaseOrderLines.lineNumber,
  supplierId: purchaseOrders.supplierId,
  supplier: suppliers.name,
  quantity: purchaseOrderLines.quantity,
  received: purchaseOrderLines.received,
  expectedDate: purchaseOrderLines.expectedDate,
};

function lineOf(
  row: {
    lineId: number;
    orderId: number;
    lineNumber: number;
    supplierId: number;
    supplier: string;
    quantity: string;
    received: string;
    expectedDate: string;
  },
  today: string,
) {
  const late = daysLate(row.expectedDate, today);
  return {
    lineId: row.lineId,
    orderId: row.orderId,
    order: purchaseOrderNumber(row.orderId),
    lineNumber: row.lineNumber,
    supplierId: row.supplierId,
    supplier: row.supplier,
    ordered: quantityToNumber(parseQuantity(row.quantity)),
    open: quantityToNumber(
      parseQuantity(row.quantity) - parseQuantity(row.received),
    ),
    expectedDate: row.expectedDate,
    daysLate: late,
    late: late > 0,
  };
}

export const itemOrderLinesLimit = 50;

/**
 * The item's open order lines, earliest due first (purchase_order_lines_item_idx:
 * item, expected day). At most {@link itemOrderLinesLimit}; the kept balance
 * (items.on_order) is their total.
 */
export async function openOrderLinesOfItem(itemId: number, today: string) {
  const rows = await db
    .select(lineColumns)
    .from(purchaseOrderLines)
    .innerJoin(
      purchaseOrders,
      eq(purchaseOrders.id, purchaseOrderLines.orderId),
    )
    .innerJoin(suppliers, eq(suppliers.id, purchaseOrders.supplierId))
    .where(and(eq(purchaseOrderLines.itemId, itemId), openLine))
    .orderBy(asc(purchaseOrderLines.expectedDate), asc(purchaseOrderLines.id))
    .limit(itemOrderLinesLimit);
  return rows.map((row) => lineOf(row, today));
}

export const lateLinesPageSize = 50;

/**
 * One page of the open lines whose expected day is before today, longest late first, and
 * how many there are. Read in expected-day order on purchase_order_lines_expected_idx:
 * only the lines due before today are touched, never the whole table.
 */
export async function listLateLines(options: {
  today: string;
  page: number;
  perPage?: number;
}) {
  const perPage = options.perPage ?? lateLinesPageSize;
  const where = and(
    lt(purchaseOrderLines.expectedDate, options.today),
    openLine,
  );
  const hint = { useIndex: "purchase_order_lines_expected_idx" } as const;
  const [counted] = await db
    .select({ total: count() })
    .from(purchaseOrderLines, hint)
    .innerJoin(
      purchaseOrders,
      eq(purchaseOrders.id, purchaseOrderLines.orderId),
    )
    .where(where);
  const rows = await db
    .select({
      ...lineColumns,
      sku: items.sku,
      name: items.name,
      unit: items.unit,
    })
    .from(purchaseOrderLines, hint)
    .innerJoin(
      purchaseOrders,
      eq(purchaseOrders.id, purchaseOrderLines.orderId),
    )
    .innerJoin(suppliers, eq(suppliers.id, purchaseOrders.supplierId))
    .innerJoin(items, eq(items.id, purchaseOrderLines.itemId))
    .where(where)
    .orderBy(asc(purchaseOrderLines.expectedDate), asc(purchaseOrderLines.id))
    .limit(perPage)
    .offset((options.page - 1) * perPage);
  return {
    total: counted?.total ?? 0,
    lines: rows.map((row) => ({
      ...lineOf(row, options.today),
      sku: row.sku,
      name: row.name,
      unit: row.unit,
    })),
  };
}
