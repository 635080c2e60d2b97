import { parseForm } from "~/lib/parse-form";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/stocktake";
import { refuseUnless } from "~/auth/guard.server";
import { ConfirmButton } from "~/components/confirm-button";
import { ReviewTable } from "~/components/stocktakes/review-table";
import { StocktakeStatusBadge } from "~/components/stocktakes/stocktake-status-badge";
import { FormMessages } from "~/components/text-field";
import { needsRoleMessage, userCan, type Capability } from "~/lib/capabilities";
import { isDomainError } from "~/lib/domain-error";
import { redirectWithFlash } from "~/lib/flash.server";
import { formatDateTime } from "~/lib/format";
import { companyCurrency } from "~/purchasing/suppliers.server";
import { requireStocktakeReader } from "~/stocktakes/stocktake-access.server";
import {
  approveStocktake,
  askForRecount,
} from "~/stocktakes/stocktake-approval.server";
import {
  approveFormSchema,
  cancelFormSchema,
  isStocktakeIntent,
  recountFormSchema,
  type StocktakeIntent,
} from "~/stocktakes/stocktake-forms";
import { stocktakeIdFromPath } from "~/stocktakes/stocktake-reference";
import { reviewOf } from "~/stocktakes/stocktake-review";
import {
  cancelStocktake,
  findStocktakeSummary,
  listBlindLines,
  listReviewLines,
} from "~/stocktakes/stocktakes.server";
import { BackLink } from "~/components/back-link";

async function stocktakeOr404(value: string | undefined) {
  const id = stocktakeIdFromPath(value, (message) =>
    data({ message }, { status: 404 }),
  );
  const stocktake = await findStocktakeSummary(id);
  if (!stocktake)
    throw data({ message: `No stocktake ST-${id}.` }, { status: 404 });
  return stocktake;
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireStocktakeReader(request);
  const stocktake = await stocktakeOr404(params.stocktakeId);
  const can = {
    review: userCan(user, "approveStocktakes"),
    count: userCan(user, "countStock"),
    cancel: userCan(user, "startStocktakes"),
  };
  // Book figures only for reviewers; others see what is counted, never the book.
  const [review, progress, currency] = await Promise.all([
    can.review
      ? listReviewLines(stocktake.id).then(reviewOf)
      : Promise.resolve(null),
    can.review ? Promise.resolve(null) : listBlindLines(stocktake.id),
    companyCurrency(),
  ]);
  return {
    stocktake,
    can,
    currency,
    review,
    progress:
      progress?.map((line) => ({
        id: line.id,
        location: line.location,
        sku: line.sku,
        lot: line.lot,
        counted: line.counted !== null,
        recountRequested: line.recountRequested,
      })) ?? null,
  };
}

const stepCapabilities: Record<StocktakeIntent, Capability> = {
  recount: "approveStocktakes",
  approve: "approveStocktakes",
  cancel: "startStocktakes",
};

const schemas = {
  recount: recountFormSchema,
  approve: approveFormSchema,
  cancel: cancelFormSchema,
};

export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireStocktakeReader(request);
  const formData = await request.formData();
  const intent = formData.get("intent");
  if (isStocktakeIntent(intent)) {
    const needed = stepCapabilities[intent];
    refuseUnless(request, user, needed, needsRoleMessage(needed, "This step"));
  }
  const stocktake = await stocktakeOr404(params.stocktakeId);
  if (!isStocktakeIntent(intent))
    return data(
      {
        intent: "",
        result: {
          status: "error" as const,
          error: { "": ["Choose a step: recount, approve or cancel."] },
        },
      },
      { status: 400 },
    );
  const submission = parseForm(formData, { schema: schemas[intent] });
  if (submission.status !== "success")
    return data({ intent, result: submission.reply() }, { status: 400 });
  const here = `/stocktakes/${stocktake.id}`;
  try {
    if (intent === "recount") {
      const value = submission.value as { lineId: number };
      await askForRecount(stocktake.id, value.lineId);
      return redirectWithFlash(here, { code: "stocktake-recount-asked" });
    }
    if (intent === "approve") {
      await approveStocktake(stocktake.id, user.id);
      return redirectWithFlash(here, { code: "stocktake-approved" });
    }
    await cancelStocktake(stocktake.id);
    return redirectWithFlash(here, { code: "stocktake-cancelled" });
  } catch (error) {
    if (!isDomainError(error)) throw error;
    return data(
      { intent, result: submission.reply({ formErrors: [error.message] }) },
      { status: error.status },
    );
  }
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `${loaderData ? loaderData.stocktake.reference : "Stocktake"} · Turnledger`,
  },
];

export default function Stocktake({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { stocktake, can, review, progress, currency } = loaderData;
  const navigation = useNavigation();
  const open = stocktake.status === "counting";
  const refusal =
    actionData && actionData.result.status === "error"
      ? Object.values(actionData.result.error ?? {})
          .flat()
          .filter((message): message is string => typeof message === "string")
      : undefined;
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-sm">
            <BackLink to="/stocktakes">Stocktakes</BackLink>
          </p>
          <h1 className="mt-1 flex items-center gap-3 text-2xl font-semibold">
            {stocktake.reference}{" "}
            <StocktakeStatusBadge status={stocktake.status} />
          </h1>
          <p className="mt-1 text-graphite-500">
            {stocktake.locations.length === 0
              ? "No locations"
              : stocktake.locations.map((code, index) => (
                  <span key={code}>
                    {index > 0 ? ", " : ""}
                    {can.count ? (
                      <Link
                        to={`/stock/locations/${encodeURIComponent(code)}/count-sheet`}
                        className="text-copper-700 underline underline-offset-2"
                        aria-label={`Count sheet of ${code}`}
                      >
                        {code}
                      </Link>
                    ) : (
                      code
                    )}
                  </span>
                ))}{" "}
            · started by {stocktake.startedBy},{" "}
            {formatDateTime(stocktake.startedAt)}
            {stocktake.approvedBy
              ? ` · approved by ${stocktake.approvedBy}, ${formatDateTime(stocktake.approvedAt)}`
              : ""}
          </p>
          {stocktake.note ? <p className="mt-1">{stocktake.note}</p> : null}
          <p className="mt-1 text-sm">
            {stocktake.counted} of {stocktake.lines} lines counted
          </p>
        </div>
        {open && can.count ? (
          <div className="flex flex-wrap gap-2">
            <Link
              to={`/stocktakes/${stocktake.id}/count`}
              className="button-primary"
            >
              Count sheet
            </Link>
            <Link
              to={`/stocktakes/${stocktake.id}/print`}
              className="button-quiet"
            >
              Print sheet
            </Link>
          </div>
        ) : null}
      </div>
      <FormMessages errors={refusal} />
      {review ? (
        <ReviewTable review={review} currency={currency} canAskRecount={open} />
      ) : null}
      {progress ? (
        <section aria-labelledby="progress-heading" className="panel space-y-2">
          <h2 id="progress-heading" className="text-lg font-semibold">
            Lines
          </h2>
          <ul className="divide-y divide-graphite-100 text-sm">
            {progress.map((line) => (
              <li key={line.id} className="flex justify-between gap-3 py-1.5">
                <span>
                  <span className="font-medium">{line.location}</span> ·{" "}
                  {line.sku}
                  {line.lot ? ` lot ${line.lot}` : ""}
                </span>
                <span
                  className={line.recountRequested ? "text-caution" : undefined}
                >
                  {line.recountRequested
                    ? "recount asked"
                    : line.counted
                      ? "counted"
                      : "to count"}
                </span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      {open && (can.review || can.cancel) ? (
        <section aria-labelledby="close-heading" className="panel space-y-3">
          <h2 id="close-heading" className="text-lg font-semibold">
            Finish
          </h2>
          {can.review ? (
            <Form method="post" className="space-y-2">
              <input type="hidden" name="intent" value="approve" />
              <p className="text-sm text-graphite-700">
                {review?.blocker ??
                  `Approving posts ${review?.totals.differences ?? 0} count ${review?.totals.differences === 1 ? "movement" : "movements"} in one go and closes the stocktake.`}
              </p>
              <button
                type="submit"
                className="button-primary"
                disabled={
                  navigation.state !== "idle" || Boolean(review?.blocker)
                }
              >
                Approve and post the differences
              </button>
            </Form>
          ) : null}
          {can.cancel ? (
            <Form method="post">
              <input type="hidden" name="intent" value="cancel" />
              <ConfirmButton
                className="button-quiet"
                disabled={navigation.state !== "idle"}
                question={{
                  title: `Cancel ${stocktake.reference}?`,
                  consequence: (
                    <p>
                      Its counts are set aside and nothing is posted to the
                      books. A cancelled stocktake cannot be reopened: start a
                      new one to count again.
                    </p>
                  ),
                  confirmLabel: `Cancel ${stocktake.reference}`,
                  keepLabel: "Keep counting",
                }}
              >
                Cancel this stocktake
              </ConfirmButton>
            </Form>
          ) : null}
        </section>
      ) : null}
    </div>
  );
}
