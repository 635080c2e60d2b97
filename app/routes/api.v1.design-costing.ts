import { z } from "zod";
import type { Route } from "./+types/api.v1.design-costing";
import { requireUser } from "~/auth/guard.server";
import { costingBases, costRevision } from "~/designs/design-costing.server";
import { designParams } from "~/designs/design-params";
import {
  findRevision,
  loadRevisionLines,
} from "~/designs/design-revisions.server";
import { apiError, methodNotAllowed, readSearchParams } from "~/lib/api.server";
import { answerStockError } from "~/stock/stock-api.server";

const costingQuery = z.object({
  quantity: z.coerce
    .number({ error: "The quantity is a number of motors." })
    .int("The quantity is a whole number of motors.")
    .min(1, "The quantity is at least 1 motor.")
    .max(1_000_000, "The quantity is at most 1,000,000 motors.")
    .default(1),
  basis: z
    .enum(costingBases, {
      error: "The basis is best-price or stock-average.",
    })
    .default("best-price"),
  date: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, "The date is YYYY-MM-DD.")
    .refine((day) => {
      const parsed = new Date(`${day}T00:00:00Z`);
      return (
        !Number.isNaN(parsed.getTime()) && parsed.toISOString().startsWith(day)
      );
    }, "That day is not in the calendar.")
    .optional(),
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
  return answerStockError(async () =>
    Response.json(
      await costRevision({
        revision: found.revision,
        lines: await loadRevisionLines(found.revision.id, found.revision),
        quantity: query.quantity,
        basis: query.basis,
        date: query.date ?? new Date().toISOString().slice(0, 10),
      }),
    ),
  );
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
