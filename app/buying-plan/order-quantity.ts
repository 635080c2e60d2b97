/**
 * How much to buy of an item and from whom, once the plan knows the least it must buy.
 * For each offer (supplier and supplier SKU) the quantity is rounded up to the offer's
 * pack or spool size; each higher price break of the offer (also rounded up to its pack)
 * is tried too, and taken when the whole order costs less there ("100 pieces at 2.10 cost
 * less than 90 at 2.40"). Each quantity is priced by `bestPrices`, in the company currency.
 * Between offers, the one whose order costs least in total wins (equal totals: the
 * cheaper unit price, then the shorter lead time, as best price orders them), so a
 * 25 kg spool is not bought for a 5 kg need when another supplier sells 5 kg for less.
 * Pure.
 */
import {
  bestPrices,
  cheapestFirst,
  type PriceCandidate,
} from "~/pricing/best-price";
import type { PricingContext } from "~/pricing/line-price";
import type { PriceLine } from "~/pricing/price-line";
import {
  applicableBreak,
  groupByOffer,
  isValidOn,
} from "~/pricing/quantity-breaks";

/** `quantity` rounded up to whole packs of `pack` (thousandths); unchanged without a pack. */
export function roundUpToPack(quantity: bigint, pack: bigint | undefined) {
  if (pack === undefined || pack <= 0n) return quantity;
  const packs = (quantity + pack - 1n) / pack;
  return packs * pack;
}

export interface OrderChoice {
  /** Thousandths of the item's unit. */
  quantity: bigint;
  /** The offer's price for that quantity. */
  candidate: PriceCandidate;
  /** The pack size the quantity was rounded to, when the offer sells in packs. */
  packQuantity: bigint | null;
  /** True when a higher break made the order cheaper in total than the least quantity. */
  raisedToBreak: boolean;
}

export interface OrderRequest extends Omit<PricingContext, "rateDay"> {
  itemId: string;
  /** The least to buy, thousandths of the item's unit (more than 0). */
  atLeast: bigint;
  /** Price lines (any items; others are ignored). */
  lines: readonly PriceLine[];
}

/** The quantity of `target` or more that one offer sells: whole packs of the break that applies, until that is stable. */
function packed(
  offerLines: readonly PriceLine[],
  target: bigint,
  date: string,
): { quantity: bigint; pack: bigint | null } {
  let quantity = target;
  let pack: bigint | null = null;
  // Each round can only move to a higher break; there are at most as many rounds as lines.
  for (let round = 0; round <= offerLines.length; round += 1) {
    const choice = applicableBreak(offerLines, quantity, date);
    if (choice.kind === "none-valid") break;
    const line =
      choice.kind === "applies"
        ? choice.line
        : offerLines.find(
            (candidate) =>
              isValidOn(candidate, date) &&
              candidate.minQuantity === choice.smallestMinQuantity,
          );
    pack = line?.packQuantity ?? null;
    const rounded = roundUpToPack(quantity, line?.packQuantity);
    if (rounded === quantity) break;
    quantity = rounded;
  }
  return { quantity, pack };
}

/** The best order of one offer: the cheapest total among the least quantity and each higher break. */
function bestOfOffer(
  request: OrderRequest,
  offerLines: readonly PriceLine[],
): OrderChoice | null {
  const targets = [
    request.atLeast,
    ...offerLines
      .filter((line) => isValidOn(line, request.date))
      .map((line) => line.minQuantity)
      .filter((minQuantity) => minQuantity > request.atLeast),
  ];
  let best: OrderChoice | null = null;
  let leastQuantity: bigint | null = null;
  for (const target of targets) {
    const { quantity, pack } = packed(offerLines, target, request.date);
    const [candidate] = bestPrices({
      itemId: request.itemId,
      quantity,
      lines: offerLines,
      bases: request.bases,
      rates: request.rates,
      companyCurrency: request.companyCurrency,
      date: request.date,
    }).candidates;
    if (!candidate) continue;
    leastQuantity ??= quantity;
    if (
      best === null ||
      candidate.totalForQuantity < best.candidate.totalForQuantity ||
      (candidate.totalForQuantity === best.candidate.totalForQuantity &&
        quantity < best.quantity)
    )
      best = {
        quantity,
        candidate,
        packQuantity: pack,
        raisedToBreak: quantity !== leastQuantity,
      };
  }
  return best;
}

/** The order to make: quantity and offer; null when no offer can be priced for the item. */
export function chooseOrder(request: OrderRequest): OrderChoice | null {
  if (request.atLeast <= 0n)
    throw new RangeError("an order is for more than nothing");
  const itemLines = request.lines.filter(
    (line) => line.itemId === request.itemId,
  );
  let chosen: OrderChoice | null = null;
  for (const offerLines of groupByOffer(itemLines)) {
    const offer = bestOfOffer(request, offerLines);
    if (!offer) continue;
    if (
      chosen === null ||
      offer.candidate.totalForQuantity < chosen.candidate.totalForQuantity ||
      (offer.candidate.totalForQuantity === chosen.candidate.totalForQuantity &&
        cheapestFirst(offer.candidate, chosen.candidate) < 0)
    )
      chosen = offer;
  }
  return chosen;
}
