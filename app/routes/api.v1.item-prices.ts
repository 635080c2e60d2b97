import type { Route } from "./+types/api.v1.item-prices";
import { requireUser } from "~/auth/guard.server";
import { apiError, methodNotAllowed, readSearchParams } from "~/lib/api.server";
import {
  bestPricesOf,
  loadItemPricing,
  priceHistoryOf,
} from "~/purchasing/item-prices.server";
import { quantityFromNumber } from "~/lib/decimal-amounts";
import { todayUtc } from "~/lib/calendar-days";
import { itemPricesQuerySchema } from "~/purchasing/item-prices-query";

/**
 * GET /api/v1/items/:sku/prices?quantity=&date=&history=1 → the prices of every supplier for
 * that quantity on that day (default today), cheapest first in the company currency, each
 * with its currency, rate, metal base and source line; offers that cannot be priced (no
 * rate, no base, below the smallest break) listed with the reason. With history=1 also
 * `history`: the unit price of that quantity over the 365 days up to the day, one series
 * per offer, each point standing until the next (`unitPrice: null`: no price, with reasons).
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const query = readSearchParams(request, itemPricesQuerySchema);
  const quantity = quantityFromNumber(query.quantity)!;
  const date = query.date ?? todayUtc();
  const pricing = await loadItemPricing(params.sku);
  if (!pricing) return apiError(404, `No item with SKU "${params.sku}".`);
  return Response.json({
    ...bestPricesOf(pricing, quantity, date),
    ...(query.history
      ? { history: priceHistoryOf(pricing, quantity, date) }
      : {}),
  });
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
