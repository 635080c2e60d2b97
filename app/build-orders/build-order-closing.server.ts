/**
 * Cancelling, completing and re-sizing a build order. Each is one short transaction that
 * locks the order first and gives back whatever stock it still holds (see
 * `releaseHeldStock`). Stock already issued stays issued: a storekeeper returns what was
 * not used with a return movement.
 */
import { checkStockAlertsOfOrder } from "~/alerts/stock-alerts.server";
import { and, eq } from "drizzle-orm";
import { db } from "~/db/client.server";
import { buildOrderLines, buildOrders } from "~/db/schema";
import { formatQuantityText } from "~/lib/decimal-amounts";
import { BuildOrderError } from "./build-order-errors";
import {
  changeStatus,
  inBuildOrderTransaction,
  lockOrder,
} from "./build-order-locks.server";
import {
  releaseHeldStock,
  type HeldStock,
} from "./build-order-reservations.server";
import {
  buildOrderReference,
  canCancel,
  canChangePlannedStart,
  canChangeQuantity,
  canComplete,
  refusalFor,
  type BuildOrderStatus,
} from "./build-order-status";
import { requirementsForRevision } from "./build-orders.server";

export interface CloseResult {
  id: number;
  status: BuildOrderStatus;
  /** What the order held and gave back. */
  released: HeldStock[];
}

export function cancelBuildOrder(
  orderId: number,
  userId: string,
  note?: string,
): Promise<CloseResult> {
  return closeBuildOrder(orderId, userId, "cancel", note);
}

/** Completes a build in progress; what it still holds is released. Planned versus actual is read from the order afterwards. */
export function completeBuildOrder(
  orderId: number,
  userId: string,
  note?: string,
): Promise<CloseResult> {
  return closeBuildOrder(orderId, userId, "complete", note);
}

/** Cancels or completes: the order locked, its held stock released, its status changed, in one transaction. */
async function closeBuildOrder(
  orderId: number,
  userId: string,
  step: "cancel" | "complete",
  note?: string,
): Promise<CloseResult> {
  const allowed = step === "cancel" ? canCancel : canComplete;
  const result = await inBuildOrderTransaction(async (tx) => {
    const order = await lockOrder(tx, orderId);
    if (!allowed(order.status))
      throw new BuildOrderError(409, refusalFor(step, order.status));
    const released = await releaseHeldStock(tx, order);
    await changeStatus(
      tx,
      order,
      step === "cancel" ? "cancelled" : "complete",
      userId,
      note,
    );
    return { id: order.id, status: order.status, released };
  });
  await checkStockAlertsOfOrder(orderId);
  return result;
}

/**
 * Changes the number of motors of an order nothing has been issued to: releases what it
 * holds, works out the lines again for the new number and goes back to draft.
 */
export async function changeBuildOrderQuantity(
  orderId: number,
  quantity: number,
  userId: string,
): Promise<CloseResult> {
  // A released revision never changes: its requirements are worked out before the transaction.
  const [found] = await db
    .select({ revisionId: buildOrders.revisionId })
    .from(buildOrders)
    .where(eq(buildOrders.id, orderId));
  if (!found)
    throw new BuildOrderError(
      404,
      `No build order ${buildOrderReference(orderId)}.`,
    );
  const requirements = await requirementsForRevision(
    found.revisionId,
    quantity,
  );
  const result = await inBuildOrderTransaction(async (tx) => {
    const order = await lockOrder(tx, orderId);
    if (!canChangeQuantity(order.status))
      throw new BuildOrderError(409, refusalFor("quantity", order.status));
    if (quantity === order.quantity)
      return { id: order.id, status: order.status, released: [] };
    const released = await releaseHeldStock(tx, order);
    for (const requirement of requirements) {
      await tx
        .update(buildOrderLines)
        .set({ required: formatQuantityText(requirement.required) })
        .where(
          and(
            eq(buildOrderLines.orderId, order.id),
            eq(buildOrderLines.itemId, requirement.itemId),
          ),
        );
    }
    const before = order.quantity;
    await tx
      .update(buildOrders)
      .set({ quantity })
      .where(eq(buildOrders.id, order.id));
    await changeStatus(
      tx,
      order,
      "draft",
      userId,
      `Motors ${before} → ${quantity}${released.length > 0 ? "; held stock released" : ""}.`,
    );
    return { id: order.id, status: order.status, released };
  });
  await checkStockAlertsOfOrder(orderId);
  return result;
}

/**
 * Sets (or clears, with null) the day building starts, while the order is open; the
 * change is kept in the order's history. Nothing held or issued changes.
 */
export async function changeBuildOrderPlannedStart(
  orderId: number,
  plannedStart: string | null,
  userId: string,
): Promise<{
  id: number;
  status: BuildOrderStatus;
  plannedStart: string | null;
}> {
  return inBuildOrderTransaction(async (tx) => {
    const order = await lockOrder(tx, orderId);
    if (!canChangePlannedStart(order.status))
      throw new BuildOrderError(
        409,
        refusalFor("plannedStart", order.status),
        "plannedStart",
      );
    const [current] = await tx
      .select({ plannedStart: buildOrders.plannedStart })
      .from(buildOrders)
      .where(eq(buildOrders.id, order.id));
    const before = current?.plannedStart ?? null;
    if (before === plannedStart)
      return { id: order.id, status: order.status, plannedStart };
    await tx
      .update(buildOrders)
      .set({ plannedStart })
      .where(eq(buildOrders.id, order.id));
    await changeStatus(
      tx,
      order,
      order.status,
      userId,
      `Planned start ${before ?? "not set"} → ${plannedStart ?? "not set"}.`,
    );
    return { id: order.id, status: order.status, plannedStart };
  });
}
