import type { Route } from "./+types/api.v1.stock-movements";
import { requireRole, requireUser } from "~/auth/guard.server";
import { apiError, methodNotAllowed, readJsonBody } from "~/lib/api.server";
import { movementJournalQuerySchema } from "~/stock/movement-journal-query";
import { listMovements } from "~/stock/movement-journal.server";
import { movementRequestSchema } from "~/stock/movement-request";
import { searchParamsObject } from "~/stock/item-list-query";
import { answerStockError } from "~/stock/stock-api.server";
import { recordMovement } from "~/stock/stock-movements.server";

/** GET /api/v1/stock-movements?type=&sku=&user=&from=&to=&page=&pageSize= → the journal, newest first. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const parsed = movementJournalQuerySchema.safeParse(
    searchParamsObject(new URL(request.url).searchParams),
  );
  if (!parsed.success) {
    const fields = Object.fromEntries(
      parsed.error.issues.map((issue) => [
        issue.path.join("."),
        [issue.message],
      ]),
    );
    return apiError(400, "Some query parameters are wrong.", fields);
  }
  const { hasMore, movements } = await listMovements(parsed.data);
  return Response.json({
    movements,
    page: parsed.data.page,
    pageSize: parsed.data.pageSize,
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
