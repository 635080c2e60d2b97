/** The build-order list's address: the search and status it is filtered by and the page. Pure. */
import { z } from "zod";
import { buildOrderStatuses } from "~/db/tables/build-order-enums";
import { searchTextParam } from "~/lib/list-filters";
import { pageParam, pageSizeParam } from "~/lib/search-params";
import type { BuildOrderStatus } from "./build-order-status";

// The list's links, without Zod (a page's links do not load it).
export { buildOrderListHref } from "./build-order-list-href";

/** The list's filters (page, API and CSV export share them). */
export const buildOrderListFilterSchema = z.object({
  /** An order's reference ("BO-12", "12") or part of its design's name. */
  search: searchTextParam,
  status: z
    .enum(buildOrderStatuses, {
      error: `status must be one of ${buildOrderStatuses.join(", ")}.`,
    })
    .optional(),
});

export type BuildOrderListFilter = z.output<typeof buildOrderListFilterSchema>;

/** GET /api/v1/build-orders: the filters and the page (at most 200 a page, 50 when not given). */
export const buildOrderListQuerySchema = buildOrderListFilterSchema.extend({
  page: pageParam,
  pageSize: pageSizeParam("pageSize", 200, 50),
});

/** The status a `?status=` value names, or undefined for any other text. */
export function buildOrderStatusFrom(
  value: string | null,
): BuildOrderStatus | undefined {
  return (buildOrderStatuses as readonly string[]).includes(value ?? "")
    ? (value as BuildOrderStatus)
    : undefined;
}
