import type { Route } from "./+types/buying-plan";
import { requireUser } from "~/auth/guard.server";
import { loadBuyingPlan } from "~/buying-plan/buying-plan.server";
import { buyingPlanJson } from "~/buying-plan/plan-json";
import { buyingPlanQuerySchema } from "~/buying-plan/plan-query";
import { HorizonForm } from "~/components/buying-plan/horizon-form";
import { ItemProjection } from "~/components/buying-plan/item-projection";
import { SuggestionsPanel } from "~/components/buying-plan/suggestions-panel";
import { userCan } from "~/lib/capabilities";
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

export const meta: Route.MetaFunction = () => [
  { title: "Buying plan · Turnledger" },
];

export default function BuyingPlan({ loaderData }: Route.ComponentProps) {
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
      />
      <ItemProjection items={plan.items} shown={shown} itemHref={itemHref} />
    </div>
  );
}
