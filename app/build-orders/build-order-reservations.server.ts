/**
 * Reserving stock for a build order, and releasing it. One short transaction each, with
 * the locks of `build-order-locks.server.ts` (order, lines, items by id, balances), so a
 * reservation never makes `available` negative however many builders reserve at once:
 * every decision is made on locked rows and written before the locks are let go.
 */
import { checkStockAlertsOfOrder } from "~/alerts/stock-alerts.server";
import { and, eq, inArray } from "drizzle-orm";
import {
  buildOrderLines,
  buildOrderReservations,
  locations,
  lots,
  stockBalances,
  items,
} from "~/db/schema";
import {
  formatQuantityText,
  parseQuantity,
  quantityToNumber,
} from "~/lib/decimal-amounts";
import { unitWord } from "~/lib/unit-text";
import { BuildOrderError, type Shortage } from "./build-order-errors";
import {
  balanceKey,
  changeStatus,
  inBuildOrderTransaction,
  lockBalances,
  lockItems,
  lockOrder,
  type LockedBalance,
  type LockedOrder,
  type Transaction,
} from "./build-order-locks.server";
import {
  buildOrderReference,
  canReserve,
  refusalFor,
  type BuildOrderStatus,
} from "./build-order-status";
import { allocateOldestFirst, type Allocation } from "~/stock/stock-allocation";
import { heldChangeOf, lotOnHoldMessage } from "~/stock/lot-hold";
import { addToItemHeld, heldLotsAmong } from "~/stock/lot-hold.server";

export interface HeldStock {
  sku: string;
  lot: string | null;
  location: string;
  quantity: number;
  unit: string;
}

export interface ReserveResult {
  id: number;
  status: BuildOrderStatus;
  /** What this request reserved, by lot and location. */
  reserved: HeldStock[];
  /** What is still short after a partial reservation (empty when every line is covered). */
  shortages: Shortage[];
}

interface LockedLine {
  id: number;
  itemId: number;
  required: bigint;
  reserved: bigint;
  issued: bigint;
}

async function lockLines(
  tx: Transaction,
  orderId: number,
): Promise<LockedLine[]> {
  const rows = await tx
    .select({
      id: buildOrderLines.id,
      itemId: buildOrderLines.itemId,
      required: buildOrderLines.required,
      reserved: buildOrderLines.reserved,
      issued: buildOrderLines.issued,
    })
    .from(buildOrderLines)
    .where(eq(buildOrderLines.orderId, orderId))
    .orderBy(buildOrderLines.itemId)
    .for("update");
  return rows.map((row) => ({
    ...row,
    required: parseQuantity(row.required),
    reserved: parseQuantity(row.reserved),
    issued: parseQuantity(row.issued),
  }));
}

interface HeldRow {
  lineId: number;
  itemId: number;
  lotId: number;
  locationId: number;
  quantity: bigint;
}

async function lockHeldRows(
  tx: Transaction,
  lineIds: readonly number[],
): Promise<HeldRow[]> {
  if (lineIds.length === 0) return [];
  const rows = await tx
    .select({
      lineId: buildOrderReservations.lineId,
      itemId: buildOrderReservations.itemId,
      lotId: buildOrderReservations.lotId,
      locationId: buildOrderReservations.locationId,
      quantity: buildOrderReservations.quantity,
    })
    .from(buildOrderReservations)
    .where(inArray(buildOrderReservations.lineId, [...lineIds]))
    .for("update");
  return rows.map((row) => ({ ...row, quantity: parseQuantity(row.quantity) }));
}

async function writeBalanceReserved(
  tx: Transaction,
  balance: { itemId: number; lotId: number; locationId: number },
  reserved: bigint,
) {
  await tx
    .update(stockBalances)
    .set({ reserved: formatQuantityText(reserved), updatedAt: new Date() })
    .where(
      and(
        eq(stockBalances.itemId, balance.itemId),
        eq(stockBalances.lotId, balance.lotId),
        eq(stockBalances.locationId, balance.locationId),
      ),
    );
}

async function writeItemReserved(
  tx: Transaction,
  itemId: number,
  reserved: bigint,
) {
  await tx
    .update(items)
    .set({ reserved: formatQuantityText(reserved), updatedAt: new Date() })
    .where(eq(items.id, itemId));
}

/** Lot numbers and location codes for answers. */
async function placeNames(
  tx: Transaction,
  places: readonly { lotId: number; locationId: number }[],
) {
  const lotIds = [...new Set(places.map((place) => place.lotId))].filter(
    (id) => id !== 0,
  );
  const locationIds = [...new Set(places.map((place) => place.locationId))];
  const lotNumbers = new Map(
    (lotIds.length === 0
      ? []
      : await tx
          .select({ id: lots.id, number: lots.lotNumber })
          .from(lots)
          .where(inArray(lots.id, lotIds))
    ).map((lot) => [lot.id, lot.number]),
  );
  const locationCodes = new Map(
    (locationIds.length === 0
      ? []
      : await tx
          .select({ id: locations.id, code: locations.code })
          .from(locations)
          .where(inArray(locations.id, locationIds))
    ).map((location) => [location.id, location.code]),
  );
  return (place: { lotId: number; locationId: number }) => ({
    lot: lotNumbers.get(place.lotId) ?? null,
    location: locationCodes.get(place.locationId) ?? String(place.locationId),
  });
}

/**
 * Reserves what the order's lines still need, oldest lot first. All lines or none: when
 * any line is short, nothing is reserved and a 409 lists the shortages, unless `partial`
 * asks to reserve what there is. The first reservation moves a draft to "reserved".
 */
export async function reserveBuildOrderStock(
  orderId: number,
  userId: string,
  options: { partial: boolean },
): Promise<ReserveResult> {
  const result = await inBuildOrderTransaction(async (tx) => {
    const order = await lockOrder(tx, orderId);
    if (!canReserve(order.status))
      throw new BuildOrderError(409, refusalFor("reserve", order.status));
    const lines = await lockLines(tx, order.id);
    const needs = lines
      .map((line) => {
        const wanted = line.required - line.issued - line.reserved;
        return { line, wanted: wanted > 0n ? wanted : 0n };
      })
      .filter((need) => need.wanted > 0n);
    if (needs.length === 0)
      return {
        id: order.id,
        status: order.status,
        reserved: [],
        shortages: [],
      };

    const held = await lockHeldRows(
      tx,
      needs.map((need) => need.line.id),
    );
    const lockedItems = await lockItems(
      tx,
      needs.map((need) => need.line.itemId),
    );
    const balancesByItem = new Map<number, LockedBalance[]>();
    for (const itemId of [...lockedItems.keys()])
      balancesByItem.set(itemId, await lockBalances(tx, itemId));
    // Lots on hold (decision 039) are never chosen; a shortage says which held lots it skipped.
    const heldLots = await heldLotsAmong(
      tx,
      [...balancesByItem.values()].flat().map((balance) => balance.lotId),
    );
    const holdNotes = new Set<string>();

    const plans: {
      line: LockedLine;
      allocations: Allocation[];
      allocated: bigint;
    }[] = [];
    const shortages: Shortage[] = [];
    for (const { line, wanted } of needs) {
      const item = lockedItems.get(line.itemId)!;
      const itemFree = item.onHand - item.reserved - item.held;
      const allBalances = balancesByItem.get(line.itemId) ?? [];
      const balances = allBalances.filter(
        (balance) => !heldLots.has(balance.lotId),
      );
      const { allocations, allocated } = allocateOldestFirst(
        balances.map((balance) => ({
          lotId: balance.lotId,
          locationId: balance.locationId,
          receivedOn: balance.receivedOn,
          free: balance.onHand - balance.reserved,
        })),
        wanted < itemFree ? wanted : itemFree > 0n ? itemFree : 0n,
      );
      plans.push({ line, allocations, allocated });
      if (allocated < wanted) {
        for (const balance of allBalances) {
          const hold = heldLots.get(balance.lotId);
          if (hold && balance.onHand > balance.reserved)
            holdNotes.add(lotOnHoldMessage(hold.number, hold.reason));
        }
        shortages.push({
          sku: item.sku,
          required: quantityToNumber(wanted),
          available: quantityToNumber(allocated),
          short: quantityToNumber(wanted - allocated),
          unit: item.unit,
        });
      }
    }

    const reference = buildOrderReference(order.id);
    const holdText =
      holdNotes.size === 0 ? "" : ` ${[...holdNotes].join(". ")}.`;
    if (shortages.length > 0 && !options.partial) {
      throw new BuildOrderError(
        409,
        `Not enough stock to reserve ${reference} in full: ${shortages
          .map(
            (shortage) =>
              `${shortage.sku} short by ${shortage.short} ${unitWord(shortage.unit, shortage.short)}`,
          )
          .join("; ")}.${holdText} Nothing was reserved.`,
        undefined,
        shortages,
      );
    }
    if (plans.every((plan) => plan.allocated === 0n)) {
      throw new BuildOrderError(
        409,
        `Nothing that ${reference} still needs is free to reserve.${holdText}`,
        undefined,
        shortages,
      );
    }

    // Write: balances, held rows, items, lines.
    const balances = new Map<string, LockedBalance>();
    for (const list of balancesByItem.values())
      for (const balance of list) balances.set(balanceKey(balance), balance);
    const heldRows = new Map(
      held.map((row) => [`${row.lineId}|${balanceKey(row)}`, row]),
    );
    const reservedNow: (Allocation & { itemId: number })[] = [];
    for (const plan of plans) {
      if (plan.allocated === 0n) continue;
      const itemId = plan.line.itemId;
      for (const allocation of plan.allocations) {
        const place = { itemId, ...allocation };
        const balance = balances.get(balanceKey(place))!;
        balance.reserved += allocation.quantity;
        await writeBalanceReserved(tx, balance, balance.reserved);
        const existing = heldRows.get(`${plan.line.id}|${balanceKey(place)}`);
        if (existing) {
          await tx
            .update(buildOrderReservations)
            .set({
              quantity: formatQuantityText(
                existing.quantity + allocation.quantity,
              ),
            })
            .where(
              and(
                eq(buildOrderReservations.lineId, plan.line.id),
                eq(buildOrderReservations.itemId, itemId),
                eq(buildOrderReservations.lotId, allocation.lotId),
                eq(buildOrderReservations.locationId, allocation.locationId),
              ),
            );
        } else {
          await tx.insert(buildOrderReservations).values({
            lineId: plan.line.id,
            itemId,
            lotId: allocation.lotId,
            locationId: allocation.locationId,
            quantity: formatQuantityText(allocation.quantity),
          });
        }
        reservedNow.push(place);
      }
      const item = lockedItems.get(itemId)!;
      item.reserved += plan.allocated;
      await writeItemReserved(tx, itemId, item.reserved);
      await tx
        .update(buildOrderLines)
        .set({
          reserved: formatQuantityText(plan.line.reserved + plan.allocated),
        })
        .where(eq(buildOrderLines.id, plan.line.id));
    }
    if (order.status === "draft") {
      await changeStatus(
        tx,
        order,
        "reserved",
        userId,
        shortages.length > 0
          ? "Reserved what there was; some lines are short."
          : "",
      );
    }

    const nameOf = await placeNames(tx, reservedNow);
    return {
      id: order.id,
      status: order.status,
      reserved: reservedNow.map((place) => {
        const item = lockedItems.get(place.itemId)!;
        return {
          sku: item.sku,
          ...nameOf(place),
          quantity: quantityToNumber(place.quantity),
          unit: item.unit,
        };
      }),
      shortages,
    };
  });
  await checkStockAlertsOfOrder(orderId);
  return result;
}

/**
 * Gives back everything the order's lines hold (inside the caller's transaction, with the
 * order locked): balances, items, held rows and the lines' reserved quantities.
 * Returns what was released.
 */
export async function releaseHeldStock(
  tx: Transaction,
  order: LockedOrder,
): Promise<HeldStock[]> {
  const lines = await lockLines(tx, order.id);
  const held = await lockHeldRows(
    tx,
    lines.map((line) => line.id),
  );
  if (held.length === 0) return [];
  const lockedItems = await lockItems(
    tx,
    held.map((row) => row.itemId),
  );
  const balances = new Map<string, LockedBalance>();
  for (const itemId of lockedItems.keys())
    for (const balance of await lockBalances(tx, itemId))
      balances.set(balanceKey(balance), balance);

  const heldLots = await heldLotsAmong(
    tx,
    held.map((row) => row.lotId),
  );
  const releasedByItem = new Map<number, bigint>();
  for (const row of held) {
    const balance = balances.get(balanceKey(row));
    if (balance) {
      const before = { ...balance };
      balance.reserved -= row.quantity;
      await writeBalanceReserved(tx, balance, balance.reserved);
      // Stock given back on a held lot stays held (decision 039).
      if (heldLots.has(row.lotId))
        await addToItemHeld(tx, row.itemId, heldChangeOf(before, balance));
    }
    releasedByItem.set(
      row.itemId,
      (releasedByItem.get(row.itemId) ?? 0n) + row.quantity,
    );
  }
  for (const [itemId, released] of releasedByItem) {
    const item = lockedItems.get(itemId)!;
    item.reserved -= released;
    await writeItemReserved(tx, itemId, item.reserved);
  }
  await tx.delete(buildOrderReservations).where(
    inArray(
      buildOrderReservations.lineId,
      lines.map((line) => line.id),
    ),
  );
  await tx
    .update(buildOrderLines)
    .set({ reserved: "0" })
    .where(eq(buildOrderLines.orderId, order.id));

  const nameOf = await placeNames(tx, held);
  return held.map((row) => {
    const item = lockedItems.get(row.itemId)!;
    return {
      sku: item.sku,
      ...nameOf(row),
      quantity: quantityToNumber(row.quantity),
      unit: item.unit,
    };
  });
}
