/**
 * Issuing reserved stock to a build order (storekeepers): through the stock ledger's one
 * writer, `recordMovementIn`, inside a transaction that has locked the order first. The
 * movement takes what the order line holds on that lot and location (by quantity, or by
 * weighing the spool back), and the first issue moves the order to "in progress".
 */
import { checkStockAlertsOfOrder } from "~/alerts/stock-alerts.server";
import { and, eq } from "drizzle-orm";
import { buildOrderLines, items } from "~/db/schema";
import { quantityToNumber, parseQuantity } from "~/stock/decimal-amounts";
import {
  recordMovementIn,
  type RecordedMovement,
} from "~/stock/stock-movements.server";
import { BuildOrderError } from "./build-order-errors";
import type { IssueRequest } from "./build-order-forms";
import {
  changeStatus,
  inBuildOrderTransaction,
  lockOrder,
} from "./build-order-locks.server";
import {
  buildOrderReference,
  canIssue,
  refusalFor,
  type BuildOrderStatus,
} from "./build-order-status";

export interface IssueResult extends RecordedMovement {
  id: number;
  status: BuildOrderStatus;
  line: {
    sku: string;
    required: number;
    reserved: number;
    issued: number;
    unit: string;
  };
}

export async function issueToBuildOrder(
  orderId: number,
  request: IssueRequest,
  userId: string,
): Promise<IssueResult> {
  const result = await inBuildOrderTransaction(async (tx) => {
    const order = await lockOrder(tx, orderId);
    if (!canIssue(order.status))
      throw new BuildOrderError(409, refusalFor("issue", order.status));
    const [line] = await tx
      .select({ id: buildOrderLines.id })
      .from(buildOrderLines)
      .innerJoin(items, eq(items.id, buildOrderLines.itemId))
      .where(
        and(eq(buildOrderLines.orderId, order.id), eq(items.sku, request.sku)),
      )
      .limit(1);
    if (!line)
      throw new BuildOrderError(
        400,
        `${buildOrderReference(order.id)} needs no ${request.sku}.`,
        "sku",
      );
    const recorded = await recordMovementIn(
      tx,
      {
        type: "issue",
        sku: request.sku,
        lot: request.lot,
        location: request.location,
        quantity: request.quantity,
        grossKg: request.grossKg,
        reference: buildOrderReference(order.id),
        note: request.note,
        toLocation: undefined,
        spoolType: undefined,
        supplierBatch: undefined,
      },
      userId,
      { reservation: { orderId: order.id, lineId: line.id } },
    );
    if (order.status === "reserved")
      await changeStatus(tx, order, "in_progress", userId, "First issue.");
    const [after] = await tx
      .select({
        required: buildOrderLines.required,
        reserved: buildOrderLines.reserved,
        issued: buildOrderLines.issued,
      })
      .from(buildOrderLines)
      .where(eq(buildOrderLines.id, line.id));
    return {
      ...recorded,
      id: order.id,
      status: order.status,
      line: {
        sku: recorded.movement.sku,
        required: quantityToNumber(parseQuantity(after!.required)),
        reserved: quantityToNumber(parseQuantity(after!.reserved)),
        issued: quantityToNumber(parseQuantity(after!.issued)),
        unit: recorded.movement.unit,
      },
    };
  });
  await checkStockAlertsOfOrder(orderId);
  return result;
}
