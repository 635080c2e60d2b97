import type { Route } from "./+types/api.v1.items";
import { requireCapability, requireUser } from "~/auth/guard.server";
import {
  methodNotAllowed,
  readJsonBody,
  readSearchParams,
} from "~/lib/api.server";
import { createItem } from "~/stock/catalogue.server";
import { itemCreateSchema } from "~/stock/item-schemas";
import { itemListQuerySchema } from "~/stock/item-list-query";
import { findItemBySku, listItems, withoutId } from "~/stock/items.server";
import { answerDomainError } from "~/lib/api-errors.server";

/** GET /api/v1/items?search=&kind=&belowReorder=1&sort=&order=&page=&pageSize= → a page of items. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const query = readSearchParams(request, itemListQuerySchema);
  const { total, totalExact, items } = await listItems({
    search: query.search,
    kind: query.kind,
    belowReorder: query.belowReorder,
    includeArchived: query.archived,
    sort: query.sort,
    descending: query.order === "desc",
    page: query.page,
    pageSize: query.pageSize,
  });
  return Response.json({
    items,
    page: query.page,
    pageSize: query.pageSize,
    total,
    totalExact,
  });
}

/** POST /api/v1/items (buyer, admin) → 201 the new item. */
export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "keepCatalogue");
  if (request.method !== "POST") return methodNotAllowed(["GET", "POST"]);
  const input = await readJsonBody(request, itemCreateSchema);
  return answerDomainError(async () => {
    const sku = await createItem(input, user.id);
    return Response.json(withoutId((await findItemBySku(sku))!), {
      status: 201,
    });
  });
}
