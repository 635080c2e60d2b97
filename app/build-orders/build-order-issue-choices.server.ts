/**
 * The build orders an item can be issued to from the record-movement page: open for
 * issues (stock held or being built) and with a line for the item, newest first, each
 * with what it still needs and what it holds where (oldest lot first, as a reservation
 * takes them and the order's page lists them).
 */
import { and, desc, eq, inArray } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  buildOrderLines,
  buildOrderReservations,
  buildOrders,
  designs,
  locations,
  lots,
} from "~/db/schema";
import { buildOrderStatuses } from "~/db/tables/build-order-enums";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import { buildOrderReference, canIssue } from "./build-order-status";
import { compareOldestFirst } from "~/stock/stock-allocation";

/** Enough for any workshop's open orders of one item; the page lists them in one choice. */
const maxChoices = 50;

const quantity = (text: string) => quantityToNumber(parseQuantity(text));

export async function listOrdersToIssueItem(itemId: number) {
  const issuable = buildOrderStatuses.filter(canIssue);
  const rows = await db
    .select({
      id: buildOrders.id,
      status: buildOrders.status,
      design: designs.name,
      lineId: buildOrderLines.id,
      required: buildOrderLines.required,
      reserved: buildOrderLines.reserved,
      issued: buildOrderLines.issued,
    })
    .from(buildOrderLines)
    .innerJoin(buildOrders, eq(buildOrders.id, buildOrderLines.orderId))
    .innerJoin(designs, eq(designs.id, buildOrders.designId))
    .where(
      and(
        eq(buildOrderLines.itemId, itemId),
        inArray(buildOrders.status, issuable),
      ),
    )
    .orderBy(desc(buildOrders.id))
    .limit(maxChoices);
  const held =
    rows.length === 0
      ? []
      : await db
          .select({
            lineId: buildOrderReservations.lineId,
            lotId: buildOrderReservations.lotId,
            locationId: buildOrderReservations.locationId,
            receivedOn: lots.receivedOn,
            lot: lots.lotNumber,
            location: locations.code,
            quantity: buildOrderReservations.quantity,
          })
          .from(buildOrderReservations)
          .innerJoin(
            locations,
            eq(locations.id, buildOrderReservations.locationId),
          )
          .leftJoin(lots, eq(lots.id, buildOrderReservations.lotId))
          .where(
            inArray(
              buildOrderReservations.lineId,
              rows.map((row) => row.lineId),
            ),
          );
  return rows.map((row) => ({
    id: row.id,
    reference: buildOrderReference(row.id),
    status: row.status,
    design: row.design,
    required: quantity(row.required),
    reserved: quantity(row.reserved),
    issued: quantity(row.issued),
    held: held
      .filter((spot) => spot.lineId === row.lineId)
      .sort(compareOldestFirst)
      .map((spot) => ({
        lot: spot.lot,
        location: spot.location,
        quantity: quantity(spot.quantity),
      })),
  }));
}

export type OrderToIssue = Awaited<
  ReturnType<typeof listOrdersToIssueItem>
>[number];
