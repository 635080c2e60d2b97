/**
 * Putting a lot on hold (quality block) and releasing it (decision 039). Each is one short
 * write transaction that locks in the ledger's order: the item row, then the lot, then the
 * lot's balance rows. A hold adds the free part of the lot's balances (on hand − reserved)
 * to `items.held`; a release takes it off again. The history is kept in `lot_hold_events`.
 * After the commit the ledger's after-commit work runs (a hold can take an item below its
 * reorder point and open a low-stock alert; a release can close it).
 */
import { and, eq } from "drizzle-orm";
import { db, type Transaction } from "~/db/client.server";
import { items, lotHoldEvents, lots, stockBalances, users } from "~/db/schema";
import { writeTransaction } from "~/db/write-transaction.server";
import { parseQuantity } from "~/lib/decimal-amounts";
import { DomainError } from "~/lib/domain-error";
import { heldPartOf } from "~/stock/lot-hold";
import { addToItemHeld } from "~/stock/lot-hold.server";
import { movementsCommitted } from "~/stock/stock-movements.server";

/** A lot as the hold and release answers show it. */
export interface LotHoldView {
  id: number;
  number: string;
  sku: string;
  held: boolean;
  holdReason: string | null;
  heldAt: string | null;
  /** The name of who put it on hold. */
  heldBy: string | null;
}

/** The lot with its hold, or null. */
export async function findLotHold(
  lotId: number,
  tx: Pick<Transaction, "select"> = db,
): Promise<LotHoldView | null> {
  const [row] = await tx
    .select({
      id: lots.id,
      number: lots.lotNumber,
      sku: items.sku,
      holdReason: lots.holdReason,
      heldAt: lots.heldAt,
      heldBy: users.name,
    })
    .from(lots)
    .innerJoin(items, eq(items.id, lots.itemId))
    .leftJoin(users, eq(users.id, lots.heldBy))
    .where(eq(lots.id, lotId))
    .limit(1);
  if (!row) return null;
  return {
    id: row.id,
    number: row.number,
    sku: row.sku,
    held: row.holdReason !== null,
    holdReason: row.holdReason,
    heldAt: row.heldAt?.toISOString() ?? null,
    heldBy: row.holdReason === null ? null : (row.heldBy ?? null),
  };
}

/** Locks the lot's item, then the lot; 404 when there is no such lot. */
async function lockLot(tx: Transaction, lotId: number) {
  const [found] = await tx
    .select({ itemId: lots.itemId })
    .from(lots)
    .where(eq(lots.id, lotId))
    .limit(1);
  if (!found) throw new DomainError(404, `No lot with id ${lotId}.`);
  await tx
    .select({ id: items.id })
    .from(items)
    .where(eq(items.id, found.itemId))
    .for("update");
  const [lot] = await tx
    .select({
      id: lots.id,
      itemId: lots.itemId,
      number: lots.lotNumber,
      holdReason: lots.holdReason,
    })
    .from(lots)
    .where(eq(lots.id, lotId))
    .for("update");
  return lot!;
}

/** Locks the lot's balance rows and returns what a hold keeps from use on them. */
async function lockHeldPart(tx: Transaction, itemId: number, lotId: number) {
  const balances = await tx
    .select({ onHand: stockBalances.onHand, reserved: stockBalances.reserved })
    .from(stockBalances)
    .where(
      and(eq(stockBalances.itemId, itemId), eq(stockBalances.lotId, lotId)),
    )
    .orderBy(stockBalances.locationId)
    .for("update");
  return balances.reduce(
    (sum, balance) =>
      sum +
      heldPartOf({
        onHand: parseQuantity(balance.onHand),
        reserved: parseQuantity(balance.reserved),
      }),
    0n,
  );
}

/** Puts the lot on hold with its reason; 409 when it is on hold already. */
export async function holdLot(
  lotId: number,
  reason: string,
  userId: string,
): Promise<LotHoldView> {
  const view = await writeTransaction(
    async (tx) => {
      const lot = await lockLot(tx, lotId);
      if (lot.holdReason !== null)
        throw new DomainError(
          409,
          `Lot ${lot.number} is already on hold: ${lot.holdReason}`,
        );
      const part = await lockHeldPart(tx, lot.itemId, lot.id);
      const now = new Date();
      await tx
        .update(lots)
        .set({ holdReason: reason, heldAt: now, heldBy: userId })
        .where(eq(lots.id, lot.id));
      await tx.insert(lotHoldEvents).values({
        lotId: lot.id,
        action: "hold",
        reason,
        userId,
        createdAt: now,
      });
      await addToItemHeld(tx, lot.itemId, part);
      return (await findLotHold(lot.id, tx))!;
    },
    { label: "lot hold" },
  );
  await movementsCommitted([view.sku]);
  return view;
}

/** Releases the lot from its hold, with an optional note; 409 when it is not on hold. */
export async function releaseLot(
  lotId: number,
  reason: string | undefined,
  userId: string,
): Promise<LotHoldView> {
  const view = await writeTransaction(
    async (tx) => {
      const lot = await lockLot(tx, lotId);
      if (lot.holdReason === null)
        throw new DomainError(409, `Lot ${lot.number} is not on hold.`);
      const part = await lockHeldPart(tx, lot.itemId, lot.id);
      await tx
        .update(lots)
        .set({ holdReason: null, heldAt: null, heldBy: null })
        .where(eq(lots.id, lot.id));
      await tx.insert(lotHoldEvents).values({
        lotId: lot.id,
        action: "release",
        reason: reason ?? "",
        userId,
        createdAt: new Date(),
      });
      await addToItemHeld(tx, lot.itemId, -part);
      return (await findLotHold(lot.id, tx))!;
    },
    { label: "lot release" },
  );
  await movementsCommitted([view.sku]);
  return view;
}
