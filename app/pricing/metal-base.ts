/**
 * Wire priced as metal base plus fabrication adder. Magnet wire is quoted per kg of
 * enamelled wire as a copper or aluminium base (an index the buyer enters, usually once a
 * month) plus an adder for drawing and enamelling (engineering brief, "Money"). The full
 * price per kg on a day is the adder plus the latest base of the conductor dated on or
 * before that day, in the same currency as the adder.
 *
 * A base is looked up in the adder's own currency and never converted: the supplier
 * invoices adder and base together in one currency, so the buyer keeps a base per
 * currency the suppliers quote in.
 */

import type { ConductorKey } from "~/engineering/reference-data";
import { latestOnOrBefore, type CalendarDate } from "~/lib/calendar-days";
import {
  amountForQuantity,
  parseExactDecimal,
  type CurrencyCode,
  type ExactDecimal,
  type MoneyAmount,
} from "./money";
import type { AdderPriceLine } from "./price-line";
import { missingMetalBase, type MissingMetalBase } from "./pricing-problems";

/** One metal base price as the buyer enters it. */
export interface MetalBasePrice {
  conductor: ConductorKey;
  currency: CurrencyCode;
  /** Base price per kg in `currency`, ten-thousandths. */
  pricePerKg: MoneyAmount;
  /** First day the base applies; it stands until a later base for the same metal and currency. */
  validFrom: CalendarDate;
}

export type MetalBaseLookup =
  { ok: true; base: MetalBasePrice } | { ok: false; problem: MissingMetalBase };

/** The base for a conductor in a currency on a day: the latest with validFrom ≤ date. */
export function findMetalBase(
  bases: readonly MetalBasePrice[],
  conductor: ConductorKey,
  currency: CurrencyCode,
  date: CalendarDate,
): MetalBaseLookup {
  const base = latestOnOrBefore(
    bases.filter(
      (entry) => entry.conductor === conductor && entry.currency === currency,
    ),
    (entry) => entry.validFrom,
    date,
  );
  return base
    ? { ok: true, base }
    : { ok: false, problem: missingMetalBase(conductor, currency, date) };
}

/** Full wire price per kg: adder per kg + base per kg, both in one currency, ten-thousandths. */
export function fullWirePricePerKg(
  adderPerKg: MoneyAmount,
  basePerKg: MoneyAmount,
): MoneyAmount {
  return adderPerKg + basePerKg;
}

export type WirePriceOnDate =
  | { ok: true; pricePerKg: MoneyAmount; base: MetalBasePrice }
  | { ok: false; problem: MissingMetalBase };

/** The full price per kg of an adder-priced wire on a day, with the base it used. */
export function wirePricePerKgOn(
  adder: {
    adderPerKg: MoneyAmount;
    conductor: ConductorKey;
    currency: CurrencyCode;
  },
  bases: readonly MetalBasePrice[],
  date: CalendarDate,
): WirePriceOnDate {
  const lookup = findMetalBase(bases, adder.conductor, adder.currency, date);
  if (!lookup.ok) return lookup;
  return {
    ok: true,
    pricePerKg: fullWirePricePerKg(adder.adderPerKg, lookup.base.pricePerKg),
    base: lookup.base,
  };
}

export interface RepricedAdderLine<
  Line extends AdderPriceLine = AdderPriceLine,
> {
  line: Line;
  /** adder + the given base, per kg in the line's currency, ten-thousandths. */
  pricePerKg: MoneyAmount;
}

/**
 * Every adder line that a base applies to (same conductor and currency), priced against
 * that base: what moves when the buyer enters a new base, or the "what if copper were …"
 * figure. Lines of another conductor or currency are left out.
 */
export function repriceForBase<Line extends AdderPriceLine>(
  lines: readonly Line[],
  base: Pick<MetalBasePrice, "conductor" | "currency" | "pricePerKg">,
): RepricedAdderLine<Line>[] {
  return lines
    .filter(
      (line) =>
        line.conductor === base.conductor && line.currency === base.currency,
    )
    .map((line) => ({
      line,
      pricePerKg: fullWirePricePerKg(line.adderPerKg, base.pricePerKg),
    }));
}

/**
 * Cost of a mass of wire at a price per kg, in the price's currency, rounded half away
 * from zero to a ten-thousandth (see `money.ts`). Carry the mass as exactly as it is
 * known: a coil's wound mass rounded to 29.94 g first gives 0.3743 at 12.50/kg, where the
 * unrounded 29.9396 g gives 0.3742.
 */
export function wireCost(
  massKg: ExactDecimal,
  pricePerKg: MoneyAmount,
): MoneyAmount {
  return amountForQuantity(massKg, pricePerKg);
}

/**
 * A mass from the engineering estimates (a float in kg) as an exact decimal to a tenth of
 * a milligram, the point where physical estimates stop and money starts.
 */
export function massKgFromEstimate(massKg: number): ExactDecimal {
  if (!Number.isFinite(massKg))
    throw new RangeError(`mass ${massKg} kg is not a number`);
  return parseExactDecimal(massKg.toFixed(7));
}
