/** The buying plan's address: ?weeks=8 (1–26, 8 when not given). Pure. */
import { z } from "zod";
import { wholeNumberParam } from "~/lib/search-params";
import { planHorizon } from "./plan-weeks";

export const buyingPlanQuerySchema = z.object({
  weeks: wholeNumberParam("weeks", {
    min: planHorizon.min,
    max: planHorizon.max,
  }).default(planHorizon.default),
});

/** The "Make draft orders" form: the horizon shown and the suggestions ticked. */
export const draftOrdersFormSchema = z.object({
  weeks: buyingPlanQuerySchema.shape.weeks,
  suggestion: z
    .array(z.string().max(80, "A suggestion is named by its item and week."), {
      error: "Choose at least one suggestion.",
    })
    .min(1, "Choose at least one suggestion.")
    .max(500, "Choose at most 500 suggestions at once."),
});
