/**
 * A location's count sheet, outside any stocktake: every item and lot booked there now
 * (each balance with stock on hand), in the blind sheet's shape: what and which lot,
 * never how much. Lots on hold are on it too: they are on the shelf and are counted.
 */
import { and, asc, eq, ne } from "drizzle-orm";
import { db } from "~/db/client.server";
import { items, locations, lots, stockBalances } from "~/db/schema";
import type { BlindLineRow } from "./count-sheet";

/** The location's lines (none when it is empty or unknown), by SKU and lot number. */
export async function listLocationBlindLines(
  code: string,
): Promise<BlindLineRow[]> {
  const rows = await db
    .select({
      location: locations.code,
      locationName: locations.name,
      sku: items.sku,
      name: items.name,
      kind: items.kind,
      unit: items.unit,
      lot: lots.lotNumber,
      lotTareKg: lots.tareKg,
    })
    .from(stockBalances)
    // The balances of one location: balances_location_idx (location_id, item_id).
    .innerJoin(locations, eq(locations.id, stockBalances.locationId))
    .innerJoin(items, eq(items.id, stockBalances.itemId))
    .leftJoin(lots, eq(lots.id, stockBalances.lotId))
    .where(and(eq(locations.code, code), ne(stockBalances.onHand, "0")))
    .orderBy(asc(items.sku), asc(lots.lotNumber));
  return rows.map((row, index) => ({
    ...row,
    id: index + 1,
    lot: row.lot ?? null,
    lotTareKg: row.lotTareKg ?? null,
    counted: null,
    grossKg: null,
    tareKg: null,
    recountRequested: false,
    addedDuringCount: false,
  }));
}
