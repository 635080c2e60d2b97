import { z } from "zod";
import type { Route } from "./+types/api.v1.alerts";
import { listAlerts } from "~/alerts/stock-alerts.server";
import { requireUser } from "~/auth/guard.server";
import { methodNotAllowed, readSearchParams } from "~/lib/api.server";
import { pageParam, pageSizeParam } from "~/lib/search-params";

const query = z.object({
  status: z
    .enum(["open", "closed", "all"], {
      error: "The status is open, closed or all.",
    })
    .default("open"),
  page: pageParam,
  perPage: pageSizeParam("perPage", 200, 50),
});

/** GET /api/v1/alerts?status=open|closed|all → [{ sku, status, availableAtOpen, …, told }], paged (X-Total-Count). */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const { total, alerts } = await listAlerts(readSearchParams(request, query));
  return Response.json(alerts, {
    headers: { "X-Total-Count": String(total) },
  });
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
