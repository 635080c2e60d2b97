import type { Route } from "./+types/api.v1.build-order";
import { requireCapability, requireUser } from "~/auth/guard.server";
import {
  answerBuildOrderError,
  orderIdFrom,
} from "~/build-orders/build-order-api.server";
import {
  changeBuildOrderPlannedStart,
  changeBuildOrderQuantity,
} from "~/build-orders/build-order-closing.server";
import { findBuildOrder } from "~/build-orders/build-order-details.server";
import { buildOrderChangeSchema } from "~/build-orders/build-order-forms";
import { buildOrderReference } from "~/build-orders/build-order-status";
import { apiError, methodNotAllowed, readJsonBody } from "~/lib/api.server";

/** GET /api/v1/build-orders/:orderId → the order, its lines with availability, costs and history. */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const id = orderIdFrom(params.orderId);
  const order = await findBuildOrder(id);
  if (!order)
    return apiError(404, `No build order ${buildOrderReference(id)}.`);
  return Response.json(order);
}

/**
 * PATCH /api/v1/build-orders/:orderId { quantity?, plannedStart? } (builder, admin): a new
 * number of motors for an order nothing has been issued to (what it held is released and
 * it is a draft again), and/or a new planned start ("YYYY-MM-DD", null clears it) while
 * the order is open. → 200 { id, status, released, plannedStart }. The number of motors
 * goes first: any order whose motors may change may also change its start, so a refusal
 * leaves nothing half-written.
 */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "runBuildOrders");
  if (request.method !== "PATCH") return methodNotAllowed(["GET", "PATCH"]);
  const id = orderIdFrom(params.orderId);
  const change = await readJsonBody(request, buildOrderChangeSchema);
  return answerBuildOrderError(async () => {
    const changed =
      change.quantity === undefined
        ? null
        : await changeBuildOrderQuantity(id, change.quantity, user.id);
    const started =
      change.plannedStart === undefined
        ? null
        : await changeBuildOrderPlannedStart(id, change.plannedStart, user.id);
    const order = await findBuildOrder(id);
    return Response.json({
      id,
      status: started?.status ?? changed?.status ?? order?.status,
      released: changed?.released ?? [],
      plannedStart: order?.plannedStart ?? null,
    });
  });
}
