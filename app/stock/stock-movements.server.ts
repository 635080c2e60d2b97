/**
 * Recording stock movements: the only code that writes the ledger. Each
 * movement is one short transaction that locks the item row, then the balance
 * rows it touches (always in that order, so concurrent movements queue rather
 * than deadlock), checks that no balance goes below zero or below what is
 * reserved, appends the movement and updates the kept balances.
 *
 * An issue to a source document that holds stock (`options.held`, a build order line
 * today, supplied by `app/build-orders/build-order-held-stock.server.ts`) takes what the
 * document holds: the document is locked before the item (the build-order modules lock
 * in the same order: order, then items by id, then balances), the taken quantity comes
 * out of the reserved stock, and the same transaction lowers what the document holds on
 * that balance. After the commit the ledger runs its after-commit work
 * (`afterMovementsCommitted`: the low-stock alerts).
 */
import { and, eq, sql } from "drizzle-orm";
import type { Transaction } from "~/db/client.server";
import { writeTransaction } from "~/db/write-transaction.server";
import {
  items,
  locations,
  lots,
  stockBalances,
  stockMovements,
  suppliers,
} from "~/db/schema";
import {
  formatQuantityText,
  formatUnitCostText,
  movingAverageAfterReceipt,
  parseQuantity,
  parseUnitCost,
  quantityToNumber,
} from "~/lib/decimal-amounts";
import { DomainError } from "~/lib/domain-error";
import { unitWord } from "~/lib/unit-text";
import type { MovementRequest } from "./movement-request";
import { todayUtc } from "~/lib/calendar-days";
import { heldChangeOf, lotOnHoldMessage } from "./lot-hold";
import { addToItemHeld, lotHoldReason } from "./lot-hold.server";

/** An amount of stock in a refusal, as typed into the API: "1.5 kg", "1 piece", "3 pieces". */
export function amountText(thousandths: bigint, unit: string): string {
  const value = quantityToNumber(thousandths);
  return `${value} ${unitWord(unit, value)}`;
}

/** A transaction of the one database client, for callers that record a movement inside their own. */
export type LedgerTransaction = Transaction;

/**
 * The document a movement is made for, named by the caller that owns it (a build order
 * today): the ledger knows it only by these words and never imports its owner.
 */
export interface SourceDocument {
  /** What it is, in words: "build order". */
  kind: string;
  id: number;
  /** How people write it: "BO-12". */
  reference: string;
}

/** The balance an issue takes held stock from, with the quantity it takes. */
export interface HeldBalance {
  item: { id: number; sku: string; unit: string };
  lot: { id: number; number: string | null };
  location: { id: number; code: string };
  taken: bigint;
}

/**
 * Stock a source document holds (reserves) that an issue takes, supplied by the
 * document's owner. The ledger calls these inside the movement's transaction, in this
 * order: `lockDocument` before it locks the item (the lock order of every such
 * transaction), `lockHeld` once it knows the balance and the quantity (refusing with a
 * DomainError when the document holds less), `recordTaken` once the movement row exists.
 */
export interface HeldStock {
  source: SourceDocument;
  lockDocument(tx: Transaction): Promise<void>;
  /** Locks what the document holds on the balance; refuses when it holds less than is taken. */
  lockHeld(tx: Transaction, balance: HeldBalance): Promise<void>;
  /** Lowers what the document holds by `taken` and notes the movement against it. */
  recordTaken(
    tx: Transaction,
    taken: { movementId: number; quantity: bigint; unitCost: bigint },
  ): Promise<void>;
}

/**
 * Work to do once movements are committed: after `writeTransaction` returned, so once
 * even when the transaction's work was retried. Low-stock alerts subscribe here
 * (`app/alerts/stock-alerts.server.ts`), so the ledger imports no alert code.
 */
export type MovementsCommittedHook = (skus: readonly string[]) => Promise<void>;

const committedHooks = new Set<MovementsCommittedHook>();

/** Adds work to run after movements are committed; returns the function that removes it. */
export function afterMovementsCommitted(
  hook: MovementsCommittedHook,
): () => void {
  committedHooks.add(hook);
  return () => committedHooks.delete(hook);
}

/** Runs the after-commit work, in the order it was added. For callers that commit movements in their own transaction. */
export async function movementsCommitted(skus: readonly string[]) {
  for (const hook of committedHooks) await hook(skus);
}

export interface MovementOptions {
  /** When it happened; only imports and the demo seed give a time other than now. */
  at?: Date;
  /**
   * An issue of stock a source document holds (a build order line's reservation). The
   * issue may take only what the document holds on this lot and location; the reserved
   * quantity of the balance and item goes down with it, and the document's owner lowers
   * its own rows, all in the movement's transaction.
   */
  held?: HeldStock;
  /** The after-commit work (low-stock alerts) runs after the movement unless false (the demo seed checks once at the end). */
  checkAlerts?: boolean;
  /** A receipt against a purchase order: a lot it creates keeps the order and its supplier. */
  origin?: { supplierId: number; purchaseOrderId: number };
}

export interface RecordedMovement {
  movement: {
    id: number;
    type: MovementRequest["type"];
    sku: string;
    lot: string | null;
    location: string;
    toLocation: string | null;
    quantity: number;
    unit: string;
    createdAt: string;
  };
  balance: { onHand: number; reserved: number; available: number };
}

async function lockItem(tx: Transaction, sku: string) {
  const [item] = await tx
    .select({
      id: items.id,
      sku: items.sku,
      kind: items.kind,
      unit: items.unit,
      active: items.active,
      onHand: items.onHand,
      reserved: items.reserved,
      held: items.held,
      averageCost: items.averageCost,
    })
    .from(items)
    .where(eq(items.sku, sku))
    .for("update")
    .limit(1);
  if (!item) throw new DomainError(400, `No item with SKU "${sku}".`, "sku");
  return item;
}

async function findLocation(tx: Transaction, code: string, field: string) {
  const [location] = await tx
    .select({
      id: locations.id,
      code: locations.code,
      active: locations.active,
    })
    .from(locations)
    .where(eq(locations.code, code))
    .limit(1);
  if (!location || !location.active)
    throw new DomainError(400, `No location with code "${code}".`, field);
  return location;
}

/** Locks one balance row and returns its on hand and reserved (as stored), or undefined when there is none. */
async function lockBalanceRow(
  tx: Transaction,
  itemId: number,
  lotId: number,
  locationId: number,
) {
  const [row] = await tx
    .select({ onHand: stockBalances.onHand, reserved: stockBalances.reserved })
    .from(stockBalances)
    .where(
      and(
        eq(stockBalances.itemId, itemId),
        eq(stockBalances.lotId, lotId),
        eq(stockBalances.locationId, locationId),
      ),
    )
    .for("update");
  return row;
}

/**
 * Locks (creating when missing) one balance row and returns its on hand and reserved, in
 * thousandths. A balance that exists (nearly every movement's) costs one locking read; a
 * missing one is created, then read locked. The caller holds the item's row lock, which
 * every writer of the item's balances takes first, so none is created in between.
 */
async function lockBalance(
  tx: Transaction,
  itemId: number,
  lotId: number,
  locationId: number,
) {
  let row = await lockBalanceRow(tx, itemId, lotId, locationId);
  if (!row) {
    await tx
      .insert(stockBalances)
      .values({
        itemId,
        lotId,
        locationId,
        onHand: "0",
        reserved: "0",
        updatedAt: new Date(),
      })
      .onDuplicateKeyUpdate({ set: { itemId: sql`item_id` } });
    row = await lockBalanceRow(tx, itemId, lotId, locationId);
  }
  return {
    onHand: parseQuantity(row!.onHand),
    reserved: parseQuantity(row!.reserved),
  };
}

async function setBalance(
  tx: Transaction,
  itemId: number,
  lotId: number,
  locationId: number,
  onHand: bigint,
  reserved?: bigint,
) {
  await tx
    .update(stockBalances)
    .set({
      onHand: formatQuantityText(onHand),
      ...(reserved === undefined
        ? {}
        : { reserved: formatQuantityText(reserved) }),
      updatedAt: new Date(),
    })
    .where(
      and(
        eq(stockBalances.itemId, itemId),
        eq(stockBalances.lotId, lotId),
        eq(stockBalances.locationId, locationId),
      ),
    );
}

/** A receipt's named supplier must exist (400 on the field otherwise). */
async function checkSupplier(tx: Transaction, supplierId: number | undefined) {
  if (supplierId === undefined) return;
  const [found] = await tx
    .select({ id: suppliers.id })
    .from(suppliers)
    .where(eq(suppliers.id, supplierId))
    .limit(1);
  if (!found)
    throw new DomainError(
      400,
      `No supplier with id ${supplierId}.`,
      "supplierId",
    );
}

async function resolveLot(
  tx: Transaction,
  item: { id: number; kind: string },
  request: MovementRequest,
  origin?: MovementOptions["origin"],
): Promise<{
  id: number;
  number: string | null;
  tareKg: bigint | null;
  /** True when this receipt created the lot (its origin is then this receipt). */
  created?: boolean;
}> {
  await checkSupplier(tx, request.supplierId);
  if (!request.lot) {
    if (item.kind === "wire") {
      throw new DomainError(
        400,
        "Wire is kept by spool: give the spool's lot number.",
        "lot",
      );
    }
    return { id: 0, number: null, tareKg: null };
  }
  const [existing] = await tx
    .select({ id: lots.id, tareKg: lots.tareKg })
    .from(lots)
    .where(and(eq(lots.itemId, item.id), eq(lots.lotNumber, request.lot)))
    .limit(1);
  if (existing) {
    return {
      id: existing.id,
      number: request.lot,
      tareKg: existing.tareKg === null ? null : parseQuantity(existing.tareKg),
    };
  }
  if (request.type !== "receipt") {
    throw new DomainError(
      400,
      `No lot "${request.lot}" of this item. A new lot comes with a receipt.`,
      "lot",
    );
  }
  const [created] = await tx
    .insert(lots)
    .values({
      itemId: item.id,
      lotNumber: request.lot,
      supplierBatch: request.supplierBatch ?? null,
      spoolType: request.spoolType ?? null,
      tareKg:
        request.tareKg === undefined
          ? null
          : formatQuantityText(request.tareKg),
      receivedOn: todayUtc(),
      supplierId: origin?.supplierId ?? request.supplierId ?? null,
      purchaseOrderId: origin?.purchaseOrderId ?? null,
    })
    .$returningId();
  return {
    id: created!.id,
    number: request.lot,
    tareKg: request.tareKg ?? null,
    created: true,
  };
}

/**
 * The signed change at the movement's (first) location, in thousandths,
 * from the request and what the location holds now.
 */
function signedChange(
  request: MovementRequest,
  item: { kind: string },
  lot: { tareKg: bigint | null },
  balance: { onHand: bigint },
): bigint {
  switch (request.type) {
    case "receipt": {
      if (request.grossKg !== undefined) {
        if (item.kind !== "wire")
          throw new DomainError(
            400,
            "Gross and tare weights are for wire spools.",
            "grossKg",
          );
        const tare = request.tareKg ?? lot.tareKg;
        if (tare === null)
          throw new DomainError(
            400,
            "Give the spool's tare (empty spool) weight.",
            "tareKg",
          );
        const net = request.grossKg - tare;
        if (net <= 0n)
          throw new DomainError(
            400,
            "The gross weight must be more than the tare weight.",
            "grossKg",
          );
        if (request.quantity !== undefined && request.quantity !== net) {
          throw new DomainError(
            400,
            `Gross − tare is ${quantityToNumber(net)} kg, not ${quantityToNumber(request.quantity)} kg.`,
            "quantity",
          );
        }
        return net;
      }
      return request.quantity!;
    }
    case "issue": {
      if (request.grossKg !== undefined) {
        // Spool weigh-back: what left the spool is its previous net less its net now.
        if (lot.tareKg === null)
          throw new DomainError(
            400,
            "This lot has no tare weight: issue by quantity.",
            "grossKg",
          );
        const netNow = request.grossKg - lot.tareKg;
        if (netNow < 0n)
          throw new DomainError(
            400,
            "The gross weight is below the spool's tare weight.",
            "grossKg",
          );
        const taken = balance.onHand - netNow;
        if (taken <= 0n) {
          throw new DomainError(
            400,
            "The spool weighs as much as or more than its recorded net: nothing to issue.",
            "grossKg",
          );
        }
        return -taken;
      }
      return -request.quantity!;
    }
    case "scrap":
    case "transfer":
      return -request.quantity!;
    case "return":
      return request.quantity!;
    case "adjustment":
      return request.quantity!;
    case "count":
      return request.quantity! - balance.onHand;
  }
}

/** Records one movement (two rows for a transfer). Throws DomainError for the user's mistakes. */
export async function recordMovement(
  request: MovementRequest,
  userId: string,
  options: MovementOptions = {},
): Promise<RecordedMovement> {
  const recorded = await writeTransaction(
    (tx) => recordMovementIn(tx, request, userId, options),
    { label: "stock movement" },
  );
  // After the commit, in the same request: a drop below the reorder point opens an alert.
  if (options.checkAlerts !== false)
    await movementsCommitted([recorded.movement.sku]);
  return recorded;
}

/**
 * The same inside the caller's transaction, for a caller that locks its document (a
 * build order) first and changes the document's state in the same transaction. The
 * caller runs `movementsCommitted` after its commit.
 */
export async function recordMovementIn(
  tx: Transaction,
  request: MovementRequest,
  userId: string,
  options: MovementOptions = {},
): Promise<RecordedMovement> {
  if (options.held) await options.held.lockDocument(tx);
  const item = await lockItem(tx, request.sku);
  if (!item.active)
    throw new DomainError(
      409,
      `Item ${item.sku} is archived: restore it before moving stock.`,
      "sku",
    );
  if (request.unit && request.unit !== item.unit) {
    throw new DomainError(
      400,
      `Item ${item.sku} is stocked in ${item.unit}, not ${request.unit}.`,
      "unit",
    );
  }
  const quantities = [request.quantity, request.grossKg, request.tareKg].filter(
    (value) => value !== undefined,
  );
  if (
    item.unit === "pcs" &&
    quantities.some((value) => value! % 1000n !== 0n)
  ) {
    throw new DomainError(
      400,
      `Item ${item.sku} is counted in whole pieces.`,
      "quantity",
    );
  }
  const location = await findLocation(tx, request.location, "location");
  const toLocation =
    request.type === "transfer"
      ? await findLocation(tx, request.toLocation!, "toLocation")
      : null;
  if (toLocation && toLocation.id === location.id) {
    throw new DomainError(
      400,
      "A transfer needs two different locations.",
      "toLocation",
    );
  }
  const lot = await resolveLot(tx, item, request, options.origin);
  // A lot on hold (decision 039): nothing leaves it for use; receipts, counts, adjustments
  // and scrap still work, and keep the item's held stock right below.
  const holdReason = await lotHoldReason(tx, lot.id);
  if (
    holdReason !== null &&
    (request.type === "issue" || request.type === "transfer")
  )
    throw new DomainError(
      409,
      lotOnHoldMessage(lot.number!, holdReason),
      "lot",
    );

  // Lock balance rows in a fixed order (location id) so two transfers never wait on each other in a circle.
  const locationIds = toLocation
    ? [location.id, toLocation.id].sort((a, b) => a - b)
    : [location.id];
  const balances = new Map<number, { onHand: bigint; reserved: bigint }>();
  for (const id of locationIds)
    balances.set(id, await lockBalance(tx, item.id, lot.id, id));
  const from = balances.get(location.id)!;

  const change = signedChange(request, item, lot, from);
  const unit = item.unit;
  // An issue to a document (a build order) takes what it holds here: that much reserved stock goes with it.
  const held = options.held ?? null;
  if (held) {
    if (request.type !== "issue")
      throw new DomainError(
        400,
        `Only an issue takes stock reserved for a ${held.source.kind}.`,
        "type",
      );
    await held.lockHeld(tx, { item, lot, location, taken: -change });
  }
  const reservedTaken = held ? -change : 0n;
  if (from.onHand + change < 0n) {
    throw new DomainError(
      409,
      `Only ${amountText(from.onHand, unit)} of ${item.sku}${lot.number ? ` lot ${lot.number}` : ""} at ${location.code}; cannot take ${amountText(-change, unit)}.`,
      "quantity",
    );
  }
  if (
    change < 0n &&
    request.type !== "count" &&
    request.type !== "adjustment" &&
    from.onHand + change < from.reserved - reservedTaken
  ) {
    throw new DomainError(
      409,
      `${item.sku} at ${location.code}: ${amountText(from.reserved - reservedTaken, unit)} reserved for build orders, only ${amountText(from.onHand - from.reserved + reservedTaken, unit)} free.`,
      "quantity",
    );
  }

  const itemOnHand = parseQuantity(item.onHand);
  const averageCost = parseUnitCost(item.averageCost);
  const itemChange = request.type === "transfer" ? 0n : change;
  const itemOnHandAfter = itemOnHand + itemChange;
  const averageAfter =
    request.type === "receipt"
      ? movingAverageAfterReceipt({
          onHand: itemOnHand,
          averageCost,
          received: change,
          unitCost: request.unitCost!,
        })
      : averageCost;
  const now = options.at ?? new Date();
  const common = {
    itemId: item.id,
    lotId: lot.id,
    reference: request.reference ?? null,
    note: request.note ?? null,
    userId,
    createdAt: now,
    averageCostAfter: formatUnitCostText(averageAfter),
    itemOnHandAfter: formatQuantityText(itemOnHandAfter),
  };

  await setBalance(
    tx,
    item.id,
    lot.id,
    location.id,
    from.onHand + change,
    held ? from.reserved - reservedTaken : undefined,
  );
  const heldChange =
    holdReason === null
      ? 0n
      : heldChangeOf(from, {
          onHand: from.onHand + change,
          reserved: from.reserved - reservedTaken,
        });
  await addToItemHeld(tx, item.id, heldChange);
  const [inserted] = await tx
    .insert(stockMovements)
    .values({
      ...common,
      type: request.type,
      locationId: location.id,
      quantity: formatQuantityText(change),
      unitCost:
        request.type === "receipt"
          ? formatUnitCostText(request.unitCost!)
          : null,
      countedQuantity:
        request.type === "count" ? formatQuantityText(request.quantity!) : null,
      grossKg:
        request.grossKg === undefined
          ? null
          : formatQuantityText(request.grossKg),
    })
    .$returningId();
  const movementId = inserted!.id;
  if (lot.created)
    await tx
      .update(lots)
      .set({ receiptMovementId: movementId })
      .where(eq(lots.id, lot.id));
  if (toLocation) {
    const to = balances.get(toLocation.id)!;
    await setBalance(tx, item.id, lot.id, toLocation.id, to.onHand - change);
    await tx
      .update(stockMovements)
      .set({ transferId: movementId })
      .where(eq(stockMovements.id, movementId));
    await tx.insert(stockMovements).values({
      ...common,
      type: "transfer",
      locationId: toLocation.id,
      quantity: formatQuantityText(-change),
      transferId: movementId,
    });
  }
  const reserved = parseQuantity(item.reserved) - reservedTaken;
  await tx
    .update(items)
    .set({
      onHand: formatQuantityText(itemOnHandAfter),
      ...(held ? { reserved: formatQuantityText(reserved) } : {}),
      averageCost: formatUnitCostText(averageAfter),
      updatedAt: now,
    })
    .where(eq(items.id, item.id));
  if (held)
    await held.recordTaken(tx, {
      movementId,
      quantity: reservedTaken,
      unitCost: averageAfter,
    });

  return {
    movement: {
      id: movementId,
      type: request.type,
      sku: item.sku,
      lot: lot.number,
      location: location.code,
      toLocation: toLocation?.code ?? null,
      quantity: quantityToNumber(change),
      unit,
      createdAt: now.toISOString(),
    },
    balance: {
      onHand: quantityToNumber(itemOnHandAfter),
      reserved: quantityToNumber(reserved),
      available: quantityToNumber(
        itemOnHandAfter - reserved - parseQuantity(item.held) - heldChange,
      ),
    },
  };
}
