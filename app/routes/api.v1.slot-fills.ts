import type { Route } from "./+types/api.v1.slot-fills";
import { requireUser } from "~/auth/guard.server";
import { assessWireSlotFill } from "~/engineering/wire-slot-fill";
import {
  calculateOr400,
  methodNotAllowed,
  readJsonBody,
} from "~/lib/api.server";
import { slotFillAnswer } from "~/engineering/wire-slot-fill-answer";
import { slotFillRequestSchema } from "~/lib/slot-fill-request";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return methodNotAllowed(["POST"]);
}

/**
 * POST /api/v1/slot-fills: copper fill and gross fill (over the enamel, liner taken off) of
 * a winding in a slot: the packing limits judged on gross fill, the random-wound practice on
 * copper fill. Any signed-in role. → { copperFill, grossFill, limit (π/√12, what `fits` is
 * judged against), fits, message, limitPassed, limitCode, … } (decision 037).
 */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  if (request.method !== "POST") return methodNotAllowed(["POST"]);
  const input = await readJsonBody(request, slotFillRequestSchema);
  const fill = calculateOr400(() => assessWireSlotFill(input));
  return Response.json(slotFillAnswer(fill));
}
