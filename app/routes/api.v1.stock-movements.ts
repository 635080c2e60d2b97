import type { Route } from "./+types/api.v1.stock-movements";
import { requireRole, requireUser } from "~/auth/guard.server";
import {
  methodNotAllowed,
  readJsonBody,
  readSearchParams,
} from "~/lib/api.server";
import { movementJournalQuerySchema } from "~/stock/movement-journal-query";
import { listMovements } from "~/stock/movement-journal.server";
import { movementRequestSchema } from "~/stock/movement-request";
import { answerStockError } from "~/stock/stock-api.server";
import { recordMovement } from "~/stock/stock-movements.server";

/** GET /api/v1/stock-movements?type=&sku=&user=&from=&to=&page=&pageSize= → the journal, newest first. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const query = readSearchParams(request, movementJournalQuerySchema);
  const { hasMore, movements } = await listMovements(query);
  return Response.json({
    movements,
    page: query.page,
    pageSize: query.pageSize,
    hasMore,
  });
}

/** POST /api/v1/stock-movements (storekeeper, admin) → 201 { movement, balance }; 409 when stock would go below zero. */
export async function action({ request }: Route.ActionArgs) {
  const user = await requireRole(request, ["storekeeper"]);
  if (request.method !== "POST") return methodNotAllowed(["GET", "POST"]);
  const movement = await readJsonBody(request, movementRequestSchema);
  return answerStockError(async () =>
    Response.json(await recordMovement(movement, user.id), { status: 201 }),
  );
}
