import type { Route } from "./+types/api.v1.buying-plan";
import { requireUser } from "~/auth/guard.server";
import { loadBuyingPlan } from "~/buying-plan/buying-plan.server";
import { buyingPlanJson } from "~/buying-plan/plan-json";
import { buyingPlanQuerySchema } from "~/buying-plan/plan-query";
import { methodNotAllowed, readSearchParams } from "~/lib/api.server";

/**
 * GET /api/v1/buying-plan?weeks=8 (1–26) → { today, weeks, companyCurrency, suggestions:
 * [{ sku, supplierId, quantity, unitPrice, currency, needBy, orderBy, reason, … }], items:
 * [{ sku, weeks: [{ weekStart, projected, … }] }] }; everyone signed in may read it.
 */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const { weeks } = readSearchParams(request, buyingPlanQuerySchema);
  return Response.json(buyingPlanJson(await loadBuyingPlan(weeks)));
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
