import { redirect } from "react-router";
import type { Route } from "./+types/stock-lot-hold";
import { requireCapability, requireUser } from "~/auth/guard.server";
import {
  lotHoldFormAction,
  lotIdOrNotFound,
  lotPagePath,
} from "~/lots/lot-hold-form-action.server";

// Only a POST does anything here; a GET goes to the lot's page.
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  return redirect(lotPagePath(await lotIdOrNotFound(params.lotId)));
}

/** POST /stock/lots/:lotId/hold (storekeeper, admin), form field `reason` (required). */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "holdLots");
  return lotHoldFormAction(request, params.lotId, "hold", user.id);
}
