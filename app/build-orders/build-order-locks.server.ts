/**
 * The locks every build-order transaction takes, always in this order so that no two
 * of them (nor a movement from the stock ledger) can wait on each other in a circle:
 *
 * 1. the build order row (`SELECT … FOR UPDATE`) — one order per transaction;
 * 2. its lines and reservation rows (only ever touched under the order's lock);
 * 3. the item rows, in id order (the ledger's `recordMovement` locks one item first too);
 * 4. the balance rows of those items (only ever locked while holding the item's lock).
 *
 * Build-order transactions run at READ COMMITTED: locking reads then lock the rows they
 * find and no gaps between them, so two orders inserting reservation rows side by side
 * never block each other. Every figure a decision rests on is read with a lock.
 *
 * The transaction runs through `writeTransaction`: on a deadlock or a Galera conflict the
 * whole of `work` runs again, so `work` reads (and locks) everything it decides on itself.
 */
import { and, asc, eq, gt, inArray } from "drizzle-orm";
import { writeTransaction } from "~/db/write-transaction.server";
import {
  buildOrderEvents,
  buildOrders,
  items,
  lots,
  stockBalances,
} from "~/db/schema";
import { parseQuantity } from "~/lib/decimal-amounts";
import type { LedgerTransaction } from "~/stock/stock-movements.server";
import { BuildOrderError } from "./build-order-errors";
import {
  buildOrderReference,
  type BuildOrderStatus,
} from "./build-order-status";

export type Transaction = LedgerTransaction;

/** Runs one short build-order transaction (see the module comment for its locks). */
export function inBuildOrderTransaction<T>(
  work: (tx: Transaction) => Promise<T>,
): Promise<T> {
  return writeTransaction(work, {
    isolationLevel: "read committed",
    label: "build order",
  });
}

export interface LockedOrder {
  id: number;
  status: BuildOrderStatus;
  quantity: number;
  revisionId: number;
}

/** Locks the order row; 404 when there is none. */
export async function lockOrder(
  tx: Transaction,
  orderId: number,
): Promise<LockedOrder> {
  const [order] = await tx
    .select({
      id: buildOrders.id,
      status: buildOrders.status,
      quantity: buildOrders.quantity,
      revisionId: buildOrders.revisionId,
    })
    .from(buildOrders)
    .where(eq(buildOrders.id, orderId))
    .for("update");
  if (!order)
    throw new BuildOrderError(
      404,
      `No build order ${buildOrderReference(orderId)}.`,
    );
  return order;
}

/** Moves the (locked) order to a new status and records the change. */
export async function changeStatus(
  tx: Transaction,
  order: LockedOrder,
  toStatus: BuildOrderStatus,
  userId: string,
  note = "",
): Promise<void> {
  const now = new Date();
  await tx
    .update(buildOrders)
    .set({ status: toStatus, updatedAt: now })
    .where(eq(buildOrders.id, order.id));
  await tx.insert(buildOrderEvents).values({
    orderId: order.id,
    fromStatus: order.status,
    toStatus,
    note: note.slice(0, 500),
    userId,
    createdAt: now,
  });
  order.status = toStatus;
}

export interface LockedItem {
  id: number;
  sku: string;
  unit: string;
  onHand: bigint;
  reserved: bigint;
  /** The free part of its lots on hold (decision 039): not available to reserve. */
  held: bigint;
}

/** Locks item rows one by one in id order. */
export async function lockItems(
  tx: Transaction,
  itemIds: readonly number[],
): Promise<Map<number, LockedItem>> {
  const locked = new Map<number, LockedItem>();
  for (const id of [...new Set(itemIds)].sort((a, b) => a - b)) {
    const [row] = await tx
      .select({
        id: items.id,
        sku: items.sku,
        unit: items.unit,
        onHand: items.onHand,
        reserved: items.reserved,
        held: items.held,
      })
      .from(items)
      .where(eq(items.id, id))
      .for("update");
    if (row)
      locked.set(id, {
        ...row,
        onHand: parseQuantity(row.onHand),
        reserved: parseQuantity(row.reserved),
        held: parseQuantity(row.held),
      });
  }
  return locked;
}

export interface LockedBalance {
  itemId: number;
  lotId: number;
  locationId: number;
  onHand: bigint;
  reserved: bigint;
  /** The lot's receipt date; null for stock not kept in lots. */
  receivedOn: string | null;
}

/** Locks an item's balance rows with stock on them (call with the item's row locked). */
export async function lockBalances(
  tx: Transaction,
  itemId: number,
): Promise<LockedBalance[]> {
  const rows = await tx
    .select({
      itemId: stockBalances.itemId,
      lotId: stockBalances.lotId,
      locationId: stockBalances.locationId,
      onHand: stockBalances.onHand,
      reserved: stockBalances.reserved,
    })
    .from(stockBalances)
    .where(and(eq(stockBalances.itemId, itemId), gt(stockBalances.onHand, "0")))
    .orderBy(asc(stockBalances.locationId), asc(stockBalances.lotId))
    .for("update");
  const lotIds = [...new Set(rows.map((row) => row.lotId))].filter(
    (id) => id !== 0,
  );
  const receivedOn = new Map(
    (lotIds.length === 0
      ? []
      : await tx
          .select({ id: lots.id, receivedOn: lots.receivedOn })
          .from(lots)
          .where(inArray(lots.id, lotIds))
    ).map((lot) => [lot.id, lot.receivedOn]),
  );
  return rows.map((row) => ({
    ...row,
    onHand: parseQuantity(row.onHand),
    reserved: parseQuantity(row.reserved),
    receivedOn: receivedOn.get(row.lotId) ?? null,
  }));
}

/** The key of a balance row, for maps. */
export function balanceKey(balance: {
  itemId: number;
  lotId: number;
  locationId: number;
}): string {
  return `${balance.itemId}:${balance.lotId}:${balance.locationId}`;
}
