import type { Route } from "./+types/api.v1.metal-base";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { methodNotAllowed, readJsonBody } from "~/lib/api.server";
import { metalBaseSchema } from "~/purchasing/supplier-schemas";
import { listMetalBase, setMetalBase } from "~/purchasing/suppliers.server";

/** GET /api/v1/metal-base → the copper and aluminium base prices per kg, newest first. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return Response.json(await listMetalBase());
}

/** PUT /api/v1/metal-base (buyer, admin) { conductor, currency, pricePerKg, validFrom } → 200 the list. */
export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "keepPrices");
  if (request.method !== "PUT") return methodNotAllowed(["GET", "PUT"]);
  await setMetalBase(await readJsonBody(request, metalBaseSchema), user.id);
  return Response.json(await listMetalBase());
}
