/**
 * The demo company's purchase orders, through the app's ordering and receiving code: one
 * order in each state (received, partly received, sent and running late, closed short,
 * cancelled, and drafts — one from a low-stock alert), and a build order planned a few
 * weeks ahead so the buying plan has something to suggest. Suppliers and SKUs come from
 * the demo price lists already imported; dates are moved back where a state needs a past.
 */
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  items,
  priceLines,
  purchaseOrderLines,
  purchaseOrders,
  stockAlerts,
  suppliers,
} from "~/db/schema";
import { buildOrderCreateSchema } from "~/build-orders/build-order-forms";
import { createBuildOrder } from "~/build-orders/build-orders.server";
import { addDays, todayUtc } from "~/lib/calendar-days";
import { quantityFromNumber } from "~/lib/decimal-amounts";
import { receiptRequestSchema } from "~/purchase-orders/receipt-request";
import { receiveAgainstOrder } from "~/purchase-orders/receive-against-order.server";
import {
  cancelPurchaseOrder,
  closePurchaseOrderShort,
  createOrderFromAlert,
  createPurchaseOrder,
  sendPurchaseOrder,
} from "~/purchase-orders/purchase-order-writes.server";
import type { DemoDesigns } from "./demo-designs";
import { demoPersonId } from "./demo-person-ids";

const today = () => todayUtc();
const amount = (value: number) => quantityFromNumber(value)!;

/** The supplier's id and the SKUs its price lines quote, of one unit, in SKU order. */
async function quotedSkus(supplierName: string, unit: "kg" | "pcs") {
  const [supplier] = await db
    .select({ id: suppliers.id })
    .from(suppliers)
    .where(eq(suppliers.name, supplierName))
    .limit(1);
  if (!supplier) throw new Error(`Demo supplier ${supplierName} is missing.`);
  const rows = await db
    .selectDistinct({ sku: items.sku })
    .from(priceLines)
    .innerJoin(items, eq(items.id, priceLines.itemId))
    .where(and(eq(priceLines.supplierId, supplier.id), eq(items.unit, unit)))
    .orderBy(asc(items.sku));
  return { supplierId: supplier.id, skus: rows.map((row) => row.sku) };
}

/** Moves a sent order's dates back, as if it had gone out `days` ago (demo history only). */
async function sentDaysAgo(orderId: number, days: number, leadDays: number) {
  const orderedOn = addDays(today(), -days);
  await db
    .update(purchaseOrders)
    .set({ orderedOn, sentAt: new Date(`${orderedOn}T09:30:00Z`) })
    .where(eq(purchaseOrders.id, orderId));
  await db
    .update(purchaseOrderLines)
    .set({ expectedDate: addDays(orderedOn, leadDays) })
    .where(eq(purchaseOrderLines.orderId, orderId));
}

export async function seedDemoPurchaseOrders(
  designs: DemoDesigns,
): Promise<void> {
  const buyerId = demoPersonId("buyer");
  const storekeeperId = demoPersonId("storekeeper");
  const builderId = demoPersonId("builder");
  const wire = await quotedSkus("Quillan Drawn Wire GmbH", "kg");
  const parts = await quotedSkus("Corbel Motor Parts BV", "pcs");
  const magnets = await quotedSkus("Marrowfield Magnet Supply Inc.", "pcs");
  const otherWire = await quotedSkus("Fenwright Windings Oy", "kg");

  // Received in full: shafts from Corbel, sent three weeks ago.
  const shafts = await createPurchaseOrder(
    {
      supplierId: parts.supplierId,
      notes: "Shafts for the spring outrunner batches.",
      lines: [{ sku: parts.skus[0]!, quantity: amount(50) }],
    },
    buyerId,
  );
  await sendPurchaseOrder(shafts.id, buyerId);
  await receiveAgainstOrder(
    shafts.id,
    receiptRequestSchema.parse({
      lines: [
        {
          lineId: shafts.lines[0]!.id,
          lot: "CMP-DN-20991",
          location: "PARTS-C1",
          quantity: 50,
        },
      ],
    }),
    storekeeperId,
  );

  // Partly received: two wire sizes from Quillan; one spool of the first has come in.
  const spools = await createPurchaseOrder(
    {
      supplierId: wire.supplierId,
      notes: "Spools on DIN 250 reels, please.",
      lines: [
        { sku: wire.skus[0]!, quantity: amount(10) },
        { sku: wire.skus[1] ?? wire.skus[0]!, quantity: amount(10) },
      ],
    },
    buyerId,
  );
  await sendPurchaseOrder(spools.id, buyerId);
  await receiveAgainstOrder(
    spools.id,
    receiptRequestSchema.parse({
      lines: [
        {
          lineId: spools.lines[0]!.id,
          lot: "Q-25-12040",
          location: "WIRE-A1",
          grossKg: 5.62,
          tareKg: 0.6,
        },
      ],
    }),
    storekeeperId,
  );

  // Sent and running late: magnets from Marrowfield, due a week ago.
  const late = await createPurchaseOrder(
    {
      supplierId: magnets.supplierId,
      lines: [{ sku: magnets.skus[0]!, quantity: amount(200) }],
    },
    buyerId,
  );
  await sendPurchaseOrder(late.id, buyerId);
  await sentDaysAgo(late.id, 35, 28);

  // Closed short: the supplier could deliver only part of the slot wedges.
  const wedges = await createPurchaseOrder(
    {
      supplierId: parts.supplierId,
      lines: [{ sku: parts.skus[1] ?? parts.skus[0]!, quantity: amount(100) }],
    },
    buyerId,
  );
  await sendPurchaseOrder(wedges.id, buyerId);
  await receiveAgainstOrder(
    wedges.id,
    receiptRequestSchema.parse({
      lines: [
        {
          lineId: wedges.lines[0]!.id,
          lot: "CMP-DN-21007",
          location: "PARTS-C1",
          quantity: 60,
        },
      ],
    }),
    storekeeperId,
  );
  await closePurchaseOrderShort(
    wedges.id,
    "The rest of this size is discontinued; the next order takes the new part.",
    buyerId,
  );

  // Cancelled: ordered twice by mistake.
  const twice = await createPurchaseOrder(
    {
      supplierId: otherWire.supplierId,
      lines: [{ sku: otherWire.skus[0]!, quantity: amount(10) }],
    },
    buyerId,
  );
  await sendPurchaseOrder(twice.id, buyerId);
  await cancelPurchaseOrder(
    twice.id,
    "Ordered twice; the Quillan order covers it.",
    buyerId,
  );

  // Drafts: one from an open low-stock alert, one by hand.
  const [alert] = await db
    .select({ id: stockAlerts.id })
    .from(stockAlerts)
    .where(
      and(isNull(stockAlerts.closedAt), isNull(stockAlerts.coveredByOrderId)),
    )
    .orderBy(asc(stockAlerts.id))
    .limit(1);
  if (alert) await createOrderFromAlert(alert.id, buyerId);
  await createPurchaseOrder(
    {
      supplierId: otherWire.supplierId,
      notes: "Check the enamel grade with the winding shop before sending.",
      lines: [
        { sku: otherWire.skus[1] ?? otherWire.skus[0]!, quantity: amount(20) },
      ],
    },
    buyerId,
  );

  // A larger outrunner batch planned three weeks out: the buying plan nets it.
  await createBuildOrder(
    buildOrderCreateSchema.parse({
      designId: designs.outrunner.id,
      revision: designs.outrunner.released,
      quantity: 24,
      plannedStart: addDays(today(), 21),
      note: "Second conveyor customer: 24 motors for the spring line.",
    }),
    builderId,
  );
}
