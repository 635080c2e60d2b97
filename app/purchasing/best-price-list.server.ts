/**
 * The best-prices list: catalogue items that some supplier quotes, a page at a time, each
 * with its cheapest offer for a quantity (the one asked for, else each item's own
 * `quantityToPrice`, the rule its page and its low-stock e-mail use).
 */
import { containsPattern } from "~/lib/list-filters";
import { and, asc, count, eq, exists, like, sql, type SQL } from "drizzle-orm";
import { quantityToPrice } from "~/stock/reorder-quantities";
import { db } from "~/db/client.server";
import { items, priceLines } from "~/db/schema";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import { todayUtc } from "~/lib/calendar-days";
import { bestPricesOf, loadItemsPricing } from "./item-prices.server";

export const bestPriceListPageSize = 25;

export interface BestPriceListQuery {
  search: string;
  /** Thousandths of each item's unit; null for each item's own quantity. */
  quantity: bigint | null;
  page: number;
}

function listFilters(search: string): SQL {
  // Items with a price line: the EXISTS reads price_lines_item_idx (item_id first).
  const conditions: SQL[] = [
    eq(items.active, true),
    exists(
      db
        .select({ one: sql`1` })
        .from(priceLines)
        .where(eq(priceLines.itemId, items.id)),
    ),
  ];
  const text = search.trim();
  if (text) {
    // search_text is SKU, name and size in lower case (the stock list's search).
    conditions.push(
      like(items.searchText, containsPattern(text.toLowerCase())),
    );
  }
  return and(...conditions)!;
}

/** One page of quoted items with their best offer; `total` counts every matching item. */
export async function listBestPrices(query: BestPriceListQuery) {
  const where = listFilters(query.search);
  const [[counted], rows] = await Promise.all([
    db.select({ total: count() }).from(items).where(where),
    db
      .select({
        sku: items.sku,
        name: items.name,
        unit: items.unit,
        sizeOrGrade: items.sizeOrGrade,
        onHand: items.onHand,
        reserved: items.reserved,
        held: items.held,
        reorderPoint: items.reorderPoint,
        reorderQuantity: items.reorderQuantity,
      })
      .from(items)
      .where(where)
      .orderBy(asc(items.sku))
      .limit(bestPriceListPageSize)
      .offset((query.page - 1) * bestPriceListPageSize),
  ]);
  const pricing = await loadItemsPricing(rows.map((row) => row.sku));
  const today = todayUtc();
  return {
    total: counted?.total ?? 0,
    date: today,
    rows: rows.flatMap((row) => {
      const itemPricing = pricing.get(row.sku);
      if (!itemPricing) return [];
      const quantity =
        query.quantity ??
        quantityToPrice({
          available:
            parseQuantity(row.onHand) -
            parseQuantity(row.reserved) -
            parseQuantity(row.held),
          reorderPoint: parseQuantity(row.reorderPoint),
          reorderQuantity: parseQuantity(row.reorderQuantity),
        });
      const prices = bestPricesOf(itemPricing, quantity, today);
      return [
        {
          sku: row.sku,
          name: row.name,
          sizeOrGrade: row.sizeOrGrade,
          unit: row.unit,
          quantity: quantityToNumber(quantity),
          companyCurrency: prices.companyCurrency,
          best: prices.prices[0] ?? null,
          otherOffers: Math.max(0, prices.prices.length - 1),
          cannotPrice: prices.cannotPrice,
        },
      ];
    }),
  };
}
