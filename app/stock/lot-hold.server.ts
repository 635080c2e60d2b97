/**
 * The ledger's side of lot holds (decision 039): whether a lot is on hold, and keeping
 * `items.held` right when a held lot's balances change. Every writer of a balance calls
 * these inside its own transaction, with the item row already locked (a hold and its
 * release lock the item first too, so the answer cannot change under them).
 */
import { and, eq, inArray, isNotNull, sql } from "drizzle-orm";
import type { Transaction } from "~/db/client.server";
import { items, lots } from "~/db/schema";
import { formatQuantityText } from "~/lib/decimal-amounts";

/** Why the lot is on hold, or null when it is free (lot 0, stock not kept in lots, is never held). */
export async function lotHoldReason(
  tx: Transaction,
  lotId: number,
): Promise<string | null> {
  if (lotId === 0) return null;
  const [row] = await tx
    .select({ holdReason: lots.holdReason })
    .from(lots)
    .where(eq(lots.id, lotId))
    .limit(1)
    // Locked: a plain read could see the transaction's older snapshot and miss a hold or
    // release committed since, and items.held would then drift.
    .for("update");
  return row?.holdReason ?? null;
}

/** The held lots among `lotIds`, with their numbers and reasons. */
export async function heldLotsAmong(
  tx: Transaction,
  lotIds: readonly number[],
): Promise<Map<number, { number: string; reason: string }>> {
  const ids = [...new Set(lotIds)].filter((id) => id !== 0);
  if (ids.length === 0) return new Map();
  const rows = await tx
    .select({
      id: lots.id,
      number: lots.lotNumber,
      reason: lots.holdReason,
    })
    .from(lots)
    .where(and(inArray(lots.id, ids), isNotNull(lots.holdReason)))
    .for("update");
  return new Map(
    rows.map((row) => [row.id, { number: row.number, reason: row.reason! }]),
  );
}

/** Adds `change` (thousandths, signed) to the item's held stock. Call with the item row locked. */
export async function addToItemHeld(
  tx: Transaction,
  itemId: number,
  change: bigint,
): Promise<void> {
  if (change === 0n) return;
  await tx
    .update(items)
    .set({ held: sql`${items.held} + ${formatQuantityText(change)}` })
    .where(eq(items.id, itemId));
}
