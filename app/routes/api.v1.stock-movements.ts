import type { Route } from "./+types/api.v1.stock-movements";
import { requireCapability, requireUser } from "~/auth/guard.server";
import {
  methodNotAllowed,
  readJsonBody,
  readSearchParams,
} from "~/lib/api.server";
import { answerBuildOrderError } from "~/build-orders/build-order-api.server";
import { issueMovementToBuildOrder } from "~/build-orders/build-order-issues.server";
import { purchaseOrderNumber } from "~/purchase-orders/purchase-order-status";
import { movementJournalQuerySchema } from "~/stock/movement-journal-query";
import { listMovements } from "~/stock/movement-journal.server";
import { movementRequestSchema } from "~/stock/movement-request";
import { answerDomainError } from "~/lib/api-errors.server";
import { recordMovement } from "~/stock/stock-movements.server";

/**
 * GET /api/v1/stock-movements?type=&sku=&user=&from=&to=&page=&pageSize=&after=&before= → the journal,
 * newest first; `nextCursor` (for `after`) and `previousCursor` (for `before`) page through it by keyset.
 * A receipt booked against a purchase order carries its number (`purchaseOrder: "PO-000123"`,
 * `purchaseOrderId`); every other movement null.
 */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const query = readSearchParams(request, movementJournalQuerySchema);
  const { hasMore, movements, nextCursor, previousCursor } =
    await listMovements(query);
  return Response.json({
    movements: movements.map((movement) => ({
      ...movement,
      purchaseOrder:
        movement.purchaseOrderId === null
          ? null
          : purchaseOrderNumber(movement.purchaseOrderId),
    })),
    page: query.page,
    pageSize: query.pageSize,
    hasMore,
    nextCursor,
    previousCursor,
  });
}

/**
 * POST /api/v1/stock-movements (storekeeper, admin) → 201 { movement, balance }; 409 when stock would go below zero.
 * An issue with `buildOrderId` goes through the build order's own issue → 201 { movement, balance, buildOrder };
 * 404 for no such order, 409 when the order is not open or does not need the item. A plain issue whose
 * reference names a build order ("BO-12") is refused with 400 on `reference`. A receipt may name its
 * supplier (`supplierId`, 400 when there is none with that id): a lot it creates keeps it as its origin.
 */
export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "recordStock");
  if (request.method !== "POST") return methodNotAllowed(["GET", "POST"]);
  const movement = await readJsonBody(request, movementRequestSchema);
  const { buildOrderId } = movement;
  if (buildOrderId !== undefined)
    return answerBuildOrderError(async () =>
      Response.json(
        await issueMovementToBuildOrder({ ...movement, buildOrderId }, user.id),
        { status: 201 },
      ),
    );
  return answerDomainError(async () =>
    Response.json(await recordMovement(movement, user.id), { status: 201 }),
  );
}
