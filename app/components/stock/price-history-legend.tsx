/**
 * The price history's legend: each supplier article's line and marker, its name and its
 * price now (or why it has none), the currency it is quoted in and whether its line has
 * breaks.
 */
import type { PriceHistoryChartLayout } from "~/pricing/price-history-chart";
import { offerName, type PriceHistoryView } from "~/stock/price-history-texts";
import { lazyFigure } from "~/components/lazy-figure";

const OfferLineSample = lazyFigure(
  () => import("./price-offer-marker").then((module) => module.OfferLineSample),
  { width: 36, height: 12 },
);

export function PriceHistoryLegend({
  history,
  chart,
  price,
}: {
  history: PriceHistoryView;
  chart: PriceHistoryChartLayout;
  /** A unit price in words: "12.5000 EUR/kg". */
  price: (value: number) => string;
}) {
  const currency = history.companyCurrency;
  return (
    <ul aria-label="Legend" className="space-y-1 text-sm">
      {history.series.map((offer, index) => {
        const layout = chart.series[index]!;
        const last = offer.points.at(-1);
        return (
          <li key={offerName(offer)} className="flex items-center gap-2">
            <OfferLineSample style={layout.style} index={index} />
            <span>
              <span className="font-medium">{offerName(offer)}</span>
              <span className="text-graphite-500">
                {" — "}
                {last?.unitPrice != null
                  ? `now ${price(last.unitPrice)}`
                  : layout.markers.length === 0
                    ? `no price on these days: ${last?.problems.join("; ") ?? ""}`
                    : `no price now: ${last?.problems.join("; ") ?? ""}`}
                {offer.currency !== currency
                  ? `, quoted in ${offer.currency}`
                  : ""}
                {layout.markers.length > 0 &&
                offer.points.some((point) => point.unitPrice === null)
                  ? "; breaks in the line are days without a price (see the figures)"
                  : ""}
              </span>
            </span>
          </li>
        );
      })}
    </ul>
  );
}
