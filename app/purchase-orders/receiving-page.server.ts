/**
 * What the /stock/receive page shows: the orders a delivery can be received against, and
 * for one order its open lines with what each may still take (the tolerance), the unit cost
 * a receipt today would book (from the order line, at today's rate) and where the item
 * usually goes.
 */
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  items,
  purchaseOrderLines,
  purchaseOrders,
  suppliers,
  wireItems,
} from "~/db/schema";
import { openPurchaseOrderStatuses } from "~/db/tables/purchase-order-enums";
import type { ConductorKey } from "~/engineering/reference-data";
import { dayOf } from "~/lib/calendar-days";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import { parseMoney } from "~/pricing/money";
import { usualLocationOf } from "~/stock/usual-location.server";
import { deliveryLimit, toleranceFor } from "./delivery-tolerance";
import {
  canReceive,
  purchaseOrderNumber,
  purchaseOrderStatusLabels,
} from "./purchase-order-status";
import { readReceiptPricing } from "./receive-against-order.server";
import { receiptUnitCost } from "./receipt-unit-cost";
import type { ReceivingLine, ReceivingOrder } from "./receiving-view";

/** The newest orders still waiting for deliveries, at most 100. */
export async function listReceivableOrders() {
  const rows = await db
    .select({
      id: purchaseOrders.id,
      status: purchaseOrders.status,
      orderedOn: purchaseOrders.orderedOn,
      supplier: suppliers.name,
    })
    .from(purchaseOrders)
    .innerJoin(suppliers, eq(suppliers.id, purchaseOrders.supplierId))
    .where(inArray(purchaseOrders.status, [...openPurchaseOrderStatuses]))
    .orderBy(desc(purchaseOrders.id))
    .limit(100);
  return rows.map((row) => ({
    ...row,
    number: purchaseOrderNumber(row.id),
    statusLabel: purchaseOrderStatusLabels[row.status],
  }));
}

export async function findReceivingOrder(
  orderId: number,
): Promise<ReceivingOrder | null> {
  const [order] = await db
    .select({
      id: purchaseOrders.id,
      status: purchaseOrders.status,
      currency: purchaseOrders.currency,
      supplier: suppliers.name,
      wireTolerancePercent: suppliers.wireTolerancePercent,
      pieceTolerancePercent: suppliers.pieceTolerancePercent,
    })
    .from(purchaseOrders)
    .innerJoin(suppliers, eq(suppliers.id, purchaseOrders.supplierId))
    .where(eq(purchaseOrders.id, orderId))
    .limit(1);
  if (!order) return null;
  const lineRows = await db
    .select({
      id: purchaseOrderLines.id,
      lineNumber: purchaseOrderLines.lineNumber,
      itemId: items.id,
      sku: items.sku,
      name: items.name,
      unit: items.unit,
      kind: items.kind,
      conductor: wireItems.conductor,
      quantity: purchaseOrderLines.quantity,
      received: purchaseOrderLines.received,
      unitPrice: purchaseOrderLines.unitPrice,
      adderPerKg: purchaseOrderLines.adderPerKg,
      metalBaseFixedAt: purchaseOrderLines.metalBaseFixedAt,
      expectedDate: purchaseOrderLines.expectedDate,
    })
    .from(purchaseOrderLines)
    .innerJoin(items, eq(items.id, purchaseOrderLines.itemId))
    .leftJoin(wireItems, eq(wireItems.itemId, items.id))
    .where(and(eq(purchaseOrderLines.orderId, order.id)))
    .orderBy(asc(purchaseOrderLines.lineNumber));
  const pricing = await readReceiptPricing(
    db,
    order.currency,
    dayOf(new Date()),
  );
  const lines = await Promise.all(
    lineRows.map(async (line): Promise<ReceivingLine> => {
      const ordered = parseQuantity(line.quantity);
      const received = parseQuantity(line.received);
      const tolerance = toleranceFor(line.unit, order);
      const limit = deliveryLimit(ordered, line.unit, tolerance);
      const cost = receiptUnitCost(
        {
          unitPrice: parseMoney(line.unitPrice),
          adderPerKg:
            line.adderPerKg === null ? null : parseMoney(line.adderPerKg),
          metalBaseFixedAt: line.metalBaseFixedAt,
          conductor: (line.conductor as ConductorKey | null) ?? null,
        },
        pricing,
      );
      return {
        id: line.id,
        lineNumber: line.lineNumber,
        sku: line.sku,
        name: line.name,
        unit: line.unit,
        isWire: line.kind === "wire",
        ordered: quantityToNumber(ordered),
        received: quantityToNumber(received),
        open: quantityToNumber(ordered > received ? ordered - received : 0n),
        mayStillTake: quantityToNumber(
          limit > received ? limit - received : 0n,
        ),
        tolerancePercent: Number(tolerance) / 100,
        expectedDate: line.expectedDate,
        unitCost: cost.ok ? Number(cost.unitCost) / 10_000 : null,
        costProblem: cost.ok ? null : cost.message,
        usualLocation: await usualLocationOf(line.itemId),
      };
    }),
  );
  return {
    id: order.id,
    number: purchaseOrderNumber(order.id),
    status: order.status,
    statusLabel: purchaseOrderStatusLabels[order.status],
    receivable: canReceive(order.status),
    supplier: order.supplier,
    currency: order.currency,
    companyCurrency: pricing.companyCurrency,
    lines,
  };
}
