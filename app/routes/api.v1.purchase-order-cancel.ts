import type { Route } from "./+types/api.v1.purchase-order-cancel";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { methodNotAllowed } from "~/lib/api.server";
import { answerPurchaseOrderStep } from "~/purchase-orders/purchase-order-api.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return methodNotAllowed(["POST"]);
}

/** POST /api/v1/purchase-orders/:orderId/cancel { reason? } cancels a draft or a sent order nothing has arrived for → 200 (buyer, admin). */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "orderPurchases");
  return answerPurchaseOrderStep(request, params.orderId, "cancel", user.id);
}
