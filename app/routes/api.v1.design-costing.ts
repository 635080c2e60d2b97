import { z } from "zod";
import type { Route } from "./+types/api.v1.design-costing";
import { requireUser } from "~/auth/guard.server";
import { costingBases, costRevision } from "~/designs/design-costing.server";
import { designParams } from "~/designs/design-params";
import {
  findRevision,
  loadRevisionLines,
} from "~/designs/design-revisions.server";
import { maxBuildQuantity } from "~/designs/design-page";
import { apiError, methodNotAllowed, readSearchParams } from "~/lib/api.server";
import { dayParam, wholeNumberParam } from "~/lib/search-params";
import { answerDomainError } from "~/lib/api-errors.server";
import { todayUtc } from "~/lib/calendar-days";

const costingQuery = z.object({
  quantity: wholeNumberParam("quantity", {
    min: 1,
    max: maxBuildQuantity,
    message: "The quantity is a whole number of motors from 1 to 1,000,000.",
  }).default(1),
  basis: z
    .enum(costingBases, {
      error: "The basis is best-price or stock-average.",
    })
    .default("best-price"),
  date: dayParam(
    "date",
    "The date is YYYY-MM-DD, a day on the calendar.",
  ).optional(),
});

/**
 * GET /api/v1/designs/:designId/revisions/:revision/costing?quantity=N&basis=best-price|stock-average[&date=YYYY-MM-DD]
 * → { quantity, currency, costPerMotor, ratedTorqueNm, costPerNm, split, lines, … }.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const query = readSearchParams(request, costingQuery);
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
