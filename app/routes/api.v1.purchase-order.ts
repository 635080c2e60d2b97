import type { Route } from "./+types/api.v1.purchase-order";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { answerDomainError } from "~/lib/api-errors.server";
import { apiError, methodNotAllowed, readJsonBody } from "~/lib/api.server";
import { purchaseOrderIdFrom } from "~/purchase-orders/purchase-order-api.server";
import {
  loadPurchaseOrder,
  purchaseOrderJson,
} from "~/purchase-orders/purchase-order-details.server";
import {
  draftPatchOf,
  purchaseOrderPatchSchema,
} from "~/purchase-orders/purchase-order-forms";
import { purchaseOrderNumber } from "~/purchase-orders/purchase-order-status";
import { updateDraftOrder } from "~/purchase-orders/purchase-order-writes.server";

/** GET /api/v1/purchase-orders/:orderId → the order, its supplier, lines, history and receipts. */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const id = purchaseOrderIdFrom(params.orderId);
  const order = await loadPurchaseOrder(id);
  if (!order)
    return apiError(404, `No purchase order ${purchaseOrderNumber(id)}.`);
  return Response.json(purchaseOrderJson(order));
}

/**
 * PATCH /api/v1/purchase-orders/:orderId { currency?, notes?, lines?: [new line | { id,
 * quantity?, unitPrice? (null: back to the price list), requestedDate?, overrideReason? }
 * | { id, remove: true }] } (buyer, admin; drafts only, else 409) → 200 the order.
 */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "orderPurchases");
  if (request.method !== "PATCH") return methodNotAllowed(["GET", "PATCH"]);
  const id = purchaseOrderIdFrom(params.orderId);
  const body = await readJsonBody(request, purchaseOrderPatchSchema);
  return answerDomainError(async () =>
    Response.json(
      purchaseOrderJson(
        await updateDraftOrder(id, draftPatchOf(body), user.id),
      ),
    ),
  );
}
