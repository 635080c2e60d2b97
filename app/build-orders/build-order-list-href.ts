/** The build-order list's links, without Zod (decision 051): a page's links do not load it. Pure. */
import { listHref } from "~/lib/list-address";
import type { BuildOrderListFilter } from "./build-order-list-address";

/** "/build-orders?search=stator&status=reserved&page=2", leaving out what is the default (all, page 1). */
export function buildOrderListHref(
  filter: BuildOrderListFilter,
  page = 1,
): string {
  return listHref("/build-orders", { ...filter, page });
}
