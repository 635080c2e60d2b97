import type { Route } from "./+types/api.v1.insight-designs";
import { requireUser } from "~/auth/guard.server";
import { designInsight } from "~/insight/design-insight.server";
import { insightQuerySchema } from "~/insight/what-if";
import { methodNotAllowed, readSearchParams } from "~/lib/api.server";
import { answerDomainError } from "~/lib/api-errors.server";
import { todayUtc } from "~/lib/calendar-days";

/**
 * GET /api/v1/insight/designs → [{ designId, name, revision, ratedTorqueNm, torqueBasis,
 * costPerMotor, costPerNm, split, splitPerNm, copperLossPerNm, currency, … }]: the latest
 * released revision of each design (newest design first, paged: `page`, `perPage` ≤ 50,
 * X-Total-Count), costed for `quantity` motors on `date` (today) at the price `basis`:
 * `best-price` (default) or `stock-average`; each design says its `basis`, and
 * `perNmTorque` ({ torqueNm, source: "rated" | "estimated" }) what "per N·m" is over.
 *
 * Read-only what-if (nothing is saved): `copperBase` / `aluminiumBase` per kg in the
 * company currency, `endTurn.<designId>` a factor on that design's end-turn lengths;
 * each design then also carries `asStored`, its figures without them. `history=1` adds
 * `costHistory`: the cost per motor a month apart over the last year, stored prices only.
 *
 * Every signed-in role may read: the product's role table lets everyone read designs and
 * costs, and the same figures are on the design costing route.
 */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const query = readSearchParams(request, insightQuerySchema);
  return answerDomainError(async () => {
    const insight = await designInsight(query, {
      today: todayUtc(),
      history: query.history === "1",
    });
    return Response.json(insight.designs, {
      headers: { "X-Total-Count": String(insight.total) },
    });
  });
}

/** Any other method: 405 in the API's error shape, after the same check as GET. */
export async function action({ request }: Route.ActionArgs) {
  await requireUser(request);
  return methodNotAllowed(["GET"]);
}
