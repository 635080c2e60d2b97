/**
 * The frame of the item page's price-history plot and the history's layout in it:
 * pure, without the drawing library, so the page can lay the chart out (or say why
 * there is none) while the plot itself loads with import() (lazy-figure.tsx).
 */
import {
  priceHistoryChart,
  type ChartFrame,
  type PriceHistoryChartLayout,
} from "~/pricing/price-history-chart";
import type { PriceHistoryView } from "~/stock/price-history-texts";

export const priceHistoryFrame: ChartFrame = {
  width: 760,
  height: 290,
  left: 62,
  right: 196,
  top: 14,
  bottom: 46,
};

/** The layout of the history in the plot's frame; null when no article has a price on any day. */
export function priceHistoryLayout(
  history: PriceHistoryView,
): PriceHistoryChartLayout | null {
  return priceHistoryChart(history.series, history.to, priceHistoryFrame);
}
