/**
 * Why a price cannot be worked out. Missing reference data is an everyday state for a
 * buyer (the month's copper base not yet entered, no rate for a new currency), so the
 * pricing modules return these as values instead of throwing, and every screen can say
 * what to fix. Each problem carries a ready sentence in `message`.
 */

import type { ConductorKey } from "~/engineering/reference-data";
import { formatQuantityText } from "~/lib/decimal-amounts";
import type { CalendarDate } from "~/lib/calendar-days";
import type { CurrencyCode } from "./money";

/** No metal base for the conductor in the currency on or before the day. */
export interface MissingMetalBase {
  kind: "no-metal-base";
  conductor: ConductorKey;
  currency: CurrencyCode;
  date: CalendarDate;
  message: string;
}

/** No exchange rate from the currency into the company currency on or before the day. */
export interface MissingExchangeRate {
  kind: "no-exchange-rate";
  currency: CurrencyCode;
  companyCurrency: CurrencyCode;
  date: CalendarDate;
  message: string;
}

/** The quantity asked for is below every quantity break of the offer valid on the day. */
export interface BelowSmallestBreak {
  kind: "below-smallest-break";
  /** Thousandths of the item's unit. */
  quantity: bigint;
  /** The smallest minimum quantity valid on the day, thousandths of the item's unit. */
  smallestMinQuantity: bigint;
  date: CalendarDate;
  message: string;
}

/** None of the offer's price lines is valid on the day (used by price history). */
export interface NoPriceOnDate {
  kind: "no-price-on-date";
  date: CalendarDate;
  message: string;
}

export type PricingProblem =
  MissingMetalBase | MissingExchangeRate | BelowSmallestBreak | NoPriceOnDate;

const conductorNames: Record<ConductorKey, string> = {
  copper: "copper",
  aluminium: "aluminium",
};

export function missingMetalBase(
  conductor: ConductorKey,
  currency: CurrencyCode,
  date: CalendarDate,
): MissingMetalBase {
  return {
    kind: "no-metal-base",
    conductor,
    currency,
    date,
    message: `no ${conductorNames[conductor]} base price in ${currency} on or before ${date}`,
  };
}

export function missingExchangeRate(
  currency: CurrencyCode,
  companyCurrency: CurrencyCode,
  date: CalendarDate,
): MissingExchangeRate {
  return {
    kind: "no-exchange-rate",
    currency,
    companyCurrency,
    date,
    message: `no ${currency} to ${companyCurrency} rate on or before ${date}`,
  };
}

export function belowSmallestBreak(
  quantity: bigint,
  smallestMinQuantity: bigint,
  date: CalendarDate,
): BelowSmallestBreak {
  return {
    kind: "below-smallest-break",
    quantity,
    smallestMinQuantity,
    date,
    message: `${formatQuantityText(quantity)} is below the smallest quantity break valid on ${date} (${formatQuantityText(smallestMinQuantity)})`,
  };
}

export function noPriceOnDate(date: CalendarDate): NoPriceOnDate {
  return {
    kind: "no-price-on-date",
    date,
    message: `no price valid on ${date}`,
  };
}
