/**
 * The buying plan from the database: the open build orders' lines, the open lines of sent
 * purchase orders, the items they touch (and every active item already below its reorder
 * point), their price lines; netted by buying-plan.ts. Read-only.
 */
import { and, eq, gt, inArray, isNull, lte, or, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  buildOrderLines,
  buildOrders,
  items,
  purchaseOrderLines,
  purchaseOrders,
} from "~/db/schema";
import { openPurchaseOrderStatuses } from "~/db/tables/purchase-order-enums";
import { addDays, dayOf, type CalendarDate } from "~/lib/calendar-days";
import { parseQuantity } from "~/lib/decimal-amounts";
import { loadItemsPricing } from "~/purchasing/item-prices.server";
import { companyCurrency } from "~/purchasing/suppliers.server";
import {
  buyingPlan,
  remainingNeed,
  type BuyingPlan,
  type PlanItem,
} from "./buying-plan";
import { planWeeks } from "./plan-weeks";

/** Build orders whose needs still count: not built, not cancelled. */
const openBuildOrderStatuses = ["draft", "reserved", "in_progress"] as const;

/** At most this many items are planned at once (a workshop has far fewer). */
const maxPlannedItems = 2_000;

export interface LoadedPlan extends BuyingPlan {
  today: CalendarDate;
  companyCurrency: string;
  /** Draft purchase orders (not on order yet) holding a line of each item, by SKU. */
  draftsBySku: Record<string, number[]>;
}

/** The plan over `weeks` weeks (1–26) from the week of `today` (UTC). */
export async function loadBuyingPlan(
  weeks: number,
  today: CalendarDate = dayOf(new Date()),
): Promise<LoadedPlan> {
  const weekStarts = planWeeks(today, weeks);
  const lastDay = addDays(weekStarts.at(-1)!, 6);
  const [needRows, arrivalRows, lowRows] = await Promise.all([
    db
      .select({
        itemId: buildOrderLines.itemId,
        buildOrderId: buildOrders.id,
        plannedStart: buildOrders.plannedStart,
        required: buildOrderLines.required,
        issued: buildOrderLines.issued,
        reserved: buildOrderLines.reserved,
      })
      .from(buildOrders)
      .innerJoin(buildOrderLines, eq(buildOrderLines.orderId, buildOrders.id))
      .where(
        and(
          inArray(buildOrders.status, openBuildOrderStatuses),
          or(
            isNull(buildOrders.plannedStart),
            lte(buildOrders.plannedStart, lastDay),
          ),
          sql`${buildOrderLines.required} > ${buildOrderLines.issued} + ${buildOrderLines.reserved}`,
        ),
      ),
    db
      .select({
        itemId: purchaseOrderLines.itemId,
        orderId: purchaseOrderLines.orderId,
        expectedDate: purchaseOrderLines.expectedDate,
        quantity: purchaseOrderLines.quantity,
        received: purchaseOrderLines.received,
      })
      .from(purchaseOrders)
      .innerJoin(
        purchaseOrderLines,
        eq(purchaseOrderLines.orderId, purchaseOrders.id),
      )
      .where(
        and(
          inArray(purchaseOrders.status, openPurchaseOrderStatuses),
          lte(purchaseOrderLines.expectedDate, lastDay),
          gt(purchaseOrderLines.quantity, purchaseOrderLines.received),
        ),
      ),
    db
      .select({ id: items.id })
      .from(items)
      .where(and(eq(items.active, true), eq(items.belowReorder, true)))
      .limit(maxPlannedItems),
  ]);
  const itemIds = [
    ...new Set([
      ...needRows.map((row) => row.itemId),
      ...lowRows.map((row) => row.id),
    ]),
  ].slice(0, maxPlannedItems);
  const itemRows =
    itemIds.length === 0
      ? []
      : await db
          .select({
            itemId: items.id,
            sku: items.sku,
            name: items.name,
            unit: items.unit,
            onHand: items.onHand,
            reserved: items.reserved,
            held: items.held,
            reorderPoint: items.reorderPoint,
            reorderQuantity: items.reorderQuantity,
          })
          .from(items)
          .where(inArray(items.id, itemIds));
  const planItems: PlanItem[] = itemRows.map((row) => ({
    ...row,
    onHand: parseQuantity(row.onHand),
    reserved: parseQuantity(row.reserved),
    held: parseQuantity(row.held),
    reorderPoint: parseQuantity(row.reorderPoint),
    reorderQuantity: parseQuantity(row.reorderQuantity),
  }));
  const [pricing, currency, draftRows] = await Promise.all([
    loadItemsPricing(planItems.map((item) => item.sku)),
    companyCurrency(),
    itemIds.length === 0
      ? []
      : db
          .selectDistinct({
            itemId: purchaseOrderLines.itemId,
            orderId: purchaseOrders.id,
          })
          .from(purchaseOrderLines)
          .innerJoin(
            purchaseOrders,
            eq(purchaseOrders.id, purchaseOrderLines.orderId),
          )
          .where(
            and(
              inArray(purchaseOrderLines.itemId, itemIds),
              eq(purchaseOrders.status, "draft"),
            ),
          )
          .orderBy(purchaseOrders.id),
  ]);
  const draftsBySku: Record<string, number[]> = {};
  for (const row of draftRows) {
    const sku = planItems.find((item) => item.itemId === row.itemId)?.sku;
    if (sku) (draftsBySku[sku] ??= []).push(row.orderId);
  }
  const priced = [...pricing.values()];
  const plan = buyingPlan({
    today,
    weeks,
    items: planItems,
    needs: needRows.map((row) => ({
      itemId: row.itemId,
      buildOrderId: row.buildOrderId,
      plannedStart: row.plannedStart,
      remaining: remainingNeed({
        required: parseQuantity(row.required),
        issued: parseQuantity(row.issued),
        reserved: parseQuantity(row.reserved),
      }),
    })),
    arrivals: arrivalRows.map((row) => ({
      itemId: row.itemId,
      orderId: row.orderId,
      expectedDate: row.expectedDate,
      open: parseQuantity(row.quantity) - parseQuantity(row.received),
    })),
    lines: priced.flatMap((item) => item.lines),
    bases: priced[0]?.bases ?? [],
    rates: priced[0]?.rates ?? [],
    companyCurrency: currency,
  });
  return { ...plan, today, companyCurrency: currency, draftsBySku };
}
