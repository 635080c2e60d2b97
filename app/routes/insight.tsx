import { Suspense } from "react";
import { Await, Link } from "react-router";
import type { Route } from "./+types/insight";
import { requireUser } from "~/auth/guard.server";
import { InsightDesigns } from "~/components/insight/insight-designs";
import {
  CostHistory,
  StockBreakdown,
  StockHeadline,
  StockTrend,
} from "~/components/insight-stock";
import { loadInsight } from "~/insight/insight-page.server";

/**
 * The cost insight page: released designs costed per motor and per N·m with the what-if
 * (in the address; nothing is saved), their cost over the last year, and the stock value
 * by kind, location and week. Every signed-in role may read it (the product's role table
 * lets everyone read stock, designs and costs); it is the manager's page.
 */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return loadInsight(request, { page: "insight" });
}

export const meta: Route.MetaFunction = () => [
  { title: "Cost insight · Turnledger" },
];

export default function Insight({ loaderData }: Route.ComponentProps) {
  const { stock, designs, trend } = loaderData;
  return (
    <div className="space-y-8">
      <div>
        <h1 className="text-2xl font-semibold">Cost insight</h1>
        <p className="mt-1 text-graphite-500">
          What a motor costs per newton-metre and where the money goes, what the
          store is worth, and how both moved. Try a copper price or longer end
          turns: the figures are worked out again and nothing is saved.
        </p>
      </div>
      <InsightDesigns data={loaderData} action="/insight" />
      <CostHistory
        designs={designs.designs}
        currency={stock.currency}
        quantity={loaderData.quantity}
      />
      <StockHeadline stock={stock} />
      <StockBreakdown stock={stock} />
      <section aria-labelledby="stock-trend-heading" className="space-y-3">
        <h2
          id="stock-trend-heading"
          className="break-after-avoid text-lg font-semibold"
        >
          Stock value over the last 26 weeks
        </h2>
        {trend ? (
          <Suspense
            fallback={
              <p role="status" className="panel text-sm text-graphite-500">
                Reading the movement journal for the weekly values…
              </p>
            }
          >
            <Await
              resolve={trend}
              errorElement={
                <p role="alert" className="panel text-sm text-danger">
                  The weekly values could not be read just now. The figures
                  above are current; reload the page to try again.
                </p>
              }
            >
              {(weeks) => (
                <StockTrend trend={weeks} currency={stock.currency} />
              )}
            </Await>
          </Suspense>
        ) : null}
      </section>
      <p className="text-sm text-graphite-500 print:hidden">
        The same figures for scripts:{" "}
        <Link
          to="/api/v1/insight/designs"
          reloadDocument
          className="text-copper-700 underline"
        >
          /api/v1/insight/designs
        </Link>{" "}
        and{" "}
        <Link
          to="/api/v1/insight/stock-value"
          reloadDocument
          className="text-copper-700 underline"
        >
          /api/v1/insight/stock-value
        </Link>
        .
      </p>
    </div>
  );
}
