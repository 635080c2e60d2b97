import type { Route } from "./+types/api.v1.build-order";
import { requireCapability, requireUser } from "~/auth/guard.server";
import {
  answerBuildOrderError,
  orderIdFrom,
} from "~/build-orders/build-order-api.server";
import { changeBuildOrderQuantity } from "~/build-orders/build-order-closing.server";
import { findBuildOrder } from "~/build-orders/build-order-details.server";
import { quantityChangeSchema } from "~/build-orders/build-order-forms";
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
 * PATCH /api/v1/build-orders/:orderId { quantity } (builder, admin): a new number of
 * motors for an order nothing has been issued to; what it held is released and it is a
 * draft again. → 200 { id, status, released }.
 */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "runBuildOrders");
  if (request.method !== "PATCH") return methodNotAllowed(["GET", "PATCH"]);
  const id = orderIdFrom(params.orderId);
  const { quantity } = await readJsonBody(request, quantityChangeSchema);
  return answerBuildOrderError(async () =>
    Response.json(await changeBuildOrderQuantity(id, quantity, user.id)),
  );
}
