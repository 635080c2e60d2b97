/**
 * A metal base in a supplier's currency when the buyer keeps none in it: the company
 * currency's base for the conductor, converted at the rate into the supplier's currency.
 * Rates are kept as company currency per 1 unit of the foreign currency (see
 * `currency.ts`), so the base in the foreign currency is the company base ÷ the rate
 * (the same as × the inverse rate): 9.0000 EUR/kg at 0.920000 EUR/USD → 9.7826 USD/kg,
 * rounded half away from zero to a ten-thousandth like every other amount (decision 006).
 *
 * A base the buyer entered in the supplier's own currency always wins: the supplier
 * invoices adder and base together, and its own index is what it will charge. The derived
 * base is an estimate and says where it came from, so every screen can name it.
 */

import { latestOnOrBefore, type CalendarDate } from "~/lib/calendar-days";
import { findExchangeRate, type ExchangeRateEntry } from "./currency";
import { findMetalBase, type MetalBasePrice } from "./metal-base";
import { rateScale, type CurrencyCode } from "./money";
import { divideHalfAwayFromZero } from "~/lib/decimal-amounts";
import type { MissingMetalBase } from "./pricing-problems";
import type { ConductorKey } from "~/engineering/reference-data";

/** A base worked out from the company currency's base and a rate, with both named. */
export interface DerivedMetalBase extends MetalBasePrice {
  derivedFrom: {
    /** The company currency's base it was converted from. */
    base: MetalBasePrice;
    /** The rate used: company currency per 1 unit of the derived base's currency. */
    rate: ExchangeRateEntry;
  };
}

export interface DeriveMetalBaseRequest {
  conductor: ConductorKey;
  /** The currency the base is wanted in (the supplier's). */
  currency: CurrencyCode;
  companyCurrency: CurrencyCode;
  bases: readonly MetalBasePrice[];
  rates: readonly ExchangeRateEntry[];
  /** The day whose base applies. */
  date: CalendarDate;
  /** The day whose rate applies; the base's day unless the caller prices at another day's rate. */
  rateDate?: CalendarDate;
}

/**
 * The base for `conductor` in `currency` on `date` derived from the company currency's
 * base valid that day and the rate valid on `rateDate`; null when either is missing (the
 * caller reports the missing base and rate as separate problems) or when `currency` is the
 * company currency itself (nothing to convert).
 */
export function deriveMetalBase(
  request: DeriveMetalBaseRequest,
): DerivedMetalBase | null {
  if (request.currency === request.companyCurrency) return null;
  const companyBase = latestOnOrBefore(
    request.bases.filter(
      (entry) =>
        entry.conductor === request.conductor &&
        entry.currency === request.companyCurrency,
    ),
    (entry) => entry.validFrom,
    request.date,
  );
  const rate = findExchangeRate(
    request.rates,
    request.currency,
    request.rateDate ?? request.date,
  );
  if (!companyBase || !rate || rate.rate <= 0n) return null;
  return {
    conductor: request.conductor,
    currency: request.currency,
    pricePerKg: divideHalfAwayFromZero(
      companyBase.pricePerKg * rateScale,
      rate.rate,
    ),
    validFrom: companyBase.validFrom,
    derivedFrom: { base: companyBase, rate },
  };
}

/** Where a wire line's metal base comes from: kept in its currency, derived, or missing (and what is lacking). */
export type MetalBaseSource =
  | { source: "kept"; base: MetalBasePrice }
  | { source: "derived"; base: DerivedMetalBase }
  | {
      source: "missing";
      problem: MissingMetalBase;
      /** What a derived base would need and is not there; both false in the company currency. */
      lacking: { rate: boolean; companyBase: boolean };
    };

/**
 * The base for `conductor` in `currency`: the one the buyer keeps in that currency, else one
 * derived by {@link deriveMetalBase}, else missing with the reason. The one rule pricing and
 * the import's warnings both follow.
 */
export function metalBaseFor(request: DeriveMetalBaseRequest): MetalBaseSource {
  const kept = findMetalBase(
    request.bases,
    request.conductor,
    request.currency,
    request.date,
  );
  if (kept.ok) return { source: "kept", base: kept.base };
  const derived = deriveMetalBase(request);
  if (derived) return { source: "derived", base: derived };
  const foreign = request.currency !== request.companyCurrency;
  const rate = findExchangeRate(
    request.rates,
    request.currency,
    request.rateDate ?? request.date,
  );
  return {
    source: "missing",
    problem: kept.problem,
    lacking: {
      rate: foreign && (!rate || rate.rate <= 0n),
      companyBase:
        foreign &&
        !findMetalBase(
          request.bases,
          request.conductor,
          request.companyCurrency,
          request.date,
        ).ok,
    },
  };
}

/** True for a base worked out by {@link deriveMetalBase} rather than entered by the buyer. */
export function isDerivedMetalBase(
  base: MetalBasePrice | null | undefined,
): base is DerivedMetalBase {
  return base !== null && base !== undefined && "derivedFrom" in base;
}
