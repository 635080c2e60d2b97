/**
 * What a build order line holds (its reservations), as the stock ledger's writer takes
 * it on an issue (`HeldStock`): the ledger locks and writes the stock rows, this module
 * the order's own rows (the order, its line, its reservations and issues), inside the
 * movement's transaction. The ledger knows the order only as a source document.
 */
import { and, eq } from "drizzle-orm";
import type { Transaction } from "~/db/client.server";
import {
  buildOrderIssues,
  buildOrderLines,
  buildOrderReservations,
  buildOrders,
} from "~/db/schema";
import {
  formatQuantityText,
  formatUnitCostText,
  parseQuantity,
} from "~/lib/decimal-amounts";
import { DomainError } from "~/lib/domain-error";
import { amountText, type HeldStock } from "~/stock/stock-movements.server";
import { buildOrderReference } from "./build-order-status";

/** The stock line `lineId` of build order `orderId` holds, for an issue through the ledger. */
export function heldByBuildOrderLine(reservation: {
  orderId: number;
  lineId: number;
}): HeldStock {
  const { orderId, lineId } = reservation;
  const reference = buildOrderReference(orderId);
  let locked:
    | {
        where: ReturnType<typeof and>;
        held: bigint;
        lineReserved: bigint;
        lineIssued: bigint;
      }
    | undefined;
  return {
    source: { kind: "build order", id: orderId, reference },

    // Locks the build order (first, before the item: the lock order of every build-order
    // transaction) and checks it exists. Re-locking an order the caller already holds is free.
    async lockDocument(tx: Transaction) {
      const [order] = await tx
        .select({ id: buildOrders.id })
        .from(buildOrders)
        .where(eq(buildOrders.id, orderId))
        .for("update");
      if (!order)
        throw new DomainError(404, `No build order ${reference}.`, "orderId");
    },

    // What the order line holds on the balance the issue takes from, locked; refuses an
    // issue of another item or of more than is held.
    async lockHeld(tx, { item, lot, location, taken }) {
      const [line] = await tx
        .select({
          orderId: buildOrderLines.orderId,
          itemId: buildOrderLines.itemId,
          reserved: buildOrderLines.reserved,
          issued: buildOrderLines.issued,
        })
        .from(buildOrderLines)
        .where(eq(buildOrderLines.id, lineId))
        .for("update");
      if (!line || line.orderId !== orderId || line.itemId !== item.id)
        throw new DomainError(
          400,
          `${reference} has no line for ${item.sku}.`,
          "sku",
        );
      const where = and(
        eq(buildOrderReservations.lineId, lineId),
        eq(buildOrderReservations.itemId, item.id),
        eq(buildOrderReservations.lotId, lot.id),
        eq(buildOrderReservations.locationId, location.id),
      );
      const [held] = await tx
        .select({ quantity: buildOrderReservations.quantity })
        .from(buildOrderReservations)
        .where(where)
        .for("update");
      const heldQuantity = held ? parseQuantity(held.quantity) : 0n;
      const place = `${lot.number ? `lot ${lot.number} ` : ""}at ${location.code}`;
      if (taken > heldQuantity) {
        throw new DomainError(
          409,
          heldQuantity === 0n
            ? `${reference} holds no ${item.sku} ${place}.`
            : `${reference} holds only ${amountText(heldQuantity, item.unit)} of ${item.sku} ${place}; cannot issue ${amountText(taken, item.unit)}.`,
          "quantity",
        );
      }
      locked = {
        where,
        held: heldQuantity,
        lineReserved: parseQuantity(line.reserved),
        lineIssued: parseQuantity(line.issued),
      };
    },

    // Lowers the reservation and the line's reserved quantity, raises its issued quantity
    // and notes the issue at the moving average cost after the movement.
    async recordTaken(tx, { movementId, quantity, unitCost }) {
      if (!locked) throw new Error("recordTaken before lockHeld");
      if (locked.held === quantity) {
        await tx.delete(buildOrderReservations).where(locked.where);
      } else {
        await tx
          .update(buildOrderReservations)
          .set({ quantity: formatQuantityText(locked.held - quantity) })
          .where(locked.where);
      }
      await tx
        .update(buildOrderLines)
        .set({
          reserved: formatQuantityText(locked.lineReserved - quantity),
          issued: formatQuantityText(locked.lineIssued + quantity),
        })
        .where(eq(buildOrderLines.id, lineId));
      await tx.insert(buildOrderIssues).values({
        movementId,
        lineId,
        quantity: formatQuantityText(quantity),
        unitCost: formatUnitCostText(unitCost),
      });
    },
  };
}
