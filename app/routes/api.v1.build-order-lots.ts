import type { Route } from "./+types/api.v1.build-order-lots";
import { requireUser } from "~/auth/guard.server";
import { orderIdFrom } from "~/build-orders/build-order-api.server";
import { buildOrderReference } from "~/build-orders/build-order-status";
import { apiError, methodNotAllowed } from "~/lib/api.server";
import { buildOrderExists, buildOrderLots } from "~/lots/where-used.server";

/**
 * GET /api/v1/build-orders/:orderId/lots (everyone signed in) → 200 { buildOrderId,
 * reference, lots: [{ lotId, lot, sku, itemName, supplier: { id, name } | null,
 * supplierBatch, onHold, issued, returned, net, unit, firstIssuedAt, lastMovementAt }] }:
 * every lot issued to the order, issues net of the returns that name it, in the order of
 * the first issue. Items not kept in lots are not listed. 404 for no such order.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const id = orderIdFrom(params.orderId);
  if (!(await buildOrderExists(id)))
    return apiError(404, `No build order ${buildOrderReference(id)}.`);
  return Response.json({
    buildOrderId: id,
    reference: buildOrderReference(id),
    lots: await buildOrderLots(id),
  });
}

export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
