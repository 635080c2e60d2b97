/**
 * Issuing reserved stock to a build order (storekeepers): through the stock ledger's one
 * writer, `recordMovementIn`, inside a transaction that has locked the order first. The
 * movement takes what the order line holds on that lot and location (by quantity, or by
 * weighing the spool back), and the first issue moves the order to "in progress".
 * The record-movement page and POST /api/v1/stock-movements with a `buildOrderId` come
 * here too (`issueMovementToBuildOrder`): there is one way to issue to an order.
 */
import { checkStockAlertsOfOrder } from "~/alerts/stock-alerts.server";
import { and, eq } from "drizzle-orm";
import { buildOrderLines, items } from "~/db/schema";
import { quantityToNumber, parseQuantity } from "~/lib/decimal-amounts";
import {
  recordMovementIn,
  type RecordedMovement,
} from "~/stock/stock-movements.server";
import { BuildOrderError } from "./build-order-errors";
import { heldByBuildOrderLine } from "./build-order-held-stock.server";
import type { MovementRequest } from "~/stock/movement-request";
import { DomainError } from "~/lib/domain-error";
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
  /** The unit, when the caller names one (the stock-movements API), is checked against the item's. */
  request: IssueRequest & { unit?: MovementRequest["unit"] },
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
    if (!line) {
      // A real item the order has no line for is a conflict with the order; an unknown SKU is bad input.
      const [item] = await tx
        .select({ id: items.id })
        .from(items)
        .where(eq(items.sku, request.sku))
        .limit(1);
      throw new BuildOrderError(
        item ? 409 : 400,
        item
          ? `${buildOrderReference(order.id)} needs no ${request.sku}.`
          : `No item with SKU "${request.sku}".`,
        "sku",
      );
    }
    const recorded = await recordMovementIn(
      tx,
      {
        type: "issue",
        sku: request.sku,
        lot: request.lot,
        location: request.location,
        quantity: request.quantity,
        grossKg: request.grossKg,
        unit: request.unit,
        reference: buildOrderReference(order.id),
        note: request.note,
        toLocation: undefined,
        spoolType: undefined,
        supplierBatch: undefined,
      },
      userId,
      { held: heldByBuildOrderLine({ orderId: order.id, lineId: line.id }) },
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

/** What POST /api/v1/stock-movements answers for an issue to a build order: the movement's answer and the order. */
export interface MovementIssueResult {
  movement: RecordedMovement["movement"];
  balance: RecordedMovement["balance"];
  buildOrder: {
    id: number;
    reference: string;
    status: BuildOrderStatus;
    line: IssueResult["line"];
  };
}

/** A stock-movement request naming its build order (`buildOrderId`), issued through the order. */
export async function issueMovementToBuildOrder(
  request: MovementRequest & { buildOrderId: number },
  userId: string,
): Promise<MovementIssueResult> {
  if (request.type !== "issue")
    throw new DomainError(
      400,
      "Stock goes to a build order by an issue: buildOrderId is only for issues.",
      "buildOrderId",
    );
  const issued = await issueToBuildOrder(
    request.buildOrderId,
    {
      sku: request.sku,
      lot: request.lot,
      location: request.location,
      quantity: request.quantity,
      grossKg: request.grossKg,
      unit: request.unit,
      note: request.note,
    },
    userId,
  );
  return {
    movement: issued.movement,
    balance: issued.balance,
    buildOrder: {
      id: issued.id,
      reference: buildOrderReference(issued.id),
      status: issued.status,
      line: issued.line,
    },
  };
}
