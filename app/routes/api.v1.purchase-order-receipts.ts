import type { Route } from "./+types/api.v1.purchase-order-receipts";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { answerDomainError } from "~/lib/api-errors.server";
import { apiError, methodNotAllowed, readJsonBody } from "~/lib/api.server";
import { purchaseOrderIdFromNumber } from "~/purchase-orders/purchase-order-status";
import { receiveAgainstOrder } from "~/purchase-orders/receive-against-order.server";
import { receiptRequestSchema } from "~/purchase-orders/receipt-request";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return methodNotAllowed(["POST"]);
}

/**
 * POST /api/v1/purchase-orders/:orderId/receipts (storekeeper, admin)
 * { lines: [{ lineId, lot, location, quantity | grossKg + tareKg }] } → 201 { receipt, order };
 * 409 when a line would go past its delivery tolerance or no rate (or base) prices it on the day;
 * 422 for a line not on the order or an order not sent (draft, cancelled, closed, received);
 * 404 for no such order; 400 for a bad body. A refusal writes nothing.
 */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "receivePurchases");
  if (request.method !== "POST") return methodNotAllowed(["POST"]);
  const orderId = purchaseOrderIdFromNumber(params.orderId);
  if (orderId === null)
    return apiError(404, `No purchase order "${params.orderId.slice(0, 40)}".`);
  const body = await readJsonBody(request, receiptRequestSchema);
  return answerDomainError(async () =>
    Response.json(await receiveAgainstOrder(orderId, body, user.id), {
      status: 201,
    }),
  );
}
