/**
 * Reading purchase orders: one order with its supplier, lines, history and receipts
 * (`loadPurchaseOrder`), the paged list (`listPurchaseOrders`, on the status or supplier
 * index), and the same order as the API's JSON (`purchaseOrderJson`: quantities and
 * prices as numbers in the item's unit and the order's currency).
 */
import {
  and,
  asc,
  count,
  desc,
  eq,
  inArray,
  like,
  or,
  sql,
  type SQL,
} from "drizzle-orm";
import { containsPattern } from "~/lib/list-filters";
import { db, type Database, type Transaction } from "~/db/client.server";
import {
  items,
  purchaseOrderEvents,
  purchaseOrderLines,
  purchaseOrders,
  purchaseReceiptLines,
  purchaseReceipts,
  suppliers,
  users,
} from "~/db/schema";
import {
  parseQuantity,
  parseUnitCost,
  quantityToNumber,
} from "~/lib/decimal-amounts";
import { orderDateOf } from "./order-line-pricing";
import { lineTotalCents } from "./purchase-order-document";
import type { PurchaseOrderListQuery } from "./purchase-order-forms";
import {
  purchaseOrderIdFromNumber,
  purchaseOrderNumber,
  purchaseOrderStatusLabels,
} from "./purchase-order-status";

type Reader = Database | Transaction;

const moneyOrNull = (value: string | null) =>
  value === null ? null : parseUnitCost(value);

/** One order as the pages, the API and the printed order read it; null when there is none. */
export async function loadPurchaseOrder(orderId: number, reader: Reader = db) {
  const [order] = await reader
    .select({
      id: purchaseOrders.id,
      status: purchaseOrders.status,
      currency: purchaseOrders.currency,
      notes: purchaseOrders.notes,
      orderedOn: purchaseOrders.orderedOn,
      sentAt: purchaseOrders.sentAt,
      endReason: purchaseOrders.endReason,
      createdAt: purchaseOrders.createdAt,
      updatedAt: purchaseOrders.updatedAt,
      createdBy: users.name,
      supplierId: suppliers.id,
      supplierName: suppliers.name,
      supplierEmail: suppliers.email,
      supplierOrderEmail: suppliers.orderEmail,
      supplierCurrency: suppliers.currency,
      metalBaseFixedAt: suppliers.metalBaseFixedAt,
    })
    .from(purchaseOrders)
    .innerJoin(suppliers, eq(suppliers.id, purchaseOrders.supplierId))
    .innerJoin(users, eq(users.id, purchaseOrders.userId))
    .where(eq(purchaseOrders.id, orderId))
    .limit(1);
  if (!order) return null;
  const [lineRows, eventRows, receiptRows] = await Promise.all([
    reader
      .select({
        id: purchaseOrderLines.id,
        lineNumber: purchaseOrderLines.lineNumber,
        itemId: items.id,
        sku: items.sku,
        name: items.name,
        unit: items.unit,
        supplierSku: purchaseOrderLines.supplierSku,
        quantity: purchaseOrderLines.quantity,
        received: purchaseOrderLines.received,
        unitPrice: purchaseOrderLines.unitPrice,
        priceSource: purchaseOrderLines.priceSource,
        overrideReason: purchaseOrderLines.overrideReason,
        metalBasePerKg: purchaseOrderLines.metalBasePerKg,
        adderPerKg: purchaseOrderLines.adderPerKg,
        metalBaseFixedAt: purchaseOrderLines.metalBaseFixedAt,
        requestedDate: purchaseOrderLines.requestedDate,
        leadTimeDays: purchaseOrderLines.leadTimeDays,
        expectedDate: purchaseOrderLines.expectedDate,
        completedAt: purchaseOrderLines.completedAt,
      })
      .from(purchaseOrderLines)
      .innerJoin(items, eq(items.id, purchaseOrderLines.itemId))
      .where(eq(purchaseOrderLines.orderId, orderId))
      .orderBy(asc(purchaseOrderLines.lineNumber)),
    reader
      .select({
        id: purchaseOrderEvents.id,
        kind: purchaseOrderEvents.kind,
        detail: purchaseOrderEvents.detail,
        at: purchaseOrderEvents.createdAt,
        person: users.name,
      })
      .from(purchaseOrderEvents)
      .innerJoin(users, eq(users.id, purchaseOrderEvents.userId))
      .where(eq(purchaseOrderEvents.orderId, orderId))
      .orderBy(asc(purchaseOrderEvents.id)),
    reader
      .select({
        id: purchaseReceipts.id,
        receivedOn: purchaseReceipts.receivedOn,
        createdAt: purchaseReceipts.createdAt,
        person: users.name,
      })
      .from(purchaseReceipts)
      .innerJoin(users, eq(users.id, purchaseReceipts.userId))
      .where(eq(purchaseReceipts.orderId, orderId))
      .orderBy(asc(purchaseReceipts.id)),
  ]);
  const receiptLines =
    receiptRows.length === 0
      ? []
      : await reader
          .select({
            receiptId: purchaseReceiptLines.receiptId,
            orderLineId: purchaseReceiptLines.orderLineId,
            movementId: purchaseReceiptLines.movementId,
            quantity: purchaseReceiptLines.quantity,
            unitPrice: purchaseReceiptLines.unitPrice,
          })
          .from(purchaseReceiptLines)
          .where(
            inArray(
              purchaseReceiptLines.receiptId,
              receiptRows.map((receipt) => receipt.id),
            ),
          )
          .orderBy(asc(purchaseReceiptLines.id));
  const lines = lineRows.map((line) => {
    const quantity = parseQuantity(line.quantity);
    const received = parseQuantity(line.received);
    const unitPrice = parseUnitCost(line.unitPrice);
    return {
      ...line,
      quantity,
      received,
      /** Still to come: ordered − received, never below 0. */
      open: quantity > received ? quantity - received : 0n,
      unitPrice,
      metalBasePerKg: moneyOrNull(line.metalBasePerKg),
      adderPerKg: moneyOrNull(line.adderPerKg),
      // To the cent, as the printed order and its PDF and CSV add it up (one rule).
      lineTotal: lineTotalCents(quantity, unitPrice) * 100n,
    };
  });
  return {
    id: order.id,
    number: purchaseOrderNumber(order.id),
    status: order.status,
    statusLabel: purchaseOrderStatusLabels[order.status],
    currency: order.currency,
    notes: order.notes,
    /** The day lead times count from: the sending day, else the creation day. */
    orderDate: orderDateOf(order),
    orderedOn: order.orderedOn,
    sentAt: order.sentAt,
    endReason: order.endReason,
    createdAt: order.createdAt,
    updatedAt: order.updatedAt,
    createdBy: order.createdBy,
    supplier: {
      id: order.supplierId,
      name: order.supplierName,
      email: order.supplierEmail,
      orderEmail: order.supplierOrderEmail,
      currency: order.supplierCurrency,
      metalBaseFixedAt: order.metalBaseFixedAt,
    },
    lines,
    total: lines.reduce((sum, line) => sum + line.lineTotal, 0n),
    events: eventRows,
    receipts: receiptRows.map((receipt) => ({
      ...receipt,
      lines: receiptLines
        .filter((line) => line.receiptId === receipt.id)
        .map((line) => ({
          orderLineId: line.orderLineId,
          movementId: line.movementId,
          quantity: parseQuantity(line.quantity),
          unitPrice: parseUnitCost(line.unitPrice),
        })),
    })),
  };
}

export type PurchaseOrderView = NonNullable<
  Awaited<ReturnType<typeof loadPurchaseOrder>>
>;

const money = (amount: bigint) => Number(amount) / 10_000;
const moneyOrNullNumber = (amount: bigint | null) =>
  amount === null ? null : money(amount);

/** The order as the API answers it: numbers in the item's unit and the order's currency. */
export function purchaseOrderJson(order: PurchaseOrderView) {
  return {
    id: order.id,
    number: order.number,
    status: order.status,
    currency: order.currency,
    notes: order.notes,
    orderDate: order.orderDate,
    orderedOn: order.orderedOn,
    sentAt: order.sentAt?.toISOString() ?? null,
    endReason: order.endReason,
    createdAt: order.createdAt.toISOString(),
    updatedAt: order.updatedAt.toISOString(),
    createdBy: order.createdBy,
    supplier: order.supplier,
    total: money(order.total),
    lines: order.lines.map((line) => ({
      id: line.id,
      lineNumber: line.lineNumber,
      sku: line.sku,
      name: line.name,
      unit: line.unit,
      supplierSku: line.supplierSku,
      quantity: quantityToNumber(line.quantity),
      received: quantityToNumber(line.received),
      open: quantityToNumber(line.open),
      unitPrice: money(line.unitPrice),
      lineTotal: money(line.lineTotal),
      priceSource: line.priceSource,
      overrideReason: line.overrideReason,
      metalBasePerKg: moneyOrNullNumber(line.metalBasePerKg),
      adderPerKg: moneyOrNullNumber(line.adderPerKg),
      metalBaseFixedAt: line.metalBaseFixedAt,
      requestedDate: line.requestedDate,
      leadTimeDays: line.leadTimeDays,
      expectedDate: line.expectedDate,
    })),
    events: order.events.map((event) => ({
      kind: event.kind,
      detail: event.detail,
      at: event.at.toISOString(),
      person: event.person,
    })),
    receipts: order.receipts.map((receipt) => ({
      id: receipt.id,
      receivedOn: receipt.receivedOn,
      person: receipt.person,
      createdAt: receipt.createdAt.toISOString(),
      lines: receipt.lines.map((line) => ({
        orderLineId: line.orderLineId,
        movementId: line.movementId,
        quantity: quantityToNumber(line.quantity),
        unitPrice: money(line.unitPrice),
      })),
    })),
  };
}

/**
 * A page of orders, newest first: on the status index (status, id) or the supplier index
 * (supplier_id, id) when filtered; the page's totals and earliest open expected date in
 * one grouped query over the page's ids.
 */
export async function listPurchaseOrders(query: PurchaseOrderListQuery) {
  const conditions: SQL[] = [];
  if (query.status) conditions.push(eq(purchaseOrders.status, query.status));
  if (query.supplierId)
    conditions.push(eq(purchaseOrders.supplierId, query.supplierId));
  if (query.search) {
    // An order number names one order; other text the orders of suppliers whose name holds it.
    const orderId = purchaseOrderIdFromNumber(query.search);
    const named = await db
      .select({ id: suppliers.id })
      .from(suppliers)
      .where(like(suppliers.name, containsPattern(query.search)));
    conditions.push(
      or(
        orderId !== null ? eq(purchaseOrders.id, orderId) : undefined,
        named.length > 0
          ? inArray(
              purchaseOrders.supplierId,
              named.map((supplier) => supplier.id),
            )
          : undefined,
        sql`FALSE`,
      )!,
    );
  }
  const where = conditions.length ? and(...conditions) : undefined;
  const [counted] = await db
    .select({ total: count() })
    .from(purchaseOrders)
    .where(where);
  const rows = await db
    .select({
      id: purchaseOrders.id,
      status: purchaseOrders.status,
      currency: purchaseOrders.currency,
      orderedOn: purchaseOrders.orderedOn,
      createdAt: purchaseOrders.createdAt,
      supplierId: suppliers.id,
      supplierName: suppliers.name,
    })
    .from(purchaseOrders)
    .innerJoin(suppliers, eq(suppliers.id, purchaseOrders.supplierId))
    .where(where)
    .orderBy(desc(purchaseOrders.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const sums =
    rows.length === 0
      ? []
      : await db
          .select({
            orderId: purchaseOrderLines.orderId,
            lines: count(),
            total: sql<string>`SUM(ROUND(${purchaseOrderLines.quantity} * ${purchaseOrderLines.unitPrice}, 2))`,
            nextExpected: sql<
              string | null
            >`MIN(CASE WHEN ${purchaseOrderLines.quantity} > ${purchaseOrderLines.received} THEN ${purchaseOrderLines.expectedDate} END)`.mapWith(
              purchaseOrderLines.expectedDate,
            ),
          })
          .from(purchaseOrderLines)
          .where(
            inArray(
              purchaseOrderLines.orderId,
              rows.map((row) => row.id),
            ),
          )
          .groupBy(purchaseOrderLines.orderId);
  const sumOf = new Map(sums.map((sum) => [sum.orderId, sum]));
  return {
    total: counted?.total ?? 0,
    page: query.page,
    pageSize: query.pageSize,
    orders: rows.map((row) => {
      const sum = sumOf.get(row.id);
      return {
        id: row.id,
        number: purchaseOrderNumber(row.id),
        status: row.status,
        statusLabel: purchaseOrderStatusLabels[row.status],
        supplier: { id: row.supplierId, name: row.supplierName },
        currency: row.currency,
        orderedOn: row.orderedOn,
        createdAt: row.createdAt.toISOString(),
        lineCount: sum?.lines ?? 0,
        total: sum ? Number(sum.total) : 0,
        /** The earliest expected date of a line still open; null when none is. */
        nextExpectedDate: sum?.nextExpected ?? null,
      };
    }),
  };
}
