/**
 * Every change to a purchase order: create (by hand or from a low-stock alert), edit a
 * draft, send, cancel, close short. Each runs in one write transaction that takes its
 * locks in one order — the purchase_orders row (SELECT … FOR UPDATE), then its lines,
 * then the item rows in id order — and writes purchase_order_events (who, when, what in
 * words) beside the change. `items.on_order` moves in the same transaction: sending adds
 * each line's quantity, cancelling or closing short takes off what was still open.
 * Refusals throw DomainError before anything is written (or roll the transaction back).
 */
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import type { Transaction } from "~/db/client.server";
import { db } from "~/db/client.server";
import {
  items,
  priceLines,
  purchaseOrderEvents,
  purchaseOrderLines,
  purchaseOrders,
  stockAlerts,
  suppliers,
} from "~/db/schema";
import type { PurchaseOrderStatus } from "~/db/tables/purchase-order-enums";
import { writeTransaction } from "~/db/write-transaction.server";
import { dayOf, type CalendarDate } from "~/lib/calendar-days";
import {
  formatQuantityText,
  formatUnitCostText,
  parseQuantity,
  parseUnitCost,
} from "~/lib/decimal-amounts";
import { DomainError } from "~/lib/domain-error";
import { perUnitWord } from "~/lib/unit-text";
import { deliverLater, writeToOutbox } from "~/mail/mailer.server";
import { bestPrices } from "~/pricing/best-price";
import { loadItemPricing } from "~/purchasing/item-prices.server";
import { suggestedOrderQuantity } from "~/stock/reorder-quantities";
import { movementsCommitted } from "~/stock/stock-movements.server";
import { expectedDateOf, orderDateOf } from "./order-line-pricing";
import { lineValuesFor, type LineValues } from "./order-line-values";
import {
  findItemsBySku,
  findOrderSupplier,
  loadOrderPricingData,
  orderItemColumns,
  type OrderItem,
  type OrderPricingData,
} from "./order-pricing-data.server";
import {
  loadPurchaseOrder,
  type PurchaseOrderView,
} from "./purchase-order-details.server";
import type {
  DraftOrderPatch,
  NewOrderLine,
  OrderLineChange,
} from "./purchase-order-forms";
import {
  companyName,
  orderAddressOf,
  purchaseOrderMail,
} from "./purchase-order-mail.server";
import {
  canCancel,
  canCloseShort,
  canEdit,
  purchaseOrderNumber,
  purchaseOrderStatusLabels,
} from "./purchase-order-status";

export type { NewOrderLine, DraftOrderPatch } from "./purchase-order-forms";

export interface PurchaseOrderInput {
  supplierId: number;
  currency?: string;
  notes?: string;
  lines: readonly NewOrderLine[];
}

const label = "purchase order";

/** The stored order after a change; it exists, the change has just written it. */
async function orderView(orderId: number): Promise<PurchaseOrderView> {
  const view = await loadPurchaseOrder(orderId);
  if (!view) throw new Error(`${purchaseOrderNumber(orderId)} vanished.`);
  return view;
}

// ---------------------------------------------------------------- creating

/** Creates a draft order for a supplier; 422 for an unknown supplier or SKU, or a line without a price. */
export async function createPurchaseOrder(
  input: PurchaseOrderInput,
  userId: string,
  options: { origin?: string } = {},
): Promise<PurchaseOrderView> {
  const orderId = await writeTransaction(
    async (tx) => {
      const supplier = await findOrderSupplier(tx, input.supplierId);
      if (!supplier)
        throw new DomainError(
          422,
          `No supplier has the id ${input.supplierId}.`,
          "supplierId",
        );
      const now = new Date();
      const day = dayOf(now);
      const found = await findItemsBySku(
        tx,
        input.lines.map((line) => line.sku),
      );
      const lineItems = input.lines.map((line, index) =>
        itemOf(found, line.sku, `lines.${index}.sku`),
      );
      const pricing = await loadOrderPricingData(
        tx,
        supplier,
        lineItems.map((item) => item.id),
      );
      const currency = input.currency ?? supplier.currency;
      checkCurrency(currency, pricing, "currency");
      const priced = input.lines.map((line, index) =>
        priceLine(pricing, lineItems[index]!, line, currency, {
          pricingDate: day,
          orderDate: day,
          field: `lines.${index}.unitPrice`,
        }),
      );
      const [created] = await tx
        .insert(purchaseOrders)
        .values({
          supplierId: supplier.id,
          status: "draft",
          currency,
          notes: input.notes ?? "",
          userId,
          createdAt: now,
          updatedAt: now,
        })
        .$returningId();
      const orderId = created!.id;
      for (const [index, line] of priced.entries()) {
        await tx
          .insert(purchaseOrderLines)
          .values(
            lineRow(
              orderId,
              index + 1,
              lineItems[index]!.id,
              input.lines[index]!.quantity,
              line.values,
            ),
          );
      }
      const lineWords = priced.map((line, index) =>
        lineText(
          lineItems[index]!,
          input.lines[index]!.quantity,
          line.values,
          currency,
        ),
      );
      const events: EventText[] = [
        {
          kind: "created",
          detail: `Draft for ${supplier.name} in ${currency}${options.origin ? `, ${options.origin}` : ""}: ${lineWords.length ? lineWords.join("; ") : "no lines yet"}.`,
        },
        ...overrideEvents(priced),
      ];
      await writeEvents(tx, orderId, events, userId, now);
      return orderId;
    },
    { label },
  );
  return orderView(orderId);
}

/**
 * A draft for an open low-stock alert's item at the suggested quantity (the reorder
 * quantity, or the shortfall when larger; what is already on order counts as available),
 * from the item's preferred supplier when it quotes the item, else the supplier with the
 * best price. 404 unknown alert; 409 a closed alert, nothing to order, or nobody quoting.
 */
export async function createOrderFromAlert(
  alertId: number,
  userId: string,
): Promise<PurchaseOrderView> {
  const [alert] = await db
    .select({
      closedAt: stockAlerts.closedAt,
      itemId: items.id,
      sku: items.sku,
      onHand: items.onHand,
      reserved: items.reserved,
      held: items.held,
      onOrder: items.onOrder,
      reorderPoint: items.reorderPoint,
      reorderQuantity: items.reorderQuantity,
      preferredSupplierId: items.preferredSupplierId,
    })
    .from(stockAlerts)
    .innerJoin(items, eq(items.id, stockAlerts.itemId))
    .where(eq(stockAlerts.id, alertId))
    .limit(1);
  if (!alert) throw new DomainError(404, `No low-stock alert ${alertId}.`);
  if (alert.closedAt)
    throw new DomainError(
      409,
      `The alert on ${alert.sku} is closed: stock is back above the reorder point.`,
    );
  const quantity = suggestedOrderQuantity({
    available:
      parseQuantity(alert.onHand) -
      parseQuantity(alert.reserved) -
      parseQuantity(alert.held) +
      parseQuantity(alert.onOrder),
    reorderPoint: parseQuantity(alert.reorderPoint),
    reorderQuantity: parseQuantity(alert.reorderQuantity),
  });
  if (quantity <= 0n)
    throw new DomainError(
      409,
      `Nothing to order for ${alert.sku}: what is on order already brings it back to its reorder point.`,
    );
  const supplierId = await supplierForAlert(alert, quantity);
  return createPurchaseOrder(
    { supplierId, lines: [{ sku: alert.sku, quantity }] },
    userId,
    { origin: `from the low-stock alert on ${alert.sku}` },
  );
}

async function supplierForAlert(
  alert: { itemId: number; sku: string; preferredSupplierId: number | null },
  quantity: bigint,
): Promise<number> {
  if (alert.preferredSupplierId !== null) {
    const [quoted] = await db
      .select({ id: priceLines.id })
      .from(priceLines)
      .where(
        and(
          eq(priceLines.supplierId, alert.preferredSupplierId),
          eq(priceLines.itemId, alert.itemId),
        ),
      )
      .limit(1);
    if (quoted) return alert.preferredSupplierId;
  }
  const pricing = await loadItemPricing(alert.sku);
  const best = pricing
    ? bestPrices({
        itemId: String(pricing.itemId),
        quantity,
        lines: pricing.lines,
        bases: pricing.bases,
        rates: pricing.rates,
        companyCurrency: pricing.companyCurrency,
        date: dayOf(new Date()),
      }).candidates[0]
    : undefined;
  if (!best)
    throw new DomainError(
      409,
      `No supplier has a current price for ${alert.sku}: import a price list, or create the order by hand with a price.`,
    );
  const [supplier] = await db
    .select({ id: suppliers.id })
    .from(suppliers)
    .where(eq(suppliers.name, best.supplier))
    .limit(1);
  return supplier!.id;
}

// ---------------------------------------------------------------- editing a draft

/** Changes a draft's currency, notes and lines; 409 once it is no longer a draft. */
export async function updateDraftOrder(
  orderId: number,
  patch: DraftOrderPatch,
  userId: string,
): Promise<PurchaseOrderView> {
  await writeTransaction(
    async (tx) => {
      const order = await lockOrder(tx, orderId);
      const number = purchaseOrderNumber(orderId);
      if (!canEdit(order.status))
        throw new DomainError(
          409,
          `${number} is ${purchaseOrderStatusLabels[order.status].toLowerCase()}: only a draft can be edited.`,
        );
      const lines = await lockLines(tx, orderId);
      const byId = new Map(lines.map((line) => [line.id, line]));
      const removed = new Set(patch.remove ?? []);
      for (const [index, id] of [
        ...(patch.remove ?? []),
        ...(patch.change ?? []).map((change) => change.id),
      ].entries()) {
        if (!byId.has(id))
          throw new DomainError(
            422,
            `${number} has no line with the id ${id}.`,
            `lines.${index}.id`,
          );
      }
      const changes = patch.change ?? [];
      if (changes.some((change) => removed.has(change.id)))
        throw new DomainError(
          400,
          "A line cannot be changed and removed at once.",
          "lines",
        );
      if (new Set(changes.map((change) => change.id)).size !== changes.length)
        throw new DomainError(400, "Name each line at most once.", "lines");

      const supplier = (await findOrderSupplier(tx, order.supplierId))!;
      const found = await findItemsBySku(
        tx,
        (patch.add ?? []).map((line) => line.sku),
      );
      const added = (patch.add ?? []).map((line, index) =>
        itemOf(found, line.sku, `lines.${index}.sku`),
      );
      const existingItems = await itemsById(
        tx,
        lines.map((line) => line.itemId),
      );
      const pricing = await loadOrderPricingData(tx, supplier, [
        ...lines.map((line) => line.itemId),
        ...added.map((item) => item.id),
      ]);
      const now = new Date();
      const when = {
        pricingDate: dayOf(now),
        orderDate: orderDateOf(order),
      };
      const currency = patch.currency ?? order.currency;
      if (currency !== order.currency)
        checkCurrency(currency, pricing, "currency");
      const events: EventText[] = [];

      for (const id of removed) {
        const line = byId.get(id)!;
        const item = existingItems.get(line.itemId)!;
        await tx
          .delete(purchaseOrderLines)
          .where(eq(purchaseOrderLines.id, id));
        events.push({
          kind: "line-removed",
          detail: `Line ${line.lineNumber} removed: ${item.sku}, ${quantityWords(parseQuantity(line.quantity), item.unit)}.`,
        });
      }

      if (currency !== order.currency) {
        const changedIds = new Set(changes.map((change) => change.id));
        let repriced = 0;
        for (const line of lines) {
          if (removed.has(line.id) || changedIds.has(line.id)) continue;
          if (line.priceSource !== "price_list") continue;
          const item = existingItems.get(line.itemId)!;
          const quantity = parseQuantity(line.quantity);
          const priced = priceLine(
            pricing,
            item,
            {
              sku: item.sku,
              quantity,
              requestedDate: line.requestedDate ?? undefined,
            },
            currency,
            { ...when, field: "currency" },
          );
          await tx
            .update(purchaseOrderLines)
            .set(lineChanges(priced.values))
            .where(eq(purchaseOrderLines.id, line.id));
          repriced += 1;
        }
        const kept = lines.filter(
          (line) =>
            !removed.has(line.id) &&
            !changedIds.has(line.id) &&
            line.priceSource === "override",
        ).length;
        events.push({
          kind: "edited",
          detail: `Currency changed from ${order.currency} to ${currency}; ${repriced} ${repriced === 1 ? "line" : "lines"} priced again from the price list${kept ? `, ${kept} ${kept === 1 ? "price" : "prices"} set by hand kept as typed` : ""}.`,
        });
      }

      if (patch.notes !== undefined && patch.notes !== order.notes)
        events.push({
          kind: "edited",
          detail: patch.notes.trim()
            ? `Notes changed to: ${patch.notes.trim()}`
            : "Notes removed.",
        });

      for (const change of changes) {
        const line = byId.get(change.id)!;
        const item = existingItems.get(line.itemId)!;
        const event = await changeLine(
          tx,
          pricing,
          item,
          line,
          change,
          currency,
          when,
        );
        events.push(...event);
      }

      let nextNumber = Math.max(0, ...lines.map((line) => line.lineNumber)) + 1;
      for (const [index, line] of (patch.add ?? []).entries()) {
        const item = added[index]!;
        const priced = priceLine(pricing, item, line, currency, {
          ...when,
          field: `lines.${index}.unitPrice`,
        });
        await tx
          .insert(purchaseOrderLines)
          .values(
            lineRow(orderId, nextNumber, item.id, line.quantity, priced.values),
          );
        events.push({
          kind: "line-added",
          detail: `Line ${nextNumber} added: ${lineText(item, line.quantity, priced.values, currency)}.`,
        });
        events.push(...overrideEvents([priced]));
        nextNumber += 1;
      }

      if (events.length === 0) return;
      await tx
        .update(purchaseOrders)
        .set({
          currency,
          ...(patch.notes === undefined ? {} : { notes: patch.notes }),
          updatedAt: now,
        })
        .where(eq(purchaseOrders.id, orderId));
      await writeEvents(tx, orderId, events, userId, now);
    },
    { label },
  );
  return orderView(orderId);
}

async function changeLine(
  tx: Transaction,
  pricing: OrderPricingData,
  item: OrderItem,
  line: LockedLine,
  change: OrderLineChange,
  currency: string,
  when: { pricingDate: CalendarDate; orderDate: CalendarDate },
): Promise<EventText[]> {
  const oldQuantity = parseQuantity(line.quantity);
  const oldPrice = parseUnitCost(line.unitPrice);
  const quantity = change.quantity ?? oldQuantity;
  const requestedDate =
    change.requestedDate === undefined
      ? line.requestedDate
      : change.requestedDate;
  // A number overrides the price, null returns to the price list, nothing keeps the line's kind of price.
  const unitPrice =
    change.unitPrice === null
      ? undefined
      : (change.unitPrice ??
        (line.priceSource === "override" ? oldPrice : undefined));
  const overrideReason =
    change.overrideReason ??
    (change.unitPrice === undefined
      ? (line.overrideReason ?? undefined)
      : undefined);
  const priced = priceLine(
    pricing,
    item,
    {
      sku: item.sku,
      quantity,
      unitPrice,
      overrideReason,
      requestedDate: requestedDate ?? undefined,
    },
    currency,
    { ...when, field: "lines" },
  );
  const differences: string[] = [];
  if (quantity !== oldQuantity)
    differences.push(
      `quantity ${quantityWords(oldQuantity, item.unit)} → ${quantityWords(quantity, item.unit)}`,
    );
  if (priced.values.unitPrice !== oldPrice)
    differences.push(
      `price ${formatUnitCostText(oldPrice)} → ${formatUnitCostText(priced.values.unitPrice)} ${currency}/${perUnitWord(item.unit)}`,
    );
  if ((requestedDate ?? null) !== (line.requestedDate ?? null))
    differences.push(
      `requested date ${line.requestedDate ?? "none"} → ${requestedDate ?? "none"}`,
    );
  if (priced.values.priceSource !== line.priceSource)
    differences.push(
      priced.values.priceSource === "override"
        ? "now priced by hand"
        : "back to the price list",
    );
  if (
    differences.length === 0 &&
    priced.values.overrideReason === line.overrideReason
  )
    return [];
  await tx
    .update(purchaseOrderLines)
    .set({
      quantity: formatQuantityText(quantity),
      ...lineChanges(priced.values),
    })
    .where(eq(purchaseOrderLines.id, line.id));
  const events: EventText[] = [];
  if (differences.length)
    events.push({
      kind: "line-changed",
      detail: `Line ${line.lineNumber} (${item.sku}): ${differences.join("; ")}.`,
    });
  const overridden =
    priced.overrideDetail !== null &&
    (line.priceSource !== "override" ||
      priced.values.unitPrice !== oldPrice ||
      priced.values.overrideReason !== line.overrideReason);
  if (overridden) events.push(...overrideEvents([priced]));
  return events;
}

// ---------------------------------------------------------------- sending

/**
 * Sends a draft: the lines are frozen, ordered_on and sent_at set, expected dates counted
 * again from the sending day, wire lines whose base is fixed on ordering priced on the
 * sending day's base, each line's quantity added to its item's on_order, the history
 * written and the e-mail (PDF and CSV attached) queued in the outbox — all in one
 * transaction; the e-mail is handed to SMTP once it has committed.
 */
export async function sendPurchaseOrder(
  orderId: number,
  userId: string,
): Promise<PurchaseOrderView> {
  const queued = await writeTransaction(
    async (tx) => {
      const order = await lockOrder(tx, orderId);
      const number = purchaseOrderNumber(orderId);
      if (order.status !== "draft")
        throw new DomainError(
          409,
          `${number} is ${purchaseOrderStatusLabels[order.status].toLowerCase()}: only a draft can be sent.`,
        );
      const lines = await lockLines(tx, orderId);
      if (lines.length === 0)
        throw new DomainError(
          409,
          `${number} has no lines: add one before sending it.`,
          "lines",
        );
      const supplier = (await findOrderSupplier(tx, order.supplierId))!;
      const to = orderAddressOf(supplier);
      const now = new Date();
      const day = dayOf(now);
      const itemIds = [...new Set(lines.map((line) => line.itemId))].sort(
        (a, b) => a - b,
      );
      const lockedItems = await lockItems(tx, itemIds);
      const pricing = await loadOrderPricingData(tx, supplier, itemIds);
      const notes: string[] = [];
      for (const line of lines) {
        const item = lockedItems.get(line.itemId)!;
        let set: Partial<typeof purchaseOrderLines.$inferInsert> = {
          expectedDate: expectedDateOf({
            requestedDate: line.requestedDate,
            orderDate: day,
            leadTimeDays: line.leadTimeDays,
          }),
        };
        if (
          line.priceSource === "price_list" &&
          line.metalBasePerKg !== null &&
          line.metalBaseFixedAt === "order"
        ) {
          const priced = priceLine(
            pricing,
            item,
            {
              sku: item.sku,
              quantity: parseQuantity(line.quantity),
              requestedDate: line.requestedDate ?? undefined,
            },
            order.currency,
            { pricingDate: day, orderDate: day, field: "lines" },
          );
          const oldPrice = parseUnitCost(line.unitPrice);
          if (priced.values.unitPrice !== oldPrice) {
            set = lineChanges(priced.values);
            notes.push(
              `line ${line.lineNumber} (${item.sku}) priced on the metal base of ${day}: ${formatUnitCostText(oldPrice)} → ${formatUnitCostText(priced.values.unitPrice)} ${order.currency}/${perUnitWord(item.unit)}`,
            );
          }
        }
        await tx
          .update(purchaseOrderLines)
          .set(set)
          .where(eq(purchaseOrderLines.id, line.id));
      }
      for (const itemId of itemIds) {
        const ordered = lines
          .filter((line) => line.itemId === itemId)
          .reduce((sum, line) => sum + parseQuantity(line.quantity), 0n);
        await tx
          .update(items)
          .set({
            onOrder: sql`${items.onOrder} + ${formatQuantityText(ordered)}`,
          })
          .where(eq(items.id, itemId));
      }
      await tx
        .update(purchaseOrders)
        .set({ status: "sent", orderedOn: day, sentAt: now, updatedAt: now })
        .where(eq(purchaseOrders.id, orderId));
      const view = (await loadPurchaseOrder(orderId, tx))!;
      const mail = await purchaseOrderMail(view, await companyName(tx), to);
      const messages = await writeToOutbox(tx, [mail]);
      const files = (mail.attachments ?? []).map((file) => file.fileName);
      await writeEvents(
        tx,
        orderId,
        [
          {
            kind: "sent",
            detail: `Sent to ${to} with ${files.join(" and ")}${notes.length ? `; ${notes.join("; ")}` : ""}.`,
          },
        ],
        userId,
        now,
      );
      return messages;
    },
    { label },
  );
  deliverLater(queued);
  return viewAfterOnOrderChanged(orderId);
}

// ---------------------------------------------------------------- ending

/** Cancels a draft or a sent order nothing has arrived for; a sent one's quantities leave on_order. */
export async function cancelPurchaseOrder(
  orderId: number,
  reason: string | undefined,
  userId: string,
): Promise<PurchaseOrderView> {
  return endOrder(orderId, reason, userId, "cancelled");
}

/** Ends a sent or partly received order that will not be delivered in full; what was still open leaves on_order. */
export async function closePurchaseOrderShort(
  orderId: number,
  reason: string | undefined,
  userId: string,
): Promise<PurchaseOrderView> {
  return endOrder(orderId, reason, userId, "closed_short");
}

async function endOrder(
  orderId: number,
  reason: string | undefined,
  userId: string,
  to: "cancelled" | "closed_short",
): Promise<PurchaseOrderView> {
  await writeTransaction(
    async (tx) => {
      const order = await lockOrder(tx, orderId);
      const number = purchaseOrderNumber(orderId);
      const status = purchaseOrderStatusLabels[order.status].toLowerCase();
      const allowed = to === "cancelled" ? canCancel : canCloseShort;
      if (!allowed(order.status))
        throw new DomainError(
          409,
          to === "cancelled"
            ? `${number} is ${status}: only a draft or a sent order with nothing received can be cancelled${order.status === "partly_received" ? " (close it short instead)" : ""}.`
            : `${number} is ${status}: only a sent or partly received order can be closed short${order.status === "draft" ? " (cancel a draft instead)" : ""}.`,
        );
      const lines = await lockLines(tx, orderId);
      if (
        to === "cancelled" &&
        lines.some((line) => parseQuantity(line.received) > 0n)
      )
        throw new DomainError(
          409,
          `Something has arrived against ${number}: close it short instead of cancelling it.`,
        );
      const openWords: string[] = [];
      if (order.status === "sent" || order.status === "partly_received") {
        const itemIds = [...new Set(lines.map((line) => line.itemId))].sort(
          (a, b) => a - b,
        );
        const lockedItems = await lockItems(tx, itemIds);
        for (const itemId of itemIds) {
          const open = lines
            .filter((line) => line.itemId === itemId)
            .reduce((sum, line) => {
              const rest =
                parseQuantity(line.quantity) - parseQuantity(line.received);
              return sum + (rest > 0n ? rest : 0n);
            }, 0n);
          if (open === 0n) continue;
          const item = lockedItems.get(itemId)!;
          openWords.push(`${item.sku} ${quantityWords(open, item.unit)}`);
          await tx
            .update(items)
            .set({
              onOrder: sql`GREATEST(${items.onOrder} - ${formatQuantityText(open)}, 0)`,
            })
            .where(eq(items.id, itemId));
        }
      }
      const now = new Date();
      await tx
        .update(purchaseOrders)
        .set({ status: to, endReason: reason ?? null, updatedAt: now })
        .where(eq(purchaseOrders.id, orderId));
      const verb = to === "cancelled" ? "Cancelled" : "Closed short";
      await writeEvents(
        tx,
        orderId,
        [
          {
            kind: to === "cancelled" ? "cancelled" : "closed-short",
            detail: `${verb}${reason ? `: ${reason}` : " (no reason given)"}.${openWords.length ? ` No longer on order: ${openWords.join(", ")}.` : ""}`,
          },
        ],
        userId,
        now,
      );
    },
    { label },
  );
  return viewAfterOnOrderChanged(orderId);
}

/**
 * The order after its items' stock on order changed (sent, cancelled, closed short): the
 * ledger's after-commit work runs for those items, so a low-stock alert's cover by sent
 * orders (decision 011) is worked out again at once.
 */
async function viewAfterOnOrderChanged(
  orderId: number,
): Promise<PurchaseOrderView> {
  const view = await orderView(orderId);
  await movementsCommitted([...new Set(view.lines.map((line) => line.sku))]);
  return view;
}

// ---------------------------------------------------------------- shared steps

interface EventText {
  kind: string;
  detail: string;
}

async function writeEvents(
  tx: Transaction,
  orderId: number,
  events: readonly EventText[],
  userId: string,
  at: Date,
) {
  for (const event of events) {
    await tx.insert(purchaseOrderEvents).values({
      orderId,
      kind: event.kind,
      detail: event.detail.slice(0, 1000),
      userId,
      createdAt: at,
    });
  }
}

interface LockedOrder {
  id: number;
  supplierId: number;
  status: PurchaseOrderStatus;
  currency: string;
  notes: string;
  orderedOn: string | null;
  createdAt: Date;
}

/** Locks the order row first; 404 when there is none. */
async function lockOrder(
  tx: Transaction,
  orderId: number,
): Promise<LockedOrder> {
  const [order] = await tx
    .select({
      id: purchaseOrders.id,
      supplierId: purchaseOrders.supplierId,
      status: purchaseOrders.status,
      currency: purchaseOrders.currency,
      notes: purchaseOrders.notes,
      orderedOn: purchaseOrders.orderedOn,
      createdAt: purchaseOrders.createdAt,
    })
    .from(purchaseOrders)
    .where(eq(purchaseOrders.id, orderId))
    .for("update");
  if (!order)
    throw new DomainError(
      404,
      `No purchase order ${purchaseOrderNumber(orderId)}.`,
    );
  return order;
}

/** Locks the order's lines (after the order row), in line order. */
async function lockLines(tx: Transaction, orderId: number) {
  return tx
    .select({
      id: purchaseOrderLines.id,
      lineNumber: purchaseOrderLines.lineNumber,
      itemId: purchaseOrderLines.itemId,
      quantity: purchaseOrderLines.quantity,
      received: purchaseOrderLines.received,
      unitPrice: purchaseOrderLines.unitPrice,
      priceSource: purchaseOrderLines.priceSource,
      overrideReason: purchaseOrderLines.overrideReason,
      metalBasePerKg: purchaseOrderLines.metalBasePerKg,
      metalBaseFixedAt: purchaseOrderLines.metalBaseFixedAt,
      requestedDate: purchaseOrderLines.requestedDate,
      leadTimeDays: purchaseOrderLines.leadTimeDays,
    })
    .from(purchaseOrderLines)
    .where(eq(purchaseOrderLines.orderId, orderId))
    .orderBy(asc(purchaseOrderLines.lineNumber))
    .for("update");
}
type LockedLine = Awaited<ReturnType<typeof lockLines>>[number];

/** Locks item rows in id order (after the order and its lines). */
async function lockItems(
  tx: Transaction,
  itemIds: readonly number[],
): Promise<Map<number, OrderItem>> {
  if (itemIds.length === 0) return new Map();
  const rows = await tx
    .select(orderItemColumns)
    .from(items)
    .where(inArray(items.id, [...itemIds]))
    .orderBy(asc(items.id))
    .for("update");
  return new Map(rows.map((row) => [row.id, row]));
}

async function itemsById(tx: Transaction, itemIds: readonly number[]) {
  if (itemIds.length === 0) return new Map<number, OrderItem>();
  const rows = await tx
    .select(orderItemColumns)
    .from(items)
    .where(inArray(items.id, [...new Set(itemIds)]));
  return new Map(rows.map((row) => [row.id, row]));
}

function itemOf(
  found: Map<string, OrderItem>,
  sku: string,
  field: string,
): OrderItem {
  const item = found.get(sku.toUpperCase());
  if (!item) throw new DomainError(422, `No item has the SKU "${sku}".`, field);
  if (!item.active)
    throw new DomainError(
      422,
      `${item.sku} is archived: it cannot be ordered.`,
      field,
    );
  return item;
}

/** A currency other than the supplier's and the company's needs a rate to price in. */
function checkCurrency(
  currency: string,
  pricing: OrderPricingData,
  field: string,
) {
  if (
    currency === pricing.supplier.currency ||
    currency === pricing.companyCurrency ||
    pricing.rates.some((rate) => rate.currency === currency)
  )
    return;
  throw new DomainError(
    422,
    `No exchange rate is kept for ${currency}: order in ${pricing.supplier.currency} or ${pricing.companyCurrency}, or enter a rate for ${currency} first.`,
    field,
  );
}

function priceLine(
  pricing: OrderPricingData,
  item: OrderItem,
  line: Pick<
    NewOrderLine,
    "quantity" | "unitPrice" | "overrideReason" | "requestedDate"
  > & {
    sku: string;
  },
  currency: string,
  when: { pricingDate: CalendarDate; orderDate: CalendarDate; field: string },
) {
  if (item.unit === "pcs" && line.quantity % 1000n !== 0n)
    throw new DomainError(
      400,
      `${item.sku} is counted in whole pieces.`,
      when.field.replace(/unitPrice$/, "quantity"),
    );
  const result = lineValuesFor({
    item,
    quantity: line.quantity,
    unitPrice: line.unitPrice,
    overrideReason: line.overrideReason,
    requestedDate: line.requestedDate ?? null,
    pricingDate: when.pricingDate,
    orderDate: when.orderDate,
    currency,
    pricing: {
      lines: pricing.linesByItem.get(item.id) ?? [],
      supplierSku: pricing.supplierSkus.get(item.id),
      supplierLeadTimeDays: pricing.supplier.leadTimeDays,
      metalBaseFixedAt: pricing.supplier.metalBaseFixedAt,
      bases: pricing.bases,
      rates: pricing.rates,
      companyCurrency: pricing.companyCurrency,
    },
  });
  if (!result.ok) throw new DomainError(422, result.message, when.field);
  return result;
}

const moneyText = (amount: bigint | null) =>
  amount === null ? null : formatUnitCostText(amount);

/** The columns of a line that pricing sets. */
function lineChanges(values: LineValues) {
  return {
    supplierSku: values.supplierSku,
    unitPrice: formatUnitCostText(values.unitPrice),
    priceSource: values.priceSource,
    overrideReason: values.overrideReason,
    metalBasePerKg: moneyText(values.metalBasePerKg),
    adderPerKg: moneyText(values.adderPerKg),
    metalBaseFixedAt: values.metalBaseFixedAt,
    requestedDate: values.requestedDate,
    leadTimeDays: values.leadTimeDays,
    expectedDate: values.expectedDate,
  };
}

function lineRow(
  orderId: number,
  lineNumber: number,
  itemId: number,
  quantity: bigint,
  values: LineValues,
) {
  return {
    orderId,
    lineNumber,
    itemId,
    quantity: formatQuantityText(quantity),
    ...lineChanges(values),
  };
}

function quantityWords(quantity: bigint, unit: string): string {
  return `${formatQuantityText(quantity)} ${unit}`;
}

function lineText(
  item: OrderItem,
  quantity: bigint,
  values: LineValues,
  currency: string,
): string {
  return `${item.sku} ${quantityWords(quantity, item.unit)} at ${formatUnitCostText(values.unitPrice)} ${currency}/${perUnitWord(item.unit)}`;
}

function overrideEvents(
  priced: readonly { overrideDetail: string | null }[],
): EventText[] {
  return priced.flatMap((line) =>
    line.overrideDetail
      ? [{ kind: "price-overridden", detail: line.overrideDetail }]
      : [],
  );
}
