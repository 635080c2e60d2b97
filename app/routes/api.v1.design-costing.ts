import type { Route } from "./+types/api.v1.design-costing";
import { requireUser } from "~/auth/guard.server";
import { costRevision } from "~/designs/design-costing.server";
import { designCostingQuerySchema } from "~/designs/design-queries";
import { designParams } from "~/designs/design-params";
import {
  findRevision,
  loadRevisionLines,
} from "~/designs/design-revisions.server";
import { apiError, methodNotAllowed, readSearchParams } from "~/lib/api.server";
import { answerDomainError } from "~/lib/api-errors.server";
import { todayUtc } from "~/lib/calendar-days";

/**
 * GET /api/v1/designs/:designId/revisions/:revision/costing?quantity=N&basis=best-price|stock-average[&date=YYYY-MM-DD]
 * → { quantity, currency, costPerMotor, ratedTorqueNm, costPerNm, split, lines, … }.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const query = readSearchParams(request, designCostingQuerySchema);
  const ids = designParams(params);
  const found = ids ? await findRevision(ids.designId, ids.revision) : null;
  if (!found) return apiError(404, "No such design revision.");
  return answerDomainError(async () =>
    Response.json(
      await costRevision({
        revision: found.revision,
        lines: await loadRevisionLines(found.revision.id, found.revision),
        quantity: query.quantity,
        basis: query.basis,
        date: query.date ?? todayUtc(),
      }),
    ),
  );
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
