/**
 * What the item page's price history says in words: days and months on its axis, unit
 * prices with their currency and unit, each supplier article's name (shortened beside the
 * plot) and the summary that stands in for the chart for screen readers. Pure.
 */
import { formatDay, formatQuantity } from "~/lib/format";
import { perUnitWord } from "~/lib/unit-text";
import { formatStockQuantity } from "./stock-quantity-text";

/** What the item page's loader sends: the unit price of one quantity over time, one series per offer. */
export interface PriceHistoryView {
  unit: string;
  quantity: number;
  companyCurrency: string;
  from: string;
  to: string;
  lineCount: number;
  series: {
    supplier: string;
    supplierSku: string;
    currency: string;
    points: {
      date: string;
      unitPrice: number | null;
      quotedUnitPrice: number | null;
      problems: string[];
    }[];
  }[];
}

export type PriceOffer = PriceHistoryView["series"][number];

/** Names beside the plot are cut to this many characters. */
const labelCharacters = 26;

/** "2026-12-01" → "Dec 2026". */
export function monthText(date: string): string {
  return formatDay(date).replace(/^\d+ /, "");
}

/** A unit price with its currency and unit, to the ten-thousandth: "12.5000 EUR/kg", "2.4000 EUR/piece". */
export function pricePerUnit(
  value: number,
  currency: string,
  unit: string,
): string {
  return formatQuantity(value, `${currency}/${perUnitWord(unit)}`, 4);
}

export function offerName(
  offer: Pick<PriceOffer, "supplier" | "supplierSku">,
): string {
  return `${offer.supplier} · ${offer.supplierSku}`;
}

export function shortName(name: string): string {
  return name.length > labelCharacters
    ? `${name.slice(0, labelCharacters - 1)}…`
    : name;
}

/** One sentence per offer for screen readers: first and last price, lowest and highest, now. */
export function priceHistorySummary(
  history: PriceHistoryView,
  price: (value: number) => string,
): string {
  const quantity = formatStockQuantity(history.quantity, history.unit);
  const offers = history.series.map((offer) => {
    const priced = offer.points.filter(
      (point): point is typeof point & { unitPrice: number } =>
        point.unitPrice !== null,
    );
    const name = offerName(offer);
    if (priced.length === 0) return `${name}: no price on these days.`;
    const values = priced.map((point) => point.unitPrice);
    const last = offer.points.at(-1)!;
    const changes = priced.length - 1;
    const quoted =
      offer.currency === history.companyCurrency
        ? ""
        : ` (quoted in ${offer.currency})`;
    return `${name}${quoted}: ${price(priced[0]!.unitPrice)} from ${formatDay(priced[0]!.date)}, ${changes === 0 ? "no change" : `${changes} change${changes === 1 ? "" : "s"}`}, lowest ${price(Math.min(...values))}, highest ${price(Math.max(...values))}, ${last.unitPrice === null ? "no price now" : `now ${price(last.unitPrice)}`}.`;
  });
  return `Unit price of ${quantity} from ${formatDay(history.from)} to ${formatDay(history.to)}, ${history.series.length} supplier article${history.series.length === 1 ? "" : "s"}. ${offers.join(" ")}`;
}
