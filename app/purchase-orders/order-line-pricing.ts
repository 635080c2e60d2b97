/**
 * The price of one purchase-order line, from the supplier's price lines for the item at
 * the ordered quantity, and the line's lead time and expected date. Pure: the server
 * loads the supplier's lines, metal bases and rates and hands them in.
 *
 * - The break that applies is the one `applicableBreak` picks (app/pricing); when the
 *   supplier sells the item under two articles, the cheaper one (in the company
 *   currency, as best price compares them) is ordered.
 * - Wire priced as adder + metal base keeps both per kg on the line, and when the base is
 *   fixed (the supplier's setting: on ordering, or on the delivery day; both common
 *   practice). The base used is the one valid on the pricing day.
 * - The order's currency is the supplier's unless the buyer chose another. A price line in
 *   another currency is converted through the company currency with the rates valid on
 *   the pricing day: amount × rate(line currency) gives company currency, ÷ rate(order
 *   currency) gives the order's (a currency equal to the company's needs no rate). Adder
 *   and base are converted each on its own and the unit price is their sum, so the printed
 *   base + adder always add up to the printed price.
 */

import { addDays, dayOf, type CalendarDate } from "~/lib/calendar-days";
import { divideHalfAwayFromZero } from "~/lib/decimal-amounts";
import type { MetalBaseFixing } from "~/db/tables/purchase-order-enums";
import { bestPrices } from "~/pricing/best-price";
import { findExchangeRate, type ExchangeRateEntry } from "~/pricing/currency";
import type { MetalBasePrice } from "~/pricing/metal-base";
import {
  convertAmount,
  rateScale,
  type CurrencyCode,
  type MoneyAmount,
} from "~/pricing/money";
import type { PriceLine } from "~/pricing/price-line";

export interface OrderLinePricingRequest {
  /** The supplier's price lines for the item (any validity; lines of other items are ignored). */
  lines: readonly PriceLine[];
  itemId: string;
  /** Ordered quantity, thousandths of the item's unit. */
  quantity: bigint;
  /** The day the line is priced for: today while draft, the sending day when sent. */
  date: CalendarDate;
  orderCurrency: CurrencyCode;
  companyCurrency: CurrencyCode;
  rates: readonly ExchangeRateEntry[];
  bases: readonly MetalBasePrice[];
  /** The supplier's setting, kept on wire lines priced on the base. */
  metalBaseFixedAt: MetalBaseFixing;
}

export interface PricedOrderLine {
  ok: true;
  /** Per unit of the item, in the order's currency, ten-thousandths. */
  unitPrice: MoneyAmount;
  supplierSku: string;
  /** The break that applied, thousandths of the item's unit. */
  minQuantity: bigint;
  /** The price line's own lead time, days; null when it gives none. */
  leadTimeDays: number | null;
  /** Wire on the metal base: base and adder per kg in the order's currency; null otherwise. */
  metalBasePerKg: MoneyAmount | null;
  adderPerKg: MoneyAmount | null;
  metalBaseFixedAt: MetalBaseFixing | null;
  /** The currency the supplier quoted this line in. */
  quotedCurrency: CurrencyCode;
}

export type OrderLinePrice = PricedOrderLine | { ok: false; message: string };

/** The line's price from the supplier's price lines; `ok: false` says why there is none. */
export function priceOrderLine(
  request: OrderLinePricingRequest,
): OrderLinePrice {
  const offers = (companyCurrency: CurrencyCode) =>
    bestPrices({
      itemId: request.itemId,
      quantity: request.quantity,
      lines: request.lines,
      bases: request.bases,
      rates: request.rates,
      companyCurrency,
      date: request.date,
    });
  // Lines all quoted in the order's currency are compared in it and need no rate; a base
  // kept only in the company currency still needs the company route, tried next.
  const itemLines = request.lines.filter(
    (line) => line.itemId === request.itemId,
  );
  const inOrderCurrency =
    request.orderCurrency !== request.companyCurrency &&
    itemLines.length > 0 &&
    itemLines.every((line) => line.currency === request.orderCurrency);
  let result = offers(
    inOrderCurrency ? request.orderCurrency : request.companyCurrency,
  );
  if (inOrderCurrency && result.candidates.length === 0) {
    const viaCompany = offers(request.companyCurrency);
    if (viaCompany.candidates.length > 0) result = viaCompany;
  }
  const best = result.candidates[0];
  if (!best) {
    const problems = result.cannotPrice.flatMap((offer) =>
      offer.problems.map((problem) => sentence(problem.message)),
    );
    return {
      ok: false,
      message:
        problems.length > 0
          ? `The supplier's price cannot be worked out: ${problems.join(" ")}`
          : `The supplier has no price for this item on ${request.date}.`,
    };
  }
  const convert = (amount: MoneyAmount) =>
    convertBetween(amount, best.currency, request);
  if (best.metalBase && best.adderPerKg !== null) {
    const base = convert(best.metalBase.pricePerKg);
    const adder = convert(best.adderPerKg);
    if (!base.ok) return base;
    if (!adder.ok) return adder;
    return {
      ...common(best),
      unitPrice: base.amount + adder.amount,
      metalBasePerKg: base.amount,
      adderPerKg: adder.amount,
      metalBaseFixedAt: request.metalBaseFixedAt,
    };
  }
  const unit = convert(best.quotedUnitPrice);
  if (!unit.ok) return unit;
  return {
    ...common(best),
    unitPrice: unit.amount,
    metalBasePerKg: null,
    adderPerKg: null,
    metalBaseFixedAt: null,
  };
}

const sentence = (text: string) => (/[.!?]$/.test(text) ? text : `${text}.`);

function common(best: {
  supplierSku: string;
  minQuantity: bigint;
  currency: CurrencyCode;
  line: PriceLine;
}) {
  return {
    ok: true as const,
    supplierSku: best.supplierSku,
    minQuantity: best.minQuantity,
    leadTimeDays: best.line.leadTimeDays ?? null,
    quotedCurrency: best.currency,
  };
}

type Converted =
  { ok: true; amount: MoneyAmount } | { ok: false; message: string };

/**
 * An amount in `from` as the order's currency through the company currency (see the
 * module comment), rounded half away from zero to a ten-thousandth at each step.
 */
export function convertBetween(
  amount: MoneyAmount,
  from: CurrencyCode,
  context: Pick<
    OrderLinePricingRequest,
    "orderCurrency" | "companyCurrency" | "rates" | "date"
  >,
): Converted {
  if (from === context.orderCurrency) return { ok: true, amount };
  const missing = (currency: CurrencyCode): Converted => ({
    ok: false,
    message: `No exchange rate for ${currency} on or before ${context.date}: enter one under currency rates to price this line in ${context.orderCurrency}.`,
  });
  let company = amount;
  if (from !== context.companyCurrency) {
    const rate = findExchangeRate(context.rates, from, context.date);
    if (!rate) return missing(from);
    company = convertAmount(amount, rate.rate);
  }
  if (context.orderCurrency === context.companyCurrency)
    return { ok: true, amount: company };
  const orderRate = findExchangeRate(
    context.rates,
    context.orderCurrency,
    context.date,
  );
  if (!orderRate) return missing(context.orderCurrency);
  return {
    ok: true,
    amount: divideHalfAwayFromZero(company * rateScale, orderRate.rate),
  };
}

/** Lead time of a line: the price line's, else the supplier's, else 0 days. */
export function lineLeadTimeDays(
  priceLineDays: number | null | undefined,
  supplierDays: number | null | undefined,
): number {
  return priceLineDays ?? supplierDays ?? 0;
}

/**
 * When a line is expected: the requested date when the buyer gave one, else the order
 * date + lead time. The order date is the day the draft was created, and once sent the
 * day it was sent (`ordered_on`).
 */
export function expectedDateOf(line: {
  requestedDate: CalendarDate | null;
  orderDate: CalendarDate;
  leadTimeDays: number;
}): CalendarDate {
  return line.requestedDate ?? addDays(line.orderDate, line.leadTimeDays);
}

/** The day an order counts lead times from: ordered_on once sent, else the creation day. */
export function orderDateOf(order: {
  orderedOn: CalendarDate | null;
  createdAt: Date;
}): CalendarDate {
  return order.orderedOn ?? dayOf(order.createdAt);
}
