/**
 * The query strings of the designs API: a page of designs, and a revision's costing
 * (motors, price basis, day). Pure, so the routes and the published contract
 * (app/api-contract) validate and describe the very same schemas.
 */
import { z } from "zod";
import {
  dayParam,
  pageParam,
  pageSizeParam,
  wholeNumberParam,
} from "~/lib/search-params";
import { maxBuildQuantity } from "./design-page";

/** The prices a costing is taken at: the best supplier price, or the moving average cost of stock. */
export const costingBases = ["best-price", "stock-average"] as const;
export type CostingBasis = (typeof costingBases)[number];

/** GET /api/v1/designs: the page and its size. */
export const designListQuerySchema = z.object({
  page: pageParam,
  perPage: pageSizeParam("perPage", 200, 50),
});

/** GET …/revisions/:revision/costing: motors to cost, the price basis, the day prices are taken on. */
export const designCostingQuerySchema = z.object({
  quantity: wholeNumberParam("quantity", {
    min: 1,
    max: maxBuildQuantity,
    message: "The quantity is a whole number of motors from 1 to 1,000,000.",
  }).default(1),
  basis: z
    .enum(costingBases, {
      error: "The basis is best-price or stock-average.",
    })
    .default("best-price"),
  date: dayParam(
    "date",
    "The date is YYYY-MM-DD, a day on the calendar.",
  ).optional(),
});
