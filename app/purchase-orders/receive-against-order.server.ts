/**
 * Receiving a delivery against a purchase order (storekeepers): one transaction locks the
 * order row, then its lines; checks every line against its delivery tolerance (all the
 * spools of a line in the receipt together); books each spool or lot as a receipt through
 * the ledger's one writer (`recordMovementIn`, which locks the item, then its balances),
 * items in id order, with the order's number as reference and the unit cost from the order
 * line (`receipt-unit-cost.ts`); writes the receipt and its lines, raises what each line
 * received, lowers the items' stock on order by what was still open, moves the order to
 * partly received or received and notes it in the order's history. Receipts of one order
 * queue on the order row, so two storekeepers never take a line past its tolerance.
 * The low-stock after-commit work runs once the transaction has committed.
 */
import { and, asc, eq, inArray, lte, sql } from "drizzle-orm";
import type { Database, Transaction } from "~/db/client.server";
import {
  currencyRates,
  items,
  lots,
  metalBasePrices,
  purchaseOrderEvents,
  purchaseOrderLines,
  purchaseOrders,
  purchaseReceiptLines,
  purchaseReceipts,
  settings,
  suppliers,
  wireItems,
} from "~/db/schema";
import type { PurchaseOrderStatus } from "~/db/tables/purchase-order-enums";
import { writeTransaction } from "~/db/write-transaction.server";
import type { ConductorKey } from "~/engineering/reference-data";
import { dayOf } from "~/lib/calendar-days";
import {
  formatQuantityText,
  formatUnitCostText,
  parseQuantity,
  quantityToNumber,
} from "~/lib/decimal-amounts";
import { DomainError, isDomainError } from "~/lib/domain-error";
import { formatRateText, parseMoney, parseRate } from "~/pricing/money";
import { defaultCompanyCurrency } from "~/purchasing/suppliers.server";
import {
  movementsCommitted,
  recordMovementIn,
} from "~/stock/stock-movements.server";
import { toleranceFor, toleranceRefusal } from "./delivery-tolerance";
import {
  canReceive,
  purchaseOrderNumber,
  purchaseOrderStatusLabels,
} from "./purchase-order-status";
import type { ReceiptEntry, ReceiptRequest } from "./receipt-request";
import { receiptUnitCost } from "./receipt-unit-cost";

export interface ReceiptResult {
  receipt: {
    id: number;
    receivedOn: string;
    lines: {
      lineId: number;
      movementId: number;
      sku: string;
      lot: string | null;
      location: string;
      quantity: number;
      unit: string;
      unitCost: number;
    }[];
  };
  order: {
    id: number;
    number: string;
    status: PurchaseOrderStatus;
    lines: {
      id: number;
      sku: string;
      unit: string;
      quantity: number;
      received: number;
      open: number;
    }[];
  };
}

type OrderLine = Awaited<ReturnType<typeof lockLines>>[number];

async function lockOrder(tx: Transaction, orderId: number) {
  const [order] = await tx
    .select({
      id: purchaseOrders.id,
      status: purchaseOrders.status,
      currency: purchaseOrders.currency,
      supplierId: purchaseOrders.supplierId,
    })
    .from(purchaseOrders)
    .where(eq(purchaseOrders.id, orderId))
    .for("update")
    .limit(1);
  if (!order)
    throw new DomainError(
      404,
      `No purchase order ${purchaseOrderNumber(orderId)}.`,
    );
  if (!canReceive(order.status)) {
    const label = purchaseOrderStatusLabels[order.status].toLowerCase();
    throw new DomainError(
      422,
      order.status === "draft"
        ? `${purchaseOrderNumber(order.id)} is a draft: it is sent before deliveries are received against it.`
        : `${purchaseOrderNumber(order.id)} is ${label}: nothing more is received against it.`,
    );
  }
  return order;
}

/** The order's lines, locked in id order, with their items (read, not locked: the ledger locks them). */
async function lockLines(tx: Transaction, orderId: number) {
  const locked = await tx
    .select({
      id: purchaseOrderLines.id,
      lineNumber: purchaseOrderLines.lineNumber,
      itemId: purchaseOrderLines.itemId,
      quantity: purchaseOrderLines.quantity,
      received: purchaseOrderLines.received,
      unitPrice: purchaseOrderLines.unitPrice,
      adderPerKg: purchaseOrderLines.adderPerKg,
      metalBaseFixedAt: purchaseOrderLines.metalBaseFixedAt,
      completedAt: purchaseOrderLines.completedAt,
    })
    .from(purchaseOrderLines)
    .where(eq(purchaseOrderLines.orderId, orderId))
    .orderBy(asc(purchaseOrderLines.id))
    .for("update");
  const itemIds = [...new Set(locked.map((line) => line.itemId))];
  const itemRows = itemIds.length
    ? await tx
        .select({
          id: items.id,
          sku: items.sku,
          unit: items.unit,
          kind: items.kind,
          conductor: wireItems.conductor,
        })
        .from(items)
        .leftJoin(wireItems, eq(wireItems.itemId, items.id))
        .where(inArray(items.id, itemIds))
    : [];
  const byId = new Map(itemRows.map((item) => [item.id, item]));
  return locked.map((line) => {
    const item = byId.get(line.itemId)!;
    return {
      ...line,
      sku: item.sku,
      unit: item.unit,
      kind: item.kind,
      conductor: (item.conductor as ConductorKey | null) ?? null,
      ordered: parseQuantity(line.quantity),
      receivedSoFar: parseQuantity(line.received),
    };
  });
}

/** A spool's quantity before anything is written: gross − tare (the lot's tare when it has one), else the quantity. */
async function entryQuantity(
  tx: Transaction,
  entry: ReceiptEntry,
  line: OrderLine,
  index: number,
): Promise<bigint> {
  const field = (name: string) => `lines.${index}.${name}`;
  if (entry.grossKg === undefined) return entry.quantity!;
  if (line.kind !== "wire")
    throw new DomainError(
      400,
      `${line.sku} is not wire: give the quantity, not weights.`,
      field("grossKg"),
    );
  let tare = entry.tareKg ?? null;
  if (tare === null && entry.lot) {
    const [lot] = await tx
      .select({ tareKg: lots.tareKg })
      .from(lots)
      .where(and(eq(lots.itemId, line.itemId), eq(lots.lotNumber, entry.lot)))
      .limit(1);
    tare = lot?.tareKg == null ? null : parseQuantity(lot.tareKg);
  }
  if (tare === null)
    throw new DomainError(
      400,
      "Give the spool's tare (empty spool) weight.",
      field("tareKg"),
    );
  const net = entry.grossKg - tare;
  if (net <= 0n)
    throw new DomainError(
      400,
      "The gross weight must be more than the tare weight.",
      field("grossKg"),
    );
  if (entry.quantity !== undefined && entry.quantity !== net)
    throw new DomainError(
      400,
      `Gross − tare is ${quantityToNumber(net)} kg, not ${quantityToNumber(entry.quantity)} kg.`,
      field("quantity"),
    );
  return net;
}

/**
 * The bases and rates that price the order on the day, read through the transaction: a
 * second connection taken while the order row is locked could wait for a pool that the
 * receipts queued behind this one hold.
 */
export async function readReceiptPricing(
  tx: Transaction | Database,
  orderCurrency: string,
  day: string,
) {
  const [setting] = await tx
    .select({ value: settings.value })
    .from(settings)
    .where(eq(settings.key, "company_currency"))
    .limit(1);
  const company = setting?.value ?? defaultCompanyCurrency;
  const [baseRows, rateRows] = await Promise.all([
    tx
      .select({
        conductor: metalBasePrices.conductor,
        currency: metalBasePrices.currency,
        pricePerKg: metalBasePrices.pricePerKg,
        validFrom: metalBasePrices.validFrom,
      })
      .from(metalBasePrices)
      .where(
        and(
          inArray(metalBasePrices.currency, [orderCurrency, company]),
          lte(metalBasePrices.validFrom, day),
        ),
      ),
    tx
      .select({
        currency: currencyRates.currency,
        rate: currencyRates.rate,
        validFrom: currencyRates.validFrom,
      })
      .from(currencyRates)
      .where(
        and(
          eq(currencyRates.currency, orderCurrency),
          lte(currencyRates.validFrom, day),
        ),
      ),
  ]);
  return {
    orderCurrency,
    companyCurrency: company,
    receivedOn: day,
    bases: baseRows.map((base) => ({
      conductor: base.conductor as ConductorKey,
      currency: base.currency,
      pricePerKg: parseMoney(base.pricePerKg),
      validFrom: base.validFrom,
    })),
    rates: rateRows.map((rate) => ({
      currency: rate.currency,
      date: rate.validFrom,
      rate: parseRate(rate.rate),
    })),
  };
}

function lineLabel(line: OrderLine) {
  return `Line ${line.lineNumber} (${line.sku})`;
}

/** Books a delivery against an order; throws DomainError (400/404/409/422) and writes nothing when it refuses. */
export async function receiveAgainstOrder(
  orderId: number,
  request: ReceiptRequest,
  userId: string,
): Promise<ReceiptResult> {
  const result = await writeTransaction(
    (tx) => receiveIn(tx, orderId, request, userId),
    { label: "purchase receipt" },
  );
  await movementsCommitted([
    ...new Set(result.receipt.lines.map((line) => line.sku)),
  ]);
  return result;
}

async function receiveIn(
  tx: Transaction,
  orderId: number,
  request: ReceiptRequest,
  userId: string,
): Promise<ReceiptResult> {
  const now = new Date();
  const receivedOn = dayOf(now);
  const order = await lockOrder(tx, orderId);
  const number = purchaseOrderNumber(order.id);
  const lines = await lockLines(tx, order.id);
  const linesById = new Map(lines.map((line) => [line.id, line]));

  const entries: {
    entry: ReceiptEntry;
    line: OrderLine;
    quantity: bigint;
    index: number;
  }[] = [];
  for (const [index, entry] of request.lines.entries()) {
    const line = linesById.get(entry.lineId);
    if (!line)
      throw new DomainError(
        422,
        `${number} has no line ${entry.lineId}.`,
        `lines.${index}.lineId`,
      );
    entries.push({
      entry,
      line,
      index,
      quantity: await entryQuantity(tx, entry, line, index),
    });
  }

  const [supplier] = await tx
    .select({
      wireTolerancePercent: suppliers.wireTolerancePercent,
      pieceTolerancePercent: suppliers.pieceTolerancePercent,
    })
    .from(suppliers)
    .where(eq(suppliers.id, order.supplierId))
    .limit(1);
  const receivingNow = new Map<number, bigint>();
  for (const { line, quantity } of entries)
    receivingNow.set(line.id, (receivingNow.get(line.id) ?? 0n) + quantity);
  for (const [lineId, quantity] of receivingNow) {
    const line = linesById.get(lineId)!;
    const refusal = toleranceRefusal({
      label: lineLabel(line),
      unit: line.unit,
      ordered: line.ordered,
      receivedSoFar: line.receivedSoFar,
      receivingNow: quantity,
      toleranceHundredths: toleranceFor(line.unit, supplier!),
    });
    const first = entries.find((entry) => entry.line.id === lineId)!;
    if (refusal)
      throw new DomainError(409, refusal, `lines.${first.index}.quantity`);
  }

  const pricing = await readReceiptPricing(tx, order.currency, receivedOn);
  const costs = new Map<
    number,
    { unitPrice: bigint; unitCost: bigint; rate: bigint | null }
  >();
  for (const lineId of receivingNow.keys()) {
    const line = linesById.get(lineId)!;
    const cost = receiptUnitCost(
      {
        unitPrice: parseMoney(line.unitPrice),
        adderPerKg:
          line.adderPerKg === null ? null : parseMoney(line.adderPerKg),
        metalBaseFixedAt: line.metalBaseFixedAt,
        conductor: line.conductor,
      },
      pricing,
    );
    if (!cost.ok)
      throw new DomainError(409, `${lineLabel(line)}: ${cost.message}`);
    costs.set(lineId, cost);
  }

  const [receipt] = await tx
    .insert(purchaseReceipts)
    .values({ orderId: order.id, receivedOn, userId, createdAt: now })
    .$returningId();
  const booked: ReceiptResult["receipt"]["lines"] = [];
  // Items in id order (the lock order of every purchase-order transaction), spools as given within an item.
  const inItemOrder = [...entries].sort(
    (a, b) => a.line.itemId - b.line.itemId || a.index - b.index,
  );
  for (const { entry, line, quantity, index } of inItemOrder) {
    const cost = costs.get(line.id)!;
    const recorded = await recordMovementIn(
      tx,
      {
        type: "receipt",
        sku: line.sku,
        lot: entry.lot,
        location: entry.location,
        quantity,
        grossKg: entry.grossKg,
        tareKg: entry.tareKg,
        unitCost: cost.unitCost,
        reference: number,
        toLocation: undefined,
        spoolType: undefined,
        supplierBatch: entry.supplierBatch,
        supplierId: undefined,
        note: undefined,
      },
      userId,
      {
        at: now,
        origin: { supplierId: order.supplierId, purchaseOrderId: order.id },
      },
    ).catch((error: unknown) => {
      if (isDomainError(error) && error.field)
        throw new DomainError(
          error.status,
          error.message,
          `lines.${index}.${error.field}`,
        );
      throw error;
    });
    await tx.insert(purchaseReceiptLines).values({
      receiptId: receipt!.id,
      orderLineId: line.id,
      movementId: recorded.movement.id,
      quantity: formatQuantityText(quantity),
      unitPrice: formatUnitCostText(cost.unitPrice),
      unitCost: formatUnitCostText(cost.unitCost),
      rate: cost.rate === null ? null : formatRateText(cost.rate),
    });
    booked[index] = {
      lineId: line.id,
      movementId: recorded.movement.id,
      sku: line.sku,
      lot: recorded.movement.lot,
      location: recorded.movement.location,
      quantity: quantityToNumber(quantity),
      unit: line.unit,
      unitCost: Number(formatUnitCostText(cost.unitCost)),
    };
  }

  const onOrderDrop = new Map<number, bigint>();
  for (const [lineId, quantity] of receivingNow) {
    const line = linesById.get(lineId)!;
    const stillOpen =
      line.ordered > line.receivedSoFar
        ? line.ordered - line.receivedSoFar
        : 0n;
    const drop = quantity < stillOpen ? quantity : stillOpen;
    onOrderDrop.set(line.itemId, (onOrderDrop.get(line.itemId) ?? 0n) + drop);
    line.receivedSoFar += quantity;
    await tx
      .update(purchaseOrderLines)
      .set({
        received: formatQuantityText(line.receivedSoFar),
        ...(line.completedAt === null && line.receivedSoFar >= line.ordered
          ? { completedAt: now }
          : {}),
      })
      .where(eq(purchaseOrderLines.id, line.id));
  }
  for (const [itemId, drop] of [...onOrderDrop].sort((a, b) => a[0] - b[0])) {
    if (drop === 0n) continue;
    await tx
      .update(items)
      .set({
        onOrder: sql`GREATEST(${items.onOrder} - ${formatQuantityText(drop)}, 0)`,
      })
      .where(eq(items.id, itemId));
  }
  const status: PurchaseOrderStatus = lines.every(
    (line) => line.receivedSoFar >= line.ordered,
  )
    ? "received"
    : "partly_received";
  await tx
    .update(purchaseOrders)
    .set({ status, updatedAt: now })
    .where(eq(purchaseOrders.id, order.id));
  await tx.insert(purchaseOrderEvents).values({
    orderId: order.id,
    kind: "received",
    detail: receiptDetail(entries, status),
    userId,
    createdAt: now,
  });

  return {
    receipt: { id: receipt!.id, receivedOn, lines: booked },
    order: {
      id: order.id,
      number,
      status,
      lines: lines.map((line) => ({
        id: line.id,
        sku: line.sku,
        unit: line.unit,
        quantity: quantityToNumber(line.ordered),
        received: quantityToNumber(line.receivedSoFar),
        open: quantityToNumber(
          line.ordered > line.receivedSoFar
            ? line.ordered - line.receivedSoFar
            : 0n,
        ),
      })),
    },
  };
}

/** The history's words: "Received line 1 (CU-050): 2 spools/lots, 9.6 kg (lots A, B). Order now partly received." */
function receiptDetail(
  entries: { entry: ReceiptEntry; line: OrderLine; quantity: bigint }[],
  status: PurchaseOrderStatus,
): string {
  const byLine = new Map<number, typeof entries>();
  for (const entry of entries)
    byLine.set(entry.line.id, [...(byLine.get(entry.line.id) ?? []), entry]);
  const parts = [...byLine.values()].map((group) => {
    const line = group[0]!.line;
    const total = group.reduce((sum, entry) => sum + entry.quantity, 0n);
    const lotNames = group.map((entry) => entry.entry.lot).filter(Boolean);
    return `${lineLabel(line).toLowerCase()}: ${quantityToNumber(total)} ${line.unit} in ${group.length} ${group.length === 1 ? "spool or lot" : "spools or lots"}${lotNames.length ? ` (lot ${lotNames.join(", ")})` : ""}`;
  });
  const text = `Received ${parts.join("; ")}. Order now ${purchaseOrderStatusLabels[status].toLowerCase()}.`;
  return text.length > 1000 ? `${text.slice(0, 997)}…` : text;
}
