import type { Route } from "./+types/api.v1.alerts";
import { listAlerts } from "~/alerts/stock-alerts.server";
import { requireUser } from "~/auth/guard.server";
import { alertListQuerySchema } from "~/alerts/alert-list-query";
import { methodNotAllowed, readSearchParams } from "~/lib/api.server";

/** GET /api/v1/alerts?status=open|closed|all → [{ sku, status, availableAtOpen, …, told }], paged (X-Total-Count). */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const { total, alerts } = await listAlerts(
    readSearchParams(request, alertListQuerySchema),
  );
  return Response.json(alerts, {
    headers: { "X-Total-Count": String(total) },
  });
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
