import type { Route } from "./+types/api.v1.item";
import { refuseUnless, requireUser } from "~/auth/guard.server";
import { apiError, methodNotAllowed, readJsonBody } from "~/lib/api.server";
import { updateItem } from "~/stock/catalogue.server";
import { itemPatchSchema } from "~/stock/item-schemas";
import { findItemBySku, withoutId } from "~/stock/items.server";
import { answerDomainError } from "~/lib/api-errors.server";

/** GET /api/v1/items/:sku → the item with its balances by lot and location. */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const item = await findItemBySku(params.sku);
  if (!item) return apiError(404, `No item with SKU "${params.sku}".`);
  return Response.json(withoutId(item));
}

/**
 * PATCH /api/v1/items/:sku: buyers and admins change name, reorder fields and
 * archive state; storekeepers change the reorder fields only.
 */
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireUser(request);
  if (request.method !== "PATCH") return methodNotAllowed(["GET", "PATCH"]);
  refuseUnless(request, user, "keepReorderLevels");
  const change = await readJsonBody(request, itemPatchSchema);
  const touchesCatalogue =
    change.name !== undefined || change.active !== undefined;
  if (touchesCatalogue)
    refuseUnless(
      request,
      user,
      "keepCatalogue",
      "Storekeepers change reorder point and quantity only; the name and archive state need the role buyer.",
    );
  return answerDomainError(async () => {
    await updateItem(params.sku, change);
    return Response.json(withoutId((await findItemBySku(params.sku))!));
  });
}
