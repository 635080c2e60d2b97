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
