import type { Route } from "./+types/api.v1.build-orders";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { answerBuildOrderError } from "~/build-orders/build-order-api.server";
import { buildOrderListQuerySchema } from "~/build-orders/build-order-list-address";
import { buildOrderCreateSchema } from "~/build-orders/build-order-forms";
import {
  createBuildOrder,
  listBuildOrders,
} from "~/build-orders/build-orders.server";
import {
  methodNotAllowed,
  readJsonBody,
  readSearchParams,
} from "~/lib/api.server";

/** GET /api/v1/build-orders?status=&page=&pageSize= → a page of build orders, newest first. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const query = readSearchParams(request, buildOrderListQuerySchema);
  const { total, buildOrders } = await listBuildOrders(query);
  return Response.json({
    buildOrders,
    page: query.page,
    pageSize: query.pageSize,
    total,
  });
}

/** POST /api/v1/build-orders { designId, revision, quantity, note? } (builder, admin) → 201 { id, status }. */
export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "createBuildOrders");
  if (request.method !== "POST") return methodNotAllowed(["GET", "POST"]);
  const input = await readJsonBody(request, buildOrderCreateSchema);
  return answerBuildOrderError(async () =>
    Response.json(await createBuildOrder(input, user.id), { status: 201 }),
  );
}
