/** Reading the catalogue with its kept balances: lists (paged on the server) and one item. */
import { containsPattern } from "~/lib/list-filters";
import {
  and,
  asc,
  count,
  desc,
  eq,
  gt,
  like,
  sql,
  type SQL,
} from "drizzle-orm";
import { keptItemCount } from "./item-counts.server";
import { gramToWalk } from "./item-search-grams.server";
import {
  cappedTotal,
  searchCountLimit,
  shortestGramSearch,
} from "./search-grams";
import { compareOldestFirst } from "./stock-allocation";
import { db } from "~/db/client.server";
import {
  items,
  itemSearchGrams,
  locations,
  lots,
  stockBalances,
} from "~/db/schema";
import type { ItemKind } from "~/db/tables/stock-enums";
import {
  parseQuantity,
  parseUnitCost,
  quantityToNumber,
  valueOf,
} from "~/lib/decimal-amounts";

import type { itemSortKeys } from "./item-list-query";

export type ItemSortKey = (typeof itemSortKeys)[number];

export interface ItemListQuery {
  search?: string;
  kind?: ItemKind;
  belowReorder?: boolean;
  includeArchived?: boolean;
  sort?: ItemSortKey;
  descending?: boolean;
  page: number;
  pageSize: number;
}

/**
 * The conditions of a list query. Its values are placeholders (`kind`, `pattern`), filled
 * in by {@link listItems}: the statements of one shape of query are built once.
 */
function itemFilters(shape: ItemListShape): SQL | undefined {
  const conditions: SQL[] = [];
  if (!shape.includeArchived) conditions.push(eq(items.active, true));
  if (shape.kind) conditions.push(eq(items.kind, sql.placeholder("kind")));
  if (shape.belowReorder) conditions.push(eq(items.belowReorder, true));
  if (shape.search) {
    // search_text is SKU, name and size in lower case with a binary collation: one fast LIKE.
    conditions.push(like(items.searchText, sql.placeholder("pattern")));
  }
  return conditions.length > 0 ? and(...conditions) : undefined;
}

/** What decides a list query's SQL text (its values aside). */
interface ItemListShape {
  includeArchived: boolean;
  kind: boolean;
  belowReorder: boolean;
  search: boolean;
  sort: ItemSortKey;
  descending: boolean;
}

/** The columns an item summary (list row, API answer) is made from. */
const summaryColumns = {
  sku: items.sku,
  name: items.name,
  kind: items.kind,
  unit: items.unit,
  sizeOrGrade: items.sizeOrGrade,
  onHand: items.onHand,
  reserved: items.reserved,
  held: items.held,
  onOrder: items.onOrder,
  reorderPoint: items.reorderPoint,
  reorderQuantity: items.reorderQuantity,
  averageCost: items.averageCost,
  active: items.active,
};

const sortColumns: Record<ItemSortKey, SQL | typeof items.sku> = {
  sku: items.sku,
  name: sql`${items.name}`,
  kind: sql`${items.kind}`,
  onHand: sql`${items.onHand}`,
  available: sql`${items.available}`,
  value: sql`${items.stockValue}`,
};

/** How a list's total is read: exact, or (a search) counted up to a reach past the page. */
export interface ListItemsOptions {
  /** Count every match of a search (the CSV export, which says how many matched). */
  exactTotal?: boolean;
}

/**
 * One page of items and the number matching, for the stock list, its CSV export and the API.
 * The page is found on indexes first (ids only), then its rows are read: a deep page does
 * not drag thousands of skipped rows through the server (a "deferred join").
 *
 * A search of three characters or more walks the postings of its rarest gram
 * (item_search_grams, decision 057-trigram-search) in SKU order and checks the same LIKE on
 * each item, so it finds exactly the rows the LIKE finds; a shorter one, or a list sorted
 * by another column, reads the search index as before. A search counts its matches only up
 * to `searchCountReach` (search-grams.ts) past the page's first row: `totalExact` is false when the
 * count stopped there (more than `total` match), and always true without a search.
 */
export async function listItems(
  query: ItemListQuery,
  options: ListItemsOptions = {},
) {
  const search = query.search?.trim();
  const term = search ? search.toLowerCase() : undefined;
  const gram =
    term && Array.from(term).length >= shortestGramSearch
      ? await gramToWalk(term)
      : undefined;
  // A gram of the term that no item has: nothing can match.
  if (gram === null) return { total: 0, totalExact: true, items: [] };
  const statements = listStatements({
    includeArchived: !!query.includeArchived,
    kind: !!query.kind,
    belowReorder: !!query.belowReorder,
    search: !!term,
    sort: query.sort ?? "sku",
    descending: !!query.descending,
  });
  const offset = (query.page - 1) * query.pageSize;
  const values = {
    kind: query.kind,
    pattern: term ? containsPattern(term) : undefined,
    gram,
    countLimit: searchCountLimit(offset),
  };
  const { total, totalExact } = await listTotal(
    statements,
    values,
    offset,
    query,
    options,
  );
  const page =
    gram && statements.gramPage ? statements.gramPage : statements.page;
  const rows = await page.execute({
    ...values,
    limit: query.pageSize,
    offset,
  });
  return { total, totalExact, items: rows.map(itemSummary) };
}

/**
 * Without a search the total is read from the kept counts (a few rows, whatever the
 * catalogue's size; decision 050). A search counts its matches, on its gram's postings
 * when it has one, else on the search index; up to a reach past the page unless the caller
 * asks for every match.
 */
async function listTotal(
  statements: ReturnType<typeof buildListStatements>,
  values: { gram: string | undefined } & Record<string, unknown>,
  offset: number,
  filters: ItemListQuery,
  options: ListItemsOptions,
): Promise<{ total: number; totalExact: boolean }> {
  if (!statements.search)
    return { total: await keptItemCount(filters), totalExact: true };
  if (options.exactTotal) {
    const [row] = await statements.search.exactCount.execute(values);
    return { total: Number(row?.total ?? 0), totalExact: true };
  }
  const capped = values.gram
    ? statements.search.gramCount
    : statements.search.cappedCount;
  const [row] = await capped.execute(values);
  return cappedTotal(Number(row?.total ?? 0), offset);
}

/**
 * The statements of each shape of list query, built once (every stock list and items
 * API request would otherwise have Drizzle build the same SQL text again). At most
 * 2⁴ × 6 sorts × 2 directions = 192 shapes.
 */
const listStatementsByShape = new Map<
  string,
  ReturnType<typeof buildListStatements>
>();

function listStatements(shape: ItemListShape) {
  const key = JSON.stringify(shape);
  let statements = listStatementsByShape.get(key);
  if (!statements) {
    statements = buildListStatements(shape);
    listStatementsByShape.set(key, statements);
  }
  return statements;
}

function buildListStatements(shape: ItemListShape) {
  const where = itemFilters(shape);
  const sortColumn = sortColumns[shape.sort];
  // Ties break on the id in the same direction: every index ends with the id, so the
  // page is read in index order without sorting (the SKU is unique, so it needs no tie-break).
  const direction = shape.descending ? desc : asc;
  const order =
    shape.sort === "sku"
      ? [direction(items.sku)]
      : [direction(sortColumn), direction(items.id)];
  // A search reads the small covering search index from end to end (a substring LIKE uses no
  // index range); left to itself the optimizer walks the SKU order and reads every row.
  const hint = shape.search ? { forceIndex: "items_search_idx" } : undefined;
  const pageIds = db
    .select({ id: items.id })
    .from(items, hint)
    .where(where)
    .orderBy(...order)
    .limit(sql.placeholder("limit"))
    .offset(sql.placeholder("offset"))
    .as("page_ids");
  const page = db
    .select(summaryColumns)
    .from(items)
    .innerJoin(pageIds, eq(items.id, pageIds.id))
    .orderBy(...order)
    .prepare();
  const search = shape.search ? buildSearchStatements(shape, where) : undefined;
  return {
    page,
    search,
    gramPage: shape.sort === "sku" ? search?.gramPage : undefined,
  };
}

/**
 * A search's statements: its count on the search index (every match, or up to a limit), and
 * its count and SKU-ordered page on one gram's postings. The walk reads the gram's postings
 * in primary-key order (gram, sku), so the page needs no sort and stops when full; each
 * posting's item is read by its id and checked with the list's own filters, the LIKE among
 * them, so the rows are exactly those of the search index's statements.
 */
function buildSearchStatements(shape: ItemListShape, where: SQL | undefined) {
  const hint = { forceIndex: "items_search_idx" };
  const exactCount = db
    .select({ total: count() })
    .from(items, hint)
    .where(where)
    .prepare();
  const cappedMatches = db
    .select({ one: sql`1` })
    .from(items, hint)
    .where(where)
    .limit(sql.placeholder("countLimit"))
    .as("matches");
  const cappedCount = db
    .select({ total: count() })
    .from(cappedMatches)
    .prepare();
  const walked = and(
    eq(itemSearchGrams.gram, sql.placeholder("gram")),
    // The posting carries active, so archived items are skipped before their row is read.
    shape.includeArchived ? undefined : eq(itemSearchGrams.active, true),
    itemFilters({ ...shape, includeArchived: true }),
  );
  const gramMatches = db
    .select({ one: sql`1` })
    .from(itemSearchGrams, { forceIndex: "PRIMARY" })
    .innerJoin(items, eq(items.id, itemSearchGrams.itemId))
    .where(walked)
    .limit(sql.placeholder("countLimit"))
    .as("matches");
  const gramCount = db.select({ total: count() }).from(gramMatches).prepare();
  const gramPage = db
    .select(summaryColumns)
    .from(itemSearchGrams, { forceIndex: "PRIMARY" })
    .innerJoin(items, eq(items.id, itemSearchGrams.itemId))
    .where(walked)
    .orderBy(
      shape.descending ? desc(itemSearchGrams.sku) : asc(itemSearchGrams.sku),
    )
    .limit(sql.placeholder("limit"))
    .offset(sql.placeholder("offset"))
    .prepare();
  return { exactCount, cappedCount, gramCount, gramPage };
}

function itemSummary(row: {
  sku: string;
  name: string;
  kind: ItemKind;
  unit: string;
  sizeOrGrade: string;
  onHand: string;
  reserved: string;
  held: string;
  onOrder: string;
  reorderPoint: string;
  reorderQuantity: string;
  averageCost: string;
  active: boolean;
}) {
  const onHand = parseQuantity(row.onHand);
  const reserved = parseQuantity(row.reserved);
  // Lots on hold (decision 039): on hand, but neither reserved nor available.
  const held = parseQuantity(row.held);
  const available = onHand - reserved - held;
  const reorderPoint = parseQuantity(row.reorderPoint);
  const averageCost = parseUnitCost(row.averageCost);
  return {
    sku: row.sku,
    name: row.name,
    kind: row.kind,
    unit: row.unit,
    sizeOrGrade: row.sizeOrGrade,
    onHand: quantityToNumber(onHand),
    reserved: quantityToNumber(reserved),
    held: quantityToNumber(held),
    available: quantityToNumber(available),
    // Still to come on sent orders: the kept balance (items.on_order), never re-summed here.
    onOrder: quantityToNumber(parseQuantity(row.onOrder)),
    reorderPoint: quantityToNumber(reorderPoint),
    reorderQuantity: quantityToNumber(parseQuantity(row.reorderQuantity)),
    belowReorder: reorderPoint > 0n && available < reorderPoint,
    averageCost: Number(averageCost) / 10_000,
    value: Number(valueOf(onHand, averageCost)) / 10_000,
    active: row.active,
  };
}

/** One item with its balances by lot and location (oldest lot first), or null. */
export async function findItemBySku(sku: string) {
  const [row] = await db
    .select({ id: items.id, ...summaryColumns })
    .from(items)
    .where(eq(items.sku, sku))
    .limit(1);
  if (!row) return null;
  const balanceRows = await db
    .select({
      lotId: stockBalances.lotId,
      locationId: stockBalances.locationId,
      receivedOn: lots.receivedOn,
      lot: lots.lotNumber,
      tareKg: lots.tareKg,
      location: locations.code,
      locationName: locations.name,
      onHand: stockBalances.onHand,
      reserved: stockBalances.reserved,
      holdReason: lots.holdReason,
    })
    .from(stockBalances)
    .innerJoin(locations, eq(locations.id, stockBalances.locationId))
    .leftJoin(lots, eq(lots.id, stockBalances.lotId))
    .where(
      and(eq(stockBalances.itemId, row.id), gt(stockBalances.onHand, "0")),
    );
  // Oldest lot first, the order a reservation takes them in (and the build-order page lists them).
  const balances = balanceRows.sort(compareOldestFirst);
  return {
    id: row.id,
    ...itemSummary(row),
    balances: balances.map((balance) => ({
      lotId: balance.lotId,
      lot: balance.lot,
      location: balance.location,
      locationName: balance.locationName,
      tareKg: balance.tareKg === null ? null : Number(balance.tareKg),
      onHand: quantityToNumber(parseQuantity(balance.onHand)),
      reserved: quantityToNumber(parseQuantity(balance.reserved)),
      holdReason: balance.holdReason,
    })),
  };
}

/** The item as the API shows it: the database id stays inside. */
export function withoutId<T extends { id: number }>(item: T): Omit<T, "id"> {
  const visible: Partial<T> = { ...item };
  delete visible.id;
  return visible as Omit<T, "id">;
}

export async function listLocations() {
  return db
    .select({
      code: locations.code,
      name: locations.name,
      kind: locations.kind,
    })
    .from(locations)
    .where(eq(locations.active, true))
    .orderBy(asc(locations.code));
}
