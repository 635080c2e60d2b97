/**
 * Best current price of an item for a quantity: each offer's applicable quantity break
 * (see `quantity-breaks.ts`), priced in the company currency, cheapest landed unit price
 * first. An offer whose break cannot be priced (no metal base, no rate) or whose smallest
 * break is above the quantity goes to `cannotPrice` with the reasons; nothing is dropped
 * silently. Offers with no line valid on the day are not offers on that day and are left
 * out (their old prices show in the price history).
 */

import { assertCalendarDate } from "~/lib/calendar-days";
import { priceLine, type PricingContext } from "./line-price";
import type { MetalBasePrice } from "./metal-base";
import {
  amountForQuantity,
  fromThousandths,
  type CurrencyCode,
  type MoneyAmount,
} from "./money";
import type { ExchangeRateEntry } from "./currency";
import {
  compareOffers,
  type PriceLine,
  type PriceLineSource,
} from "./price-line";
import { belowSmallestBreak, type PricingProblem } from "./pricing-problems";
import { applicableBreak, groupByOffer } from "./quantity-breaks";

/**
 * Extra cost per unit on top of the converted price (freight, duty, handling), in the
 * company currency, ten-thousandths. The hook for landed cost; none yet, so it is 0.
 */
export type LandedCostPerUnit = (
  line: PriceLine,
  convertedUnitPrice: MoneyAmount,
) => MoneyAmount;

export interface BestPriceRequest extends PricingContext {
  itemId: string;
  /** The quantity to buy, thousandths of the item's stock unit. */
  quantity: bigint;
  /** Price lines; lines of other items are ignored. */
  lines: readonly PriceLine[];
  /** Landed-cost hook; default adds nothing. */
  landedCostPerUnit?: LandedCostPerUnit;
}

/** One offer priced for the quantity. Money in ten-thousandths. */
export interface PriceCandidate {
  supplier: string;
  supplierSku: string;
  /** The supplier's quoting currency. */
  currency: CurrencyCode;
  /** The break that applies, thousandths of the item's unit. */
  minQuantity: bigint;
  leadTimeDays: number | null;
  /** The pack or spool size, thousandths of the item's unit; null: any quantity. */
  packQuantity: bigint | null;
  /** Unit price as quoted, in `currency` (adder lines: adder + base). */
  quotedUnitPrice: MoneyAmount;
  /** Adder per kg in `currency` for adder lines; null for a fixed unit price. */
  adderPerKg: MoneyAmount | null;
  /** The metal base added to the adder; null for a fixed unit price. */
  metalBase: MetalBasePrice | null;
  /** The exchange rate used; null when quoted in the company currency. */
  rate: ExchangeRateEntry | null;
  /** Unit price in the company currency. */
  convertedUnitPrice: MoneyAmount;
  /** From the landed-cost hook, company currency per unit (0 until freight is modelled). */
  landedCostPerUnit: MoneyAmount;
  /** convertedUnitPrice + landedCostPerUnit: what the list is sorted by. */
  landedUnitPrice: MoneyAmount;
  /** landedUnitPrice × quantity in the company currency, rounded half away from zero. */
  totalForQuantity: MoneyAmount;
  sourceLine: PriceLineSource;
  line: PriceLine;
}

/** An offer that has a line valid on the day but no price for the quantity, and why. */
export interface UnpricedOffer {
  supplier: string;
  supplierSku: string;
  currency: CurrencyCode;
  /** The line that would apply; null when the quantity is below every break. */
  sourceLine: PriceLineSource | null;
  problems: PricingProblem[];
}

export interface BestPriceResult {
  /** Cheapest landed unit price first. */
  candidates: PriceCandidate[];
  /** Sorted by supplier and SKU. */
  cannotPrice: UnpricedOffer[];
}

const noLandedCost: LandedCostPerUnit = () => 0n;

/** Every offer of an item for a quantity on `request.date`, cheapest first. */
export function bestPrices(request: BestPriceRequest): BestPriceResult {
  assertCalendarDate(request.date, "pricing date");
  const landedCost = request.landedCostPerUnit ?? noLandedCost;
  const candidates: PriceCandidate[] = [];
  const cannotPrice: UnpricedOffer[] = [];
  const itemLines = request.lines.filter(
    (line) => line.itemId === request.itemId,
  );

  for (const offerLines of groupByOffer(itemLines)) {
    const choice = applicableBreak(offerLines, request.quantity, request.date);
    if (choice.kind === "none-valid") continue;
    const offer = offerLines[0]!;
    if (choice.kind === "below-smallest-break") {
      cannotPrice.push({
        supplier: offer.supplier,
        supplierSku: offer.supplierSku,
        currency: offer.currency,
        sourceLine: null,
        problems: [
          belowSmallestBreak(
            request.quantity,
            choice.smallestMinQuantity,
            request.date,
          ),
        ],
      });
      continue;
    }
    const line = choice.line;
    const price = priceLine(line, request);
    if (!price.ok) {
      cannotPrice.push({
        supplier: line.supplier,
        supplierSku: line.supplierSku,
        currency: line.currency,
        sourceLine: line.sourceLine,
        problems: price.problems,
      });
      continue;
    }
    const landedCostPerUnit = landedCost(line, price.convertedUnitPrice);
    const landedUnitPrice = price.convertedUnitPrice + landedCostPerUnit;
    candidates.push({
      supplier: line.supplier,
      supplierSku: line.supplierSku,
      currency: line.currency,
      minQuantity: line.minQuantity,
      leadTimeDays: line.leadTimeDays ?? null,
      packQuantity: line.packQuantity ?? null,
      quotedUnitPrice: price.quotedUnitPrice,
      adderPerKg: line.pricing === "metal-base-adder" ? line.adderPerKg : null,
      metalBase: price.metalBase,
      rate: price.rate,
      convertedUnitPrice: price.convertedUnitPrice,
      landedCostPerUnit,
      landedUnitPrice,
      totalForQuantity: amountForQuantity(
        fromThousandths(request.quantity),
        landedUnitPrice,
      ),
      sourceLine: line.sourceLine,
      line,
    });
  }

  return {
    candidates: candidates.sort(cheapestFirst),
    cannotPrice: cannotPrice.sort(compareOffers),
  };
}

/**
 * Cheapest landed unit price first; equal prices: the shorter lead time (a known lead time
 * before an unknown one), then supplier name, then supplier SKU.
 */
export function cheapestFirst(a: PriceCandidate, b: PriceCandidate): number {
  if (a.landedUnitPrice !== b.landedUnitPrice) {
    return a.landedUnitPrice < b.landedUnitPrice ? -1 : 1;
  }
  if (a.leadTimeDays !== b.leadTimeDays) {
    if (a.leadTimeDays === null) return 1;
    if (b.leadTimeDays === null) return -1;
    return a.leadTimeDays - b.leadTimeDays;
  }
  return compareOffers(a, b);
}
