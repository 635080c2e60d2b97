import type { Route } from "./+types/api.v1.insight-stock-value";
import { requireUser } from "~/auth/guard.server";
import { methodNotAllowed } from "~/lib/api.server";
import { stockValueInsight } from "~/insight/stock-value.server";

/**
 * GET /api/v1/insight/stock-value → { currency, total, byKind, byLocation, otherLocations,
 * reservedValue, belowReorderPoint, openAlerts, trend: [{ week, value, complete }] }:
 * on hand × moving average cost, each item (or balance) to 0.0001, summed exactly; the
 * trend is the value at the end of each of the last 26 weeks (Monday-started, UTC), the
 * running week's value being the value now.
 *
 * Every signed-in role may read: everyone reads stock (the product's role table).
 */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return Response.json(await stockValueInsight({ trend: true }));
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
