import type { Route } from "./+types/api.v1.winding-factors";
import { requireUser } from "~/auth/guard.server";
import { windingFactors } from "~/engineering/winding-factor";
import {
  calculateOr400,
  methodNotAllowed,
  readJsonBody,
} from "~/lib/api.server";
import { windingFactorRequestSchema } from "~/lib/winding-factor-request";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return methodNotAllowed(["POST"]);
}

/**
 * POST /api/v1/winding-factors { slots, poles, layers, phases?, coilPitch? } → the
 * fundamental and harmonic winding factors by the star of slots, with the coil pitch and
 * layout used; 400 naming the field for a combination that cannot make a balanced winding.
 * Any signed-in role.
 */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  if (request.method !== "POST") return methodNotAllowed(["POST"]);
  const input = await readJsonBody(request, windingFactorRequestSchema);
  return Response.json(calculateOr400(() => windingFactors(input)));
}
