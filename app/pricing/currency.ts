/**
 * Supplier prices in the company currency. The buyer keeps dated rates, each saying how
 * much company currency one unit of a foreign currency buys on and after its day
 * (EUR company, USD rate 0.920000: 1 USD = 0.92 EUR). A conversion uses the latest rate
 * dated on or before the day asked for; which day (the price's own date or the pricing
 * day) is the caller's choice, see {@link rateDayFor}.
 */

import { latestOnOrBefore, type CalendarDate } from "~/lib/calendar-days";
import {
  convertAmount,
  type CurrencyCode,
  type ExchangeRate,
  type MoneyAmount,
} from "./money";
import {
  missingExchangeRate,
  type MissingExchangeRate,
} from "./pricing-problems";

/** One dated rate as the buyer enters it. */
export interface ExchangeRateEntry {
  /** The foreign currency. */
  currency: CurrencyCode;
  /** First day the rate applies; it stands until a later rate for the same currency. */
  date: CalendarDate;
  /** Company currency per 1 unit of `currency`, millionths. */
  rate: ExchangeRate;
}

/** Which day's rate converts a price: the price's own date, or the day being priced for. */
export type RateDay = "price-date" | "pricing-date";

/** The day whose rate applies under a {@link RateDay} choice. */
export function rateDayFor(
  choice: RateDay,
  priceDate: CalendarDate,
  pricingDate: CalendarDate,
): CalendarDate {
  return choice === "price-date" ? priceDate : pricingDate;
}

export type ConversionResult =
  | {
      ok: true;
      /** The amount in the company currency, ten-thousandths. */
      amount: MoneyAmount;
      /** The rate used; null when the amount was already in the company currency. */
      rate: ExchangeRateEntry | null;
    }
  | { ok: false; problem: MissingExchangeRate };

export interface ConversionContext {
  companyCurrency: CurrencyCode;
  rates: readonly ExchangeRateEntry[];
  /** The day whose rate applies: the latest rate dated on or before it is used. */
  date: CalendarDate;
}

/** The rate for a currency on a day: the latest entry with date ≤ the day, if any. */
export function findExchangeRate(
  rates: readonly ExchangeRateEntry[],
  currency: CurrencyCode,
  date: CalendarDate,
): ExchangeRateEntry | undefined {
  return latestOnOrBefore(
    rates.filter((entry) => entry.currency === currency),
    (entry) => entry.date,
    date,
  );
}

/**
 * An amount (a unit price, an adder, a total) in `currency` as company currency, rounded
 * half away from zero to a ten-thousandth. The company currency converts to itself
 * unchanged and needs no rate.
 */
export function toCompanyCurrency(
  amount: MoneyAmount,
  currency: CurrencyCode,
  context: ConversionContext,
): ConversionResult {
  if (currency === context.companyCurrency)
    return { ok: true, amount, rate: null };
  const rate = findExchangeRate(context.rates, currency, context.date);
  if (!rate) {
    return {
      ok: false,
      problem: missingExchangeRate(
        currency,
        context.companyCurrency,
        context.date,
      ),
    };
  }
  return { ok: true, amount: convertAmount(amount, rate.rate), rate };
}
