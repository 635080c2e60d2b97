/**
 * Where an item is usually put away: the receipt form's first choice of location.
 *
 * The catalogue keeps no default location per item, so "usual" is read from the ledger:
 * 1. the location that holds most of the item now (all its lots together; ties by code),
 * 2. else, when none is on hand, the location its latest receipt went to,
 * 3. else null (never received): the form starts at the first location, as before.
 * Only active locations count, since the form offers no others.
 */
import { and, desc, eq, gt, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { locations, stockBalances, stockMovements } from "~/db/schema";

export async function usualLocationOf(itemId: number): Promise<string | null> {
  const onHand = sql`SUM(${stockBalances.onHand})`;
  const [mostHeld] = await db
    .select({ code: locations.code })
    .from(stockBalances)
    .innerJoin(locations, eq(locations.id, stockBalances.locationId))
    .where(
      and(
        eq(stockBalances.itemId, itemId),
        gt(stockBalances.onHand, "0"),
        eq(locations.active, true),
      ),
    )
    .groupBy(locations.id, locations.code)
    .orderBy(desc(onHand), locations.code)
    .limit(1);
  if (mostHeld) return mostHeld.code;
  const [lastReceipt] = await db
    .select({ code: locations.code })
    .from(stockMovements)
    .innerJoin(locations, eq(locations.id, stockMovements.locationId))
    .where(
      and(
        eq(stockMovements.itemId, itemId),
        eq(stockMovements.type, "receipt"),
        eq(locations.active, true),
      ),
    )
    .orderBy(desc(stockMovements.createdAt), desc(stockMovements.id))
    .limit(1);
  return lastReceipt?.code ?? null;
}
