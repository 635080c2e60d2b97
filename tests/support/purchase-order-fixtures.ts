/**
 * Purchase orders for the receiving tests, written straight into the test database as the
 * ordering code would leave them: a supplier, an order in a status, its lines, and for a
 * sent order the items' stock on order raised by what is still open on each line.
 */
import { randomBytes } from "node:crypto";
import { eq, sql } from "drizzle-orm";
import {
  currencyRates,
  items,
  purchaseOrderLines,
  purchaseOrders,
  suppliers,
} from "~/db/schema";
import type { PurchaseOrderStatus } from "~/db/tables/purchase-order-enums";
import { todayUtc } from "~/lib/calendar-days";
import { testDb, uniqueCode } from "./test-database";

export async function createOrderSupplier(
  currency: string,
  tolerances: { wire?: string; piece?: string } = {},
): Promise<number> {
  const [row] = await testDb()
    .insert(suppliers)
    .values({
      name: uniqueCode("Wire works"),
      currency,
      wireTolerancePercent: tolerances.wire ?? "10",
      pieceTolerancePercent: tolerances.piece ?? "0",
    })
    .$returningId();
  return row!.id;
}

/** An invented three-letter currency no other test keeps rates for. */
export function uniqueCurrency(): string {
  const letters = [...randomBytes(3)].map((byte) =>
    String.fromCharCode(65 + (byte % 26)),
  );
  return `Q${letters.slice(1).join("")}`;
}

/** Dated rates: company currency per one unit of `currency`. */
export async function addRates(
  currency: string,
  rates: { validFrom: string; rate: string }[],
): Promise<void> {
  await testDb()
    .insert(currencyRates)
    .values(rates.map((rate) => ({ currency, ...rate })));
}

export interface OrderLineFixture {
  itemId: number;
  /** In the item's unit, as text ("20.000"). */
  quantity: string;
  /** Default "1.0000". */
  unitPrice?: string;
  adderPerKg?: string;
  metalBasePerKg?: string;
  metalBaseFixedAt?: "order" | "delivery";
  /** Default: today. */
  expectedDate?: string;
  /** Already received, in the item's unit; default "0". */
  received?: string;
  completedAt?: Date | null;
}

/**
 * An order with its lines; returns the order id and line ids in the order given. When its
 * status is sent or partly received, each item's on_order rises by what is still open on
 * its line (as sending and receiving keep it).
 */
export async function createOrder(input: {
  supplierId: number;
  /** Default "EUR". */
  currency?: string;
  userId: string;
  /** Default "sent". */
  status?: PurchaseOrderStatus;
  /** Default: today once sent, none while draft. */
  orderedOn?: string;
  updatedAt?: Date;
  lines: OrderLineFixture[];
}): Promise<{ id: number; lineIds: number[] }> {
  const db = testDb();
  const status = input.status ?? "sent";
  const today = todayUtc();
  const sent = status !== "draft";
  const [order] = await db
    .insert(purchaseOrders)
    .values({
      supplierId: input.supplierId,
      status,
      currency: input.currency ?? "EUR",
      orderedOn: sent ? (input.orderedOn ?? today) : null,
      sentAt: sent ? new Date() : null,
      userId: input.userId,
      updatedAt: input.updatedAt ?? new Date(),
    })
    .$returningId();
  const lineIds: number[] = [];
  const open = status === "sent" || status === "partly_received";
  for (const [index, line] of input.lines.entries()) {
    const received = line.received ?? "0";
    const [row] = await db
      .insert(purchaseOrderLines)
      .values({
        orderId: order!.id,
        lineNumber: index + 1,
        itemId: line.itemId,
        quantity: line.quantity,
        unitPrice: line.unitPrice ?? "1.0000",
        priceSource: "price_list",
        adderPerKg: line.adderPerKg ?? null,
        metalBasePerKg: line.metalBasePerKg ?? null,
        metalBaseFixedAt: line.metalBaseFixedAt ?? null,
        expectedDate: line.expectedDate ?? today,
        received,
        completedAt: line.completedAt ?? null,
      })
      .$returningId();
    lineIds.push(row!.id);
    if (open)
      await db
        .update(items)
        .set({
          onOrder: sql`${items.onOrder} + GREATEST(0, ${line.quantity} - ${received})`,
        })
        .where(eq(items.id, line.itemId));
  }
  return { id: order!.id, lineIds };
}
