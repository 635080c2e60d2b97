/**
 * Where the demo's older spools came from. The demo store is received before the
 * suppliers exist (seed order: stock, then purchasing), so its wire lots are given their
 * supplier here, once the suppliers are made: Quillan and Fenwright in turn, as the
 * workshop bought from both. Later receipts name their supplier themselves.
 */
import { and, eq, inArray, isNull } from "drizzle-orm";
import { db } from "~/db/client.server";
import { items, lots } from "~/db/schema";

export async function attachDemoLotSuppliers(supplierIds: readonly number[]) {
  const wireLots = await db
    .select({ id: lots.id })
    .from(lots)
    .innerJoin(items, eq(items.id, lots.itemId))
    .where(and(eq(items.kind, "wire"), isNull(lots.supplierId)))
    .orderBy(lots.id);
  for (const [index, supplierId] of supplierIds.entries()) {
    const ids = wireLots
      .filter((_, position) => position % supplierIds.length === index)
      .map((lot) => lot.id);
    if (ids.length > 0)
      await db.update(lots).set({ supplierId }).where(inArray(lots.id, ids));
  }
}
