import type { Route } from "./+types/api.v1.lot-release";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { methodNotAllowed } from "~/lib/api.server";
import { answerLotHoldStep } from "~/lots/lot-hold-api.server";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return methodNotAllowed(["POST"]);
}

/**
 * POST /api/v1/lots/:lot/release?sku= { reason? } (storekeeper, admin) → 200 with the lot,
 * now free. 400 for a bad body, 404 no such lot, 409 when it is not on hold or the number
 * is several items' lot without ?sku=.
 */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "holdLots");
  if (request.method !== "POST") return methodNotAllowed(["POST"]);
  return answerLotHoldStep(request, params.lot, "release", user.id);
}
