/**
 * GET /api/v1/items/:sku/prices: the quantity to price (1 when not given), the day
 * (today when not given) and whether to add a year's price history. Pure.
 */
import { z } from "zod";
import { dayParam, positiveDecimalParam } from "~/lib/search-params";
import { maxStockQuantity } from "~/stock/movement-request";

export const itemPricesQuerySchema = z.object({
  quantity: positiveDecimalParam("quantity", {
    max: maxStockQuantity,
    decimals: 3,
  })
    .default(1)
    .meta({ description: "The quantity to price, in the item's unit." }),
  date: dayParam("date", "date must be YYYY-MM-DD.").optional().meta({
    description: "The day to price, YYYY-MM-DD; today when not given.",
  }),
  history: z
    .enum(["1", "0"], { error: "history must be 1 or 0." })
    .optional()
    .transform((value) => value === "1")
    .meta({ description: "1 adds the year's price history." }),
});
