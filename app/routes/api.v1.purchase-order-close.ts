import type { Route } from "./+types/api.v1.purchase-order-close";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { methodNotAllowed } from "~/lib/api.server";
import { answerPurchaseOrderStep } from "~/purchase-orders/purchase-order-api.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return methodNotAllowed(["POST"]);
}

/** POST /api/v1/purchase-orders/:orderId/close { reason? } closes a sent or partly received order short → 200 (buyer, admin). */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "orderPurchases");
  return answerPurchaseOrderStep(request, params.orderId, "close", user.id);
}
