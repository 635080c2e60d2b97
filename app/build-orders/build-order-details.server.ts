/**
 * One build order as the page and the API show it: its lines with what each needs,
 * holds and has been issued, what is free and where (lot and location, oldest first),
 * planned versus actual cost, and the status history.
 */
import { and, asc, desc, eq, gt, inArray } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  buildOrderEvents,
  buildOrderIssues,
  buildOrderLines,
  buildOrderReservations,
  buildOrders,
  items,
  locations,
  lots,
  stockBalances,
  stockMovements,
  users,
} from "~/db/schema";
import { companyCurrency } from "~/purchasing/suppliers.server";
import {
  parseQuantity,
  parseUnitCost,
  quantityToNumber,
} from "~/lib/decimal-amounts";
import { orderCosts } from "./build-order-costs";
import { buildOrderReference, canReserve } from "./build-order-status";
import { selectBuildOrderSummaries } from "./build-orders.server";
import { compareOldestFirst } from "~/stock/stock-allocation";

const money = (tenThousandths: bigint) => Number(tenThousandths) / 10_000;
const quantity = (text: string) => quantityToNumber(parseQuantity(text));

/** The order with everything its page shows; null when there is no such order. */
export async function findBuildOrder(orderId: number) {
  const [order] = await selectBuildOrderSummaries()
    .where(eq(buildOrders.id, orderId))
    .limit(1);
  if (!order) return null;

  const lineRows = await db
    .select({
      id: buildOrderLines.id,
      itemId: buildOrderLines.itemId,
      required: buildOrderLines.required,
      reserved: buildOrderLines.reserved,
      issued: buildOrderLines.issued,
      plannedUnitCost: buildOrderLines.plannedUnitCost,
      sku: items.sku,
      name: items.name,
      kind: items.kind,
      unit: items.unit,
      itemOnHand: items.onHand,
      itemReserved: items.reserved,
      itemHeld: items.held,
    })
    .from(buildOrderLines)
    .innerJoin(items, eq(items.id, buildOrderLines.itemId))
    .where(eq(buildOrderLines.orderId, orderId))
    .orderBy(asc(items.kind), asc(items.sku));
  const lineIds = lineRows.map((line) => line.id);
  const itemIds = lineRows.map((line) => line.itemId);

  const [heldRows, stockRows, issueRows, eventRows, currency] =
    await Promise.all([
      lineIds.length === 0
        ? []
        : db
            .select({
              lineId: buildOrderReservations.lineId,
              lotId: buildOrderReservations.lotId,
              locationId: buildOrderReservations.locationId,
              quantity: buildOrderReservations.quantity,
              lot: lots.lotNumber,
              receivedOn: lots.receivedOn,
              tareKg: lots.tareKg,
              location: locations.code,
              balanceOnHand: stockBalances.onHand,
            })
            .from(buildOrderReservations)
            .innerJoin(
              locations,
              eq(locations.id, buildOrderReservations.locationId),
            )
            .leftJoin(lots, eq(lots.id, buildOrderReservations.lotId))
            .leftJoin(
              stockBalances,
              and(
                eq(stockBalances.itemId, buildOrderReservations.itemId),
                eq(stockBalances.lotId, buildOrderReservations.lotId),
                eq(stockBalances.locationId, buildOrderReservations.locationId),
              ),
            )
            .where(inArray(buildOrderReservations.lineId, lineIds)),
      itemIds.length === 0
        ? []
        : db
            .select({
              itemId: stockBalances.itemId,
              lotId: stockBalances.lotId,
              locationId: stockBalances.locationId,
              onHand: stockBalances.onHand,
              reserved: stockBalances.reserved,
              lot: lots.lotNumber,
              receivedOn: lots.receivedOn,
              holdReason: lots.holdReason,
              location: locations.code,
            })
            .from(stockBalances)
            .innerJoin(locations, eq(locations.id, stockBalances.locationId))
            .leftJoin(lots, eq(lots.id, stockBalances.lotId))
            .where(
              and(
                inArray(stockBalances.itemId, itemIds),
                gt(stockBalances.onHand, "0"),
              ),
            ),
      lineIds.length === 0
        ? []
        : db
            .select({
              lineId: buildOrderIssues.lineId,
              quantity: buildOrderIssues.quantity,
              unitCost: buildOrderIssues.unitCost,
              movementId: stockMovements.id,
              createdAt: stockMovements.createdAt,
              grossKg: stockMovements.grossKg,
              lot: lots.lotNumber,
              location: locations.code,
              by: users.name,
            })
            .from(buildOrderIssues)
            .innerJoin(
              stockMovements,
              eq(stockMovements.id, buildOrderIssues.movementId),
            )
            .innerJoin(locations, eq(locations.id, stockMovements.locationId))
            .innerJoin(users, eq(users.id, stockMovements.userId))
            .leftJoin(lots, eq(lots.id, stockMovements.lotId))
            .where(inArray(buildOrderIssues.lineId, lineIds))
            .orderBy(asc(stockMovements.id)),
      db
        .select({
          fromStatus: buildOrderEvents.fromStatus,
          toStatus: buildOrderEvents.toStatus,
          note: buildOrderEvents.note,
          createdAt: buildOrderEvents.createdAt,
          by: users.name,
        })
        .from(buildOrderEvents)
        .innerJoin(users, eq(users.id, buildOrderEvents.userId))
        .where(eq(buildOrderEvents.orderId, orderId))
        .orderBy(desc(buildOrderEvents.id)),
      companyCurrency(),
    ]);

  const costs = orderCosts(
    lineRows.map((line) => ({
      required: parseQuantity(line.required),
      issued: parseQuantity(line.issued),
      plannedUnitCost:
        line.plannedUnitCost === null
          ? null
          : parseUnitCost(line.plannedUnitCost),
      issues: issueRows
        .filter((issue) => issue.lineId === line.id)
        .map((issue) => ({
          quantity: parseQuantity(issue.quantity),
          unitCost: parseUnitCost(issue.unitCost),
        })),
    })),
    order.quantity,
  );

  const lines = lineRows.map((line, index) => {
    const required = parseQuantity(line.required);
    const reserved = parseQuantity(line.reserved);
    const issued = parseQuantity(line.issued);
    // A closed order (complete or cancelled) needs nothing more.
    const toReserve = canReserve(order.status)
      ? required - issued - reserved
      : 0n;
    const stillToReserve = toReserve > 0n ? toReserve : 0n;
    // Held stock (lots on hold, decision 039) is on hand but not free.
    const available =
      parseQuantity(line.itemOnHand) -
      parseQuantity(line.itemReserved) -
      parseQuantity(line.itemHeld);
    const short = stillToReserve - (available > 0n ? available : 0n);
    const lineCost = costs.lines[index]!;
    return {
      sku: line.sku,
      name: line.name,
      kind: line.kind,
      unit: line.unit,
      required: quantityToNumber(required),
      reserved: quantityToNumber(reserved),
      issued: quantityToNumber(issued),
      /** Still to reserve: required − issued − reserved. */
      toReserve: quantityToNumber(stillToReserve),
      /** Free stock of the item now (on hand − reserved − held, all orders). */
      available: quantityToNumber(available),
      /** How much of what is still to reserve the free stock cannot cover. */
      short: quantityToNumber(short > 0n ? short : 0n),
      /** Issued − required (+ used more than planned). */
      difference: quantityToNumber(lineCost.difference),
      plannedUnitCost:
        line.plannedUnitCost === null
          ? null
          : money(parseUnitCost(line.plannedUnitCost)),
      plannedCost:
        lineCost.plannedCost === null ? null : money(lineCost.plannedCost),
      actualCost: money(lineCost.actualCost),
      /** What this order holds, oldest lot first (the storekeeper's suggestion is the first). */
      held: heldRows
        .filter((row) => row.lineId === line.id)
        .sort(compareOldestFirst)
        .map((row) => ({
          lot: row.lot,
          location: row.location,
          receivedOn: row.receivedOn,
          quantity: quantity(row.quantity),
          /** On hand on that lot and location (for the spool weigh-back). */
          onHand: row.balanceOnHand === null ? 0 : quantity(row.balanceOnHand),
          tareKg: row.tareKg === null ? null : quantity(row.tareKg),
        })),
      /** Where the item is, oldest lot first: on hand, reserved (all orders) and free. */
      stock: stockRows
        .filter((row) => row.itemId === line.itemId)
        .sort(compareOldestFirst)
        .map((row) => {
          const onHand = parseQuantity(row.onHand);
          const rowReserved = parseQuantity(row.reserved);
          const onHold = row.holdReason !== null;
          return {
            lot: row.lot,
            location: row.location,
            receivedOn: row.receivedOn,
            onHand: quantityToNumber(onHand),
            reserved: quantityToNumber(rowReserved),
            /** A held lot's stock is not free: it cannot be reserved or issued. */
            free: onHold ? 0 : quantityToNumber(onHand - rowReserved),
            onHold,
          };
        }),
      issues: issueRows
        .filter((issue) => issue.lineId === line.id)
        .map((issue) => ({
          movementId: issue.movementId,
          at: issue.createdAt.toISOString(),
          lot: issue.lot,
          location: issue.location,
          quantity: quantity(issue.quantity),
          grossKg: issue.grossKg === null ? null : quantity(issue.grossKg),
          unitCost: money(parseUnitCost(issue.unitCost)),
          by: issue.by,
        })),
    };
  });

  return {
    id: order.id,
    reference: buildOrderReference(order.id),
    status: order.status,
    design: { id: order.designId, name: order.designName },
    revision: order.revision,
    quantity: order.quantity,
    note: order.note,
    /** "YYYY-MM-DD" when building starts; null when not planned. */
    plannedStart: order.plannedStart,
    createdBy: order.createdBy,
    createdAt: order.createdAt.toISOString(),
    updatedAt: order.updatedAt.toISOString(),
    currency,
    lines,
    costs: {
      plannedTotal: money(costs.plannedTotal),
      actualTotal: money(costs.actualTotal),
      plannedPerMotor: money(costs.plannedPerMotor),
      actualPerMotor: money(costs.actualPerMotor),
      plannedComplete: costs.plannedComplete,
    },
    events: eventRows.map((event) => ({
      fromStatus: event.fromStatus,
      toStatus: event.toStatus,
      note: event.note,
      at: event.createdAt.toISOString(),
      by: event.by,
    })),
  };
}

export type BuildOrderDetails = NonNullable<
  Awaited<ReturnType<typeof findBuildOrder>>
>;
