import type { Route } from "./+types/api.v1.coil-estimates";
import { requireUser } from "~/auth/guard.server";
import { estimateCoil } from "~/engineering/coil-estimate";
import {
  calculateOr400,
  methodNotAllowed,
  readJsonBody,
} from "~/lib/api.server";
import { coilEstimateRequestSchema } from "~/lib/estimate-requests";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return methodNotAllowed(["POST"]);
}

/**
 * POST /api/v1/coil-estimates: a coil's conductor length, mass, resistance and
 * loss from its geometry, split into active length and end turns. Any signed-in role.
 */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  if (request.method !== "POST") return methodNotAllowed(["POST"]);
  const input = await readJsonBody(request, coilEstimateRequestSchema);
  return Response.json(calculateOr400(() => estimateCoil(input)));
}
