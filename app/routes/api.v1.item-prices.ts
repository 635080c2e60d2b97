import type { Route } from "./+types/api.v1.item-prices";
import { requireUser } from "~/auth/guard.server";
import { apiError } from "~/lib/api.server";
import { itemPrices } from "~/purchasing/item-prices.server";
import { quantityFromNumber } from "~/stock/decimal-amounts";

/**
 * GET /api/v1/items/:sku/prices?quantity=&date= → the prices of every supplier for that quantity,
 * cheapest first in the company currency, each with its currency, rate, metal base and source line;
 * offers that cannot be priced (no rate, no base, below the smallest break) listed with the reason.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const search = new URL(request.url).searchParams;
  const quantityText = search.get("quantity") ?? "1";
  const quantity = Number(quantityText);
  const scaled =
    Number.isFinite(quantity) && quantity > 0
      ? quantityFromNumber(quantity)
      : null;
  if (scaled === null) {
    const message =
      "quantity must be a number above 0 with at most 3 decimals.";
    return apiError(400, message, { quantity: [message] });
  }
  const date = search.get("date") ?? new Date().toISOString().slice(0, 10);
  if (
    !/^\d{4}-\d{2}-\d{2}$/.test(date) ||
    Number.isNaN(Date.parse(`${date}T00:00:00Z`))
  ) {
    return apiError(400, "date must be YYYY-MM-DD.", {
      date: ["date must be YYYY-MM-DD."],
    });
  }
  const prices = await itemPrices(params.sku, scaled, date);
  if (!prices) return apiError(404, `No item with SKU "${params.sku}".`);
  return Response.json(prices);
}
