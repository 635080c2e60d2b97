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
  const [row] = await countStatement(
    !filters.includeArchived,
    !!filters.kind,
    !!filters.belowReorder,
  ).execute({ kind: filters.kind });
  return Number(row?.total ?? 0);
}

/**
 * The count's statement for each shape of filters (2³ shapes), built once: the stock
 * list and the items API read the total on every request.
 */
const countStatements = new Map<string, ReturnType<typeof buildCount>>();

function countStatement(
  activeOnly: boolean,
  byKind: boolean,
  belowReorder: boolean,
) {
  const key = `${activeOnly}/${byKind}/${belowReorder}`;
  let statement = countStatements.get(key);
  if (!statement) {
    statement = buildCount(activeOnly, byKind, belowReorder);
    countStatements.set(key, statement);
  }
  return statement;
}

function buildCount(
  activeOnly: boolean,
  byKind: boolean,
  belowReorder: boolean,
) {
  const conditions: SQL[] = [];
  if (activeOnly) conditions.push(eq(itemCounts.active, true));
  if (byKind) conditions.push(eq(itemCounts.kind, sql.placeholder("kind")));
  if (belowReorder) conditions.push(eq(itemCounts.belowReorder, true));
  return db
    .select({ total: sql<string | null>`SUM(${itemCounts.items})` })
    .from(itemCounts)
    .where(conditions.length > 0 ? and(...conditions) : undefined)
    .prepare();
}
