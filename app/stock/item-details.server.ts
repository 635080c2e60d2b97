/** What the item page shows beyond the list row: kind-specific attributes and the movement history's size and shape. */
import { count, desc, eq } from "drizzle-orm";
import { db } from "~/db/client.server";
import { magnetItems, stockMovements, wireItems } from "~/db/schema";
import type { ItemKind } from "~/db/tables/stock-enums";
import { findMagnetGradeByName } from "~/reference/magnet-grades.server";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";

/** The wire or magnet attributes of an item; null for other parts. */
export async function findItemAttributes(itemId: number, kind: ItemKind) {
  if (kind === "wire") {
    const [wire] = await db
      .select({
        conductor: wireItems.conductor,
        standard: wireItems.standard,
        sizeLabel: wireItems.sizeLabel,
        insulation: wireItems.insulation,
        thermalClass: wireItems.thermalClass,
        enamel: wireItems.enamel,
      })
      .from(wireItems)
      .where(eq(wireItems.itemId, itemId))
      .limit(1);
    return wire ? { kind: "wire" as const, ...wire } : null;
  }
  if (kind === "magnet") {
    const [magnet] = await db
      .select({
        gradeKey: magnetItems.gradeKey,
        shape: magnetItems.shape,
        dimensionsMm: magnetItems.dimensionsMm,
        coating: magnetItems.coating,
        magnetisation: magnetItems.magnetisation,
      })
      .from(magnetItems)
      .where(eq(magnetItems.itemId, itemId))
      .limit(1);
    if (!magnet) return null;
    return {
      kind: "magnet" as const,
      ...magnet,
      grade: await findMagnetGradeByName(magnet.gradeKey),
    };
  }
  return null;
}

/** How many movements an item has (uses the item × time index). */
export async function countItemMovements(itemId: number): Promise<number> {
  const [counted] = await db
    .select({ total: count() })
    .from(stockMovements)
    .where(eq(stockMovements.itemId, itemId));
  return counted?.total ?? 0;
}

/** The item's on hand after each of its latest `limit` movements, oldest first, for the chart. */
export async function listOnHandHistory(itemId: number, limit = 200) {
  const rows = await db
    .select({
      at: stockMovements.createdAt,
      onHand: stockMovements.itemOnHandAfter,
    })
    .from(stockMovements)
    .where(eq(stockMovements.itemId, itemId))
    .orderBy(desc(stockMovements.createdAt), desc(stockMovements.id))
    .limit(limit);
  return rows.reverse().map((row) => ({
    at: row.at.toISOString(),
    onHand: quantityToNumber(parseQuantity(row.onHand)),
  }));
}
