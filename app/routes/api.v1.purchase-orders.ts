import type { Route } from "./+types/api.v1.purchase-orders";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { answerDomainError } from "~/lib/api-errors.server";
import {
  methodNotAllowed,
  readJsonBody,
  readSearchParams,
} from "~/lib/api.server";
import {
  listPurchaseOrders,
  purchaseOrderJson,
} from "~/purchase-orders/purchase-order-details.server";
import {
  purchaseOrderCreateSchema,
  purchaseOrderListQuerySchema,
} from "~/purchase-orders/purchase-order-forms";
import { createPurchaseOrder } from "~/purchase-orders/purchase-order-writes.server";

/** GET /api/v1/purchase-orders?status=&supplierId=&page=&pageSize= → a page of orders, newest first. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const query = readSearchParams(request, purchaseOrderListQuerySchema);
  return Response.json(await listPurchaseOrders(query));
}

/**
 * POST /api/v1/purchase-orders { supplierId, currency?, notes?, lines: [{ sku, quantity,
 * unitPrice?, requestedDate?, overrideReason? }] } (buyer, admin) → 201 the draft order.
 */
export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "orderPurchases");
  if (request.method !== "POST") return methodNotAllowed(["GET", "POST"]);
  const input = await readJsonBody(request, purchaseOrderCreateSchema);
  return answerDomainError(async () =>
    Response.json(
      purchaseOrderJson(await createPurchaseOrder(input, user.id)),
      {
        status: 201,
      },
    ),
  );
}
