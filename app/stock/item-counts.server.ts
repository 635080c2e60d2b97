/**
 * The number of items by active, kind and below-reorder, kept by triggers on items
 * (item_counts, decision 050-kept-item-counts): the stock list's total without counting
 * the catalogue. A handful of rows, whatever the catalogue's size.
 */
import { and, eq, sql, type SQL } from "drizzle-orm";
import { db } from "~/db/client.server";
import { itemCounts } from "~/db/schema";
import type { ItemKind } from "~/db/tables/stock-enums";

export interface CountedItemFilters {
  kind?: ItemKind;
  belowReorder?: boolean;
  includeArchived?: boolean;
}

/** How many items the list's filters (all but a search) match, read from the kept counts. */
export async function keptItemCount(
  filters: CountedItemFilters,
): Promise<number> {
  const conditions: SQL[] = [];
  if (!filters.includeArchived) conditions.push(eq(itemCounts.active, true));
  if (filters.kind) conditions.push(eq(itemCounts.kind, filters.kind));
  if (filters.belowReorder) conditions.push(eq(itemCounts.belowReorder, true));
  const [row] = await db
    .select({ total: sql<string | null>`SUM(${itemCounts.items})` })
    .from(itemCounts)
    .where(conditions.length > 0 ? and(...conditions) : undefined);
  return Number(row?.total ?? 0);
}
