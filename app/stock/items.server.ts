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
import { compareOldestFirst } from "./stock-allocation";
import { db } from "~/db/client.server";
import { items, locations, lots, stockBalances } from "~/db/schema";
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

/**
 * One page of items and the number matching, for the stock list, its CSV export and the API.
 * The page is found on indexes first (ids only), then its rows are read: a deep page does
 * not drag thousands of skipped rows through the server (a "deferred join").
 */
export async function listItems(query: ItemListQuery) {
  const search = query.search?.trim();
  const statements = listStatements({
    includeArchived: !!query.includeArchived,
    kind: !!query.kind,
    belowReorder: !!query.belowReorder,
    search: !!search,
    sort: query.sort ?? "sku",
    descending: !!query.descending,
  });
  const values = {
    kind: query.kind,
    pattern: search ? containsPattern(search.toLowerCase()) : undefined,
  };
  // Without a search the total is read from the kept counts (a few rows, whatever the
  // catalogue's size; decision 050); a search counts its matches on the search index.
  const total = statements.searchTotal
    ? ((await statements.searchTotal.execute(values))[0]?.total ?? 0)
    : await keptItemCount(query);
  const rows = await statements.page.execute({
    ...values,
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { total, items: rows.map(itemSummary) };
}

/**
 * The two statements of each shape of list query, built once (every stock list and items
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
  const searchTotal = shape.search
    ? db.select({ total: count() }).from(items, hint).where(where).prepare()
    : undefined;
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
  return { searchTotal, page };
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
