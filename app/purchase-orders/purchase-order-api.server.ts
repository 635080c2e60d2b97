/** What the purchase-order API routes share: the order id from the path, the end steps. */
import {
  apiError,
  methodNotAllowed,
  readOptionalJsonBody,
} from "~/lib/api.server";
import { answerDomainError } from "~/lib/api-errors.server";
import { idFromText } from "~/lib/search-params";
import { purchaseOrderJson } from "./purchase-order-details.server";
import { endOrderSchema } from "./purchase-order-forms";
import {
  cancelPurchaseOrder,
  closePurchaseOrderShort,
  sendPurchaseOrder,
} from "./purchase-order-writes.server";

/** The order id of the path, or a 404 answer when it is not a whole number. */
export function purchaseOrderIdFrom(value: string | undefined): number {
  const id = idFromText(value);
  if (id === null)
    throw apiError(404, `No purchase order "${String(value).slice(0, 40)}".`);
  return id;
}

export type PurchaseOrderStep = "send" | "cancel" | "close";

/**
 * POST /api/v1/purchase-orders/:orderId/send | cancel | close ({ reason }? for the last
 * two) → 200 the order. The caller has checked the role.
 */
export async function answerPurchaseOrderStep(
  request: Request,
  orderIdText: string | undefined,
  step: PurchaseOrderStep,
  userId: string,
): Promise<Response> {
  if (request.method !== "POST") return methodNotAllowed(["POST"]);
  const id = purchaseOrderIdFrom(orderIdText);
  const { reason } =
    step === "send"
      ? { reason: undefined }
      : await readOptionalJsonBody(request, endOrderSchema);
  return answerDomainError(async () => {
    const order =
      step === "send"
        ? await sendPurchaseOrder(id, userId)
        : step === "cancel"
          ? await cancelPurchaseOrder(id, reason, userId)
          : await closePurchaseOrderShort(id, reason, userId);
    return Response.json(purchaseOrderJson(order));
  });
}
