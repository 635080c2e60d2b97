/**
 * The quantity a buyer asks prices for, read from the address (`?quantity=2.5`) by the
 * item page and the best-prices list. Blank: each item's own quantity (`quantityToPrice`).
 * Pure: no framework, no I/O.
 */
import { z } from "zod";
import { quantityFromNumber } from "~/lib/decimal-amounts";
import { maxStockQuantity } from "~/stock/movement-request";
import {
  pageParam,
  positiveDecimalParam,
  readSearchLeniently,
  searchParamsObject,
} from "~/lib/search-params";

const quantityParam = positiveDecimalParam("quantity", {
  max: maxStockQuantity,
  decimals: 3,
}).optional();

export const itemPriceQuerySchema = z.object({ quantity: quantityParam });

export const bestPriceListQuerySchema = z.object({
  search: z
    .string()
    .trim()
    .max(80, "Search for at most 80 characters.")
    .optional(),
  quantity: quantityParam,
  page: pageParam,
});

export interface PriceQuantityRead {
  /** Thousandths of the item's unit; null for each item's own quantity. */
  quantity: bigint | null;
  /** What the field shows: the quantity as typed, or blank when none was taken. */
  text: string;
  /** Why a typed quantity was not used. */
  error?: string;
}

function quantityRead(
  quantity: number | undefined,
  errors: Record<string, string[]>,
): PriceQuantityRead {
  const error = errors.quantity?.[0];
  if (quantity === undefined) return { quantity: null, text: "", error };
  return {
    quantity: quantityFromNumber(quantity),
    text: String(quantity),
    error,
  };
}

/** The item page's `?quantity=`: a bad value is set aside with its message, never a 400. */
export function readItemPriceQuantity(
  params: URLSearchParams,
): PriceQuantityRead {
  const { query, errors } = readSearchLeniently(
    itemPriceQuerySchema,
    searchParamsObject(params),
  );
  return quantityRead(query.quantity, errors);
}

/** The best-prices list's search, quantity and page, read the same lenient way. */
export function readBestPriceListQuery(params: URLSearchParams) {
  const { query, errors } = readSearchLeniently(
    bestPriceListQuerySchema,
    searchParamsObject(params),
  );
  return {
    search: query.search ?? "",
    page: query.page,
    ...quantityRead(query.quantity, errors),
  };
}
