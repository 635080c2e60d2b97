/**
 * One price line priced on one day: its unit price in the supplier's currency (for an
 * adder line, adder + the metal base valid on the day) and the same in the company
 * currency. Shared by best price and price history.
 */

import type { CalendarDate } from "~/lib/calendar-days";
import {
  rateDayFor,
  toCompanyCurrency,
  type ExchangeRateEntry,
  type RateDay,
} from "./currency";
import { metalBaseFor } from "./derived-metal-base";
import { fullWirePricePerKg, type MetalBasePrice } from "./metal-base";
import type { CurrencyCode, MoneyAmount } from "./money";
import type { PriceLine } from "./price-line";
import type { PricingProblem } from "./pricing-problems";

/** The reference data a price needs, and the day it is priced for. */
export interface PricingContext {
  /** The currency every price is compared in. */
  companyCurrency: CurrencyCode;
  rates: readonly ExchangeRateEntry[];
  bases: readonly MetalBasePrice[];
  /** The day being priced for ("today" for a current price). Metal bases apply on this day. */
  date: CalendarDate;
  /**
   * Which day's exchange rate converts the price: the pricing day (default, what the
   * price costs now) or the line's validFrom (what it cost when quoted).
   */
  rateDay?: RateDay;
}

export type LinePrice =
  | {
      ok: true;
      /** Unit price in the line's currency, ten-thousandths (adder lines: adder + base). */
      quotedUnitPrice: MoneyAmount;
      /** The same in the company currency, ten-thousandths. */
      convertedUnitPrice: MoneyAmount;
      /** The rate used; null when the line is in the company currency. */
      rate: ExchangeRateEntry | null;
      /**
       * The metal base used; null for a fixed unit price. A base derived from the company
       * currency's base and the rate (none kept in the line's currency) carries `derivedFrom`.
       */
      metalBase: MetalBasePrice | null;
    }
  /** Every problem found at once (base and rate both missing → both), so all can be fixed. */
  | { ok: false; problems: PricingProblem[] };

/** Prices one line under a context. Never throws for missing bases or rates. */
export function priceLine(line: PriceLine, context: PricingContext): LinePrice {
  const problems: PricingProblem[] = [];
  let quotedUnitPrice: MoneyAmount | undefined;
  let metalBase: MetalBasePrice | null = null;
  const rateDate = rateDayFor(
    context.rateDay ?? "pricing-date",
    line.validFrom,
    context.date,
  );
  if (line.pricing === "unit-price") {
    quotedUnitPrice = line.unitPrice;
  } else {
    // No base kept in the line's currency: the company currency's base at the rate, named as such.
    const found = metalBaseFor({
      conductor: line.conductor,
      currency: line.currency,
      companyCurrency: context.companyCurrency,
      bases: context.bases,
      rates: context.rates,
      date: context.date,
      rateDate,
    });
    if (found.source === "missing") {
      problems.push(found.problem);
    } else {
      quotedUnitPrice = fullWirePricePerKg(
        line.adderPerKg,
        found.base.pricePerKg,
      );
      metalBase = found.base;
    }
  }
  // Converted even when the base is missing, so a missing rate is reported in the same pass.
  const conversion = toCompanyCurrency(quotedUnitPrice ?? 0n, line.currency, {
    companyCurrency: context.companyCurrency,
    rates: context.rates,
    date: rateDate,
  });
  if (!conversion.ok) problems.push(conversion.problem);
  if (quotedUnitPrice === undefined || !conversion.ok)
    return { ok: false, problems };
  return {
    ok: true,
    quotedUnitPrice,
    convertedUnitPrice: conversion.amount,
    rate: conversion.rate,
    metalBase,
  };
}
