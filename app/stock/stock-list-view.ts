import { readSearchLeniently, searchParamsObject } from "~/lib/search-params";
/**
 * The stock list's view (filters, sort, page) in the page's address, so a
 * link reproduces what someone sees. Reads a query string with the list
 * query schema the API uses, and writes the links for sort headers, pages
 * and the CSV export. Pure: no I/O.
 */
import { itemListQuerySchema, type ItemListParams } from "./item-list-query";
import type { ItemListQuery, ItemSortKey } from "./items.server";

export const stockListPageSize = 50;

export interface StockListView {
  search?: string;
  kind?: ItemListParams["kind"];
  belowReorder: boolean;
  archived: boolean;
  sort: ItemSortKey;
  order: "asc" | "desc";
  page: number;
}

/**
 * The view in a query string. Values the schema refuses (an unknown sort or
 * kind) are left out rather than failing the page; `ignored` names them so the
 * page can say so. A page that is no page ("x", "1e300") is corrected instead.
 */
export function readStockListView(searchParams: URLSearchParams): {
  view: StockListView;
  ignored: string[];
} {
  const values = searchParamsObject(searchParams);
  delete values.pageSize;
  const { query, errors } = readSearchLeniently(itemListQuerySchema, values);
  return { view: viewOf(query), ignored: Object.keys(errors) };
}

/** The view of query parameters the list query schema has checked. */
export function viewOf(params: ItemListParams): StockListView {
  return {
    search: params.search || undefined,
    kind: params.kind,
    belowReorder: params.belowReorder,
    archived: params.archived,
    sort: params.sort,
    order: params.order,
    page: params.page,
  };
}

/** The view as `listItems` takes it, one page of `pageSize` rows. */
export function itemListQueryOf(
  view: StockListView,
  pageSize = stockListPageSize,
): ItemListQuery {
  return {
    search: view.search,
    kind: view.kind,
    belowReorder: view.belowReorder,
    includeArchived: view.archived,
    sort: view.sort,
    descending: view.order === "desc",
    page: view.page,
    pageSize,
  };
}

/** "?kind=wire&sort=name" for the view with `changes`; defaults are left out. "" when all are defaults. */
export function stockListSearch(
  view: StockListView,
  changes: Partial<StockListView> = {},
): string {
  const next = { ...view, ...changes };
  const params = new URLSearchParams();
  if (next.search) params.set("search", next.search);
  if (next.kind) params.set("kind", next.kind);
  if (next.belowReorder) params.set("belowReorder", "1");
  if (next.archived) params.set("archived", "1");
  if (next.sort !== "sku") params.set("sort", next.sort);
  if (next.order !== "asc") params.set("order", next.order);
  if (next.page > 1) params.set("page", String(next.page));
  const text = params.toString();
  return text ? `?${text}` : "";
}

/** The link of a column header: the sorted column turns round, another one sorts ascending, from page 1. */
export function sortSearch(view: StockListView, column: ItemSortKey): string {
  const order = view.sort === column && view.order === "asc" ? "desc" : "asc";
  return stockListSearch(view, { sort: column, order, page: 1 });
}

/** The CSV export of the whole view: the same filters and sort, every page. */
export function exportSearch(view: StockListView): string {
  return stockListSearch(view, { page: 1 });
}
