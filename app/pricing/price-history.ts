/**
 * An item's unit price over time, one series per offer (supplier and SKU), for a chart.
 * A price moves on the days a line starts or ends, and for adder lines on the days a new
 * metal base starts; a foreign price in the company currency also moves with the rate.
 * Each series has a point on each such day where the price changed, priced with the
 * line, base and rate valid on that day. A day with no price (no line valid, quantity
 * below every break, base or rate missing) is a point with `unitPrice: null` and the
 * problems, so a chart breaks the line there instead of drawing through it.
 */

import {
  assertCalendarDate,
  dayAfter,
  type CalendarDate,
} from "~/lib/calendar-days";
import type { ExchangeRateEntry } from "./currency";
import { priceLine } from "./line-price";
import type { MetalBasePrice } from "./metal-base";
import type { CurrencyCode, MoneyAmount } from "./money";
import {
  compareOffers,
  type PriceLine,
  type PriceLineSource,
} from "./price-line";
import {
  belowSmallestBreak,
  noPriceOnDate,
  type PricingProblem,
} from "./pricing-problems";
import { applicableBreak, groupByOffer } from "./quantity-breaks";

export interface PriceHistoryRequest {
  itemId: string;
  /** The quantity whose break is charted, thousandths of the item's unit. */
  quantity: bigint;
  lines: readonly PriceLine[];
  bases: readonly MetalBasePrice[];
  rates: readonly ExchangeRateEntry[];
  companyCurrency: CurrencyCode;
  /** First day shown: the price standing on it is the first point. Default: the first price. */
  from?: CalendarDate;
  /** Last day shown (inclusive). Default: the last change. */
  to?: CalendarDate;
}

export interface PriceHistoryPoint {
  /** The day this price starts; it stands until the next point. */
  date: CalendarDate;
  /** Unit price in the company currency at the rate of the day, ten-thousandths; null: no price. */
  unitPrice: MoneyAmount | null;
  /** Unit price as quoted in the offer's currency (adder lines: adder + base); null: no price. */
  quotedUnitPrice: MoneyAmount | null;
  /** The line that applied; null when none did. */
  sourceLine: PriceLineSource | null;
  /** Why there is no price; empty when priced. */
  problems: PricingProblem[];
}

export interface PriceHistorySeries {
  supplier: string;
  supplierSku: string;
  currency: CurrencyCode;
  /** In date order, one point per change. */
  points: PriceHistoryPoint[];
}

/** The price history of an item for a quantity, one series per offer, sorted by supplier. */
export function priceHistory(
  request: PriceHistoryRequest,
): PriceHistorySeries[] {
  if (request.from !== undefined) assertCalendarDate(request.from, "from");
  if (request.to !== undefined) assertCalendarDate(request.to, "to");
  const itemLines = request.lines.filter(
    (line) => line.itemId === request.itemId,
  );
  return groupByOffer(itemLines)
    .map((offerLines) => offerSeries(offerLines, request))
    .filter((series) => series.points.length > 0)
    .sort(compareOffers);
}

function offerSeries(
  lines: PriceLine[],
  request: PriceHistoryRequest,
): PriceHistorySeries {
  const offer = lines[0]!;
  const points: PriceHistoryPoint[] = [];
  for (const date of changeDays(lines, request)) {
    const point = pointOn(date, lines, request);
    const previous = points.at(-1);
    if (!previous || !samePrice(previous, point)) points.push(point);
  }
  return {
    supplier: offer.supplier,
    supplierSku: offer.supplierSku,
    currency: offer.currency,
    points,
  };
}

/** Days the offer's price can change, from its first validFrom, clipped to from…to. */
function changeDays(
  lines: PriceLine[],
  request: PriceHistoryRequest,
): CalendarDate[] {
  const days = new Set<CalendarDate>();
  for (const line of lines) {
    days.add(line.validFrom);
    if (line.validTo !== undefined) days.add(dayAfter(line.validTo));
    if (line.pricing === "metal-base-adder") {
      // A base in the line's currency, or in the company currency, from which a missing one
      // is derived (see derived-metal-base.ts).
      const derivesFromCompanyBase = line.currency !== request.companyCurrency;
      for (const base of request.bases) {
        if (
          base.conductor === line.conductor &&
          (base.currency === line.currency ||
            (derivesFromCompanyBase &&
              base.currency === request.companyCurrency))
        ) {
          days.add(base.validFrom);
        }
      }
    }
    if (line.currency !== request.companyCurrency) {
      for (const rate of request.rates) {
        if (rate.currency === line.currency) days.add(rate.date);
      }
    }
  }
  const firstPrice = lines.reduce(
    (first, line) => (line.validFrom < first ? line.validFrom : first),
    lines[0]!.validFrom,
  );
  const start =
    request.from !== undefined && request.from > firstPrice
      ? request.from
      : firstPrice;
  days.add(start);
  return [...days]
    .filter(
      (day) => day >= start && (request.to === undefined || day <= request.to),
    )
    .sort();
}

function pointOn(
  date: CalendarDate,
  lines: PriceLine[],
  request: PriceHistoryRequest,
): PriceHistoryPoint {
  const choice = applicableBreak(lines, request.quantity, date);
  if (choice.kind !== "applies") {
    const problem =
      choice.kind === "none-valid"
        ? noPriceOnDate(date)
        : belowSmallestBreak(
            request.quantity,
            choice.smallestMinQuantity,
            date,
          );
    return {
      date,
      unitPrice: null,
      quotedUnitPrice: null,
      sourceLine: null,
      problems: [problem],
    };
  }
  const price = priceLine(choice.line, {
    companyCurrency: request.companyCurrency,
    rates: request.rates,
    bases: request.bases,
    date,
    rateDay: "pricing-date",
  });
  if (!price.ok) {
    return {
      date,
      unitPrice: null,
      quotedUnitPrice: null,
      sourceLine: choice.line.sourceLine,
      problems: price.problems,
    };
  }
  return {
    date,
    unitPrice: price.convertedUnitPrice,
    quotedUnitPrice: price.quotedUnitPrice,
    sourceLine: choice.line.sourceLine,
    problems: [],
  };
}

/** Same figures and same reasons: the later point adds nothing to a chart. */
function samePrice(a: PriceHistoryPoint, b: PriceHistoryPoint): boolean {
  return (
    a.unitPrice === b.unitPrice &&
    a.quotedUnitPrice === b.quotedUnitPrice &&
    a.problems.map((problem) => problem.kind).join() ===
      b.problems.map((problem) => problem.kind).join()
  );
}
