import type { Route } from "./+types/api.v1.purchase-order-send";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { methodNotAllowed } from "~/lib/api.server";
import { answerPurchaseOrderStep } from "~/purchase-orders/purchase-order-api.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return methodNotAllowed(["POST"]);
}

/** POST /api/v1/purchase-orders/:orderId/send sends a draft to the supplier (PDF and CSV by e-mail) → 200 with status "sent" (buyer, admin). */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "orderPurchases");
  return answerPurchaseOrderStep(request, params.orderId, "send", user.id);
}
