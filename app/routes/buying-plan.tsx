import { data } from "react-router";
import type { Route } from "./+types/buying-plan";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { loadBuyingPlan } from "~/buying-plan/buying-plan.server";
import { buyingPlanJson } from "~/buying-plan/plan-json";
import { makeDraftOrders } from "~/buying-plan/plan-drafts.server";
import {
  buyingPlanQuerySchema,
  draftOrdersFormSchema,
} from "~/buying-plan/plan-query";
import type { DraftOrdersAnswer } from "~/components/buying-plan/draft-orders-form";
import { HorizonForm } from "~/components/buying-plan/horizon-form";
import { ItemProjection } from "~/components/buying-plan/item-projection";
import { SuggestionsPanel } from "~/components/buying-plan/suggestions-panel";
import { userCan } from "~/lib/capabilities";
import { isDomainError } from "~/lib/domain-error";
import { readSearchLeniently } from "~/lib/search-params";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const params = new URL(request.url).searchParams;
  const { query } = readSearchLeniently(buyingPlanQuerySchema, {
    weeks: params.get("weeks") ?? "",
  });
  const plan = buyingPlanJson(await loadBuyingPlan(query.weeks));
  const wanted = params.get("item");
  const shown =
    plan.items.find((item) => item.sku === wanted) ??
    plan.items.find((item) => item.sku === plan.suggestions[0]?.sku) ??
    plan.items[0] ??
    null;
  return {
    plan,
    weeks: query.weeks,
    shownSku: shown?.sku ?? null,
    canOrder: userCan(user, "orderPurchases"),
  };
}

/** "Make draft orders" (buyers, admins): the ticked suggestions as draft purchase orders, one per supplier. */
export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "orderPurchases");
  const form = await request.formData();
  const parsed = draftOrdersFormSchema.safeParse({
    weeks: form.get("weeks") ?? undefined,
    suggestion: form.getAll("suggestion"),
  });
  if (!parsed.success)
    return data<DraftOrdersAnswer>(
      {
        made: [],
        refused: null,
        errors: [...new Set(parsed.error.issues.map((issue) => issue.message))],
      },
      { status: 400 },
    );
  try {
    return await makeDraftOrders(
      parsed.data.weeks,
      parsed.data.suggestion,
      user.id,
    );
  } catch (error) {
    if (!isDomainError(error)) throw error;
    return data<DraftOrdersAnswer>(
      { made: [], refused: null, errors: [error.message] },
      { status: error.status === 404 ? 409 : error.status },
    );
  }
}

export const meta: Route.MetaFunction = () => [
  { title: "Buying plan · Turnledger" },
];

export default function BuyingPlan({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { plan, weeks, shownSku, canOrder } = loaderData;
  const shown = plan.items.find((item) => item.sku === shownSku) ?? null;
  const itemHref = (sku: string) =>
    `/buying-plan?${new URLSearchParams({ weeks: String(weeks), item: sku })}#projection-heading`;
  return (
    <div className="space-y-6">
      <header>
        <h1 className="text-2xl font-semibold">Buying plan</h1>
        <p className="mt-1 max-w-3xl text-sm text-graphite-500">
          What the open build orders still need, week by week, against the stock
          free now and what is on order. Each build order needs its stock in the
          week of its planned start (this week when it has none); weeks start on
          Monday. Where the stock would fall below the reorder point (below zero
          without one), buy the amount shown, from the supplier whose order
          costs least.
        </p>
      </header>
      <HorizonForm weeks={weeks} item={shownSku} />
      <SuggestionsPanel
        suggestions={plan.suggestions}
        weeks={weeks}
        canOrder={canOrder}
        answer={(actionData as DraftOrdersAnswer | undefined) ?? null}
      />
      <ItemProjection items={plan.items} shown={shown} itemHref={itemHref} />
    </div>
  );
}
