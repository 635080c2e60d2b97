/** Reading the stock list's filters, sort and page from a query string (page and API share it). */
import { z } from "zod";
import { itemKinds } from "~/db/tables/stock-enums";
import { pageParam, pageSizeParam } from "~/lib/search-params";

export const itemSortKeys = [
  "sku",
  "name",
  "kind",
  "onHand",
  "available",
  "value",
] as const;

export const itemListQuerySchema = z.object({
  search: z
    .string()
    .trim()
    .max(80, "Search for at most 80 characters.")
    .optional(),
  kind: z
    .enum(itemKinds, { error: `kind must be one of ${itemKinds.join(", ")}.` })
    .optional(),
  belowReorder: z
    .enum(["1", "0"])
    .optional()
    .transform((value) => value === "1"),
  archived: z
    .enum(["1", "0"])
    .optional()
    .transform((value) => value === "1"),
  sort: z
    .enum(itemSortKeys, {
      error: `sort must be one of ${itemSortKeys.join(", ")}.`,
    })
    .default("sku"),
  order: z
    .enum(["asc", "desc"], { error: "order must be asc or desc." })
    .default("asc"),
  page: pageParam,
  pageSize: pageSizeParam("pageSize", 500, 50),
});

export type ItemListParams = z.output<typeof itemListQuerySchema>;
