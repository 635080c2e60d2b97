import { useId } from "react";
import { Link } from "react-router";
import { PriceHistoryFigures } from "~/components/stock/price-history-figures";
import { PriceHistoryLegend } from "~/components/stock/price-history-legend";
import { lazyFigure } from "~/components/lazy-figure";
import { priceHistoryLayout } from "~/components/stock/price-history-layout";
import { perUnitWord } from "~/lib/unit-text";
import {
  offerName,
  pricePerUnit,
  priceHistorySummary,
  type PriceHistoryView,
} from "~/stock/price-history-texts";
import { formatDay } from "~/lib/format";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export type { PriceHistoryView };

const PriceHistoryPlot = lazyFigure(
  () =>
    import("~/components/stock/price-history-plot").then(
      (module) => module.PriceHistoryPlot,
    ),
  { aspectRatio: "760 / 290" },
);

/**
 * The item's unit price for one quantity over the last year, one step line per supplier
 * article: a price holds until the next marker, and a break in a line is a stretch of days
 * without a price. Offers differ in dash pattern and marker shape and are named beside
 * their line, so the chart reads in print and without colour. A summary stands in for
 * screen readers; the figures are in a table below. Drawn with visx as plain SVG that the
 * server renders whole (recharts 3 renders an empty box on the server, and recharts 2's
 * server and browser paths differ, failing hydration).
 */
export function PriceHistoryChart({
  history,
  canImport,
}: {
  history: PriceHistoryView;
  canImport: boolean;
}) {
  const summaryId = useId();
  const currency = history.companyCurrency;
  const unitWord = perUnitWord(history.unit);
  const price = (value: number) => pricePerUnit(value, currency, history.unit);
  const quantity = formatStockQuantity(history.quantity, history.unit);
  const chart = priceHistoryLayout(history);

  return (
    <section
      aria-labelledby="price-history-heading"
      className="panel space-y-3 break-inside-avoid"
    >
      <div>
        <h2 id="price-history-heading" className="text-lg font-semibold">
          Price history for {quantity}
        </h2>
        <p className="text-sm text-graphite-500">
          Unit price in {currency} per {unitWord}
          {chart
            ? `, ${formatDay(chart.start)} to ${formatDay(chart.end)}, one line per supplier article`
            : ` over the last year, ${formatDay(history.from)} to ${formatDay(history.to)}`}
          .
        </p>
      </div>
      {history.lineCount === 0 ? (
        <p className="text-sm text-graphite-500">
          No price lines for this item yet.
          {canImport ? (
            <>
              {" "}
              <Link
                to="/suppliers/import"
                className="text-copper-700 underline underline-offset-2"
              >
                Import a price list
              </Link>{" "}
              to chart its prices here.
            </>
          ) : null}
        </p>
      ) : !chart ? (
        <div className="text-sm">
          <p className="text-graphite-500">
            No supplier article has a price for {quantity} on any of these days.
          </p>
          {history.series.length > 0 ? (
            <ul className="mt-1 list-disc pl-5 text-caution">
              {history.series.map((offer) => (
                <li key={offerName(offer)}>
                  {offerName(offer)}:{" "}
                  {offer.points.at(-1)?.problems.join("; ") || "no price"}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : (
        <figure className="space-y-2">
          <PriceHistoryPlot
            history={history}
            chart={chart}
            summaryId={summaryId}
            price={price}
          />
          <p id={summaryId} className="sr-only">
            {priceHistorySummary(history, price)}
          </p>
          <figcaption>
            <PriceHistoryLegend history={history} chart={chart} price={price} />
          </figcaption>
        </figure>
      )}
      {history.series.length > 0 ? (
        <PriceHistoryFigures history={history} quantity={quantity} />
      ) : null}
    </section>
  );
}
