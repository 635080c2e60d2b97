import type { Route } from "./+types/api.v1.lot-where-used";
import { requireUser } from "~/auth/guard.server";
import { answerDomainError } from "~/lib/api-errors.server";
import { methodNotAllowed } from "~/lib/api.server";
import { lotOfApiPath } from "~/lots/lot-api.server";
import { lotWhereUsed } from "~/lots/where-used.server";

/**
 * GET /api/v1/lots/:lot/where-used?sku= (everyone signed in), `:lot` the lot NUMBER →
 * 200 { lot: { id, number, sku, supplier: { id, name } | null, supplierBatch },
 * uses: [{ buildOrderId, reference, design, revision, motorQuantity, issued, returned, net,
 * unit, firstIssuedAt, lastMovementAt }], otherIssues: { count, quantity } }: every build
 * order that drew from the lot, issues net of the returns that name it, quantities in the
 * item's unit, times ISO 8601 UTC (firstIssuedAt null when the order only returned some).
 * `otherIssues`: issues of the lot made to no build order. 404 for no such lot; 409 when
 * lots of several items have the number and no `sku` says which (the message lists them).
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  return answerDomainError(async () => {
    const { lot, json } = await lotOfApiPath(request, params.lot);
    const { uses, otherIssues } = await lotWhereUsed(lot.id, lot.item.unit);
    return Response.json({ lot: json, uses, otherIssues });
  });
}

export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
