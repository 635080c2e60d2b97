/**
 * What an import should warn of without refusing the file: a currency with no
 * rate into the company currency (its prices cannot be compared with other
 * suppliers'), and wire priced on the metal base in a currency with no base for
 * the conductor (the wire price is derived from the company currency's base at
 * the rate, or cannot be worked out at all when there is no rate or no such
 * base). Decided by pricing's own rule (`metalBaseFor`), on the import day.
 *
 * Pure: no I/O.
 */
import type { ConductorKey } from "~/engineering/reference-data";
import type { CalendarDate } from "~/lib/calendar-days";
import { findExchangeRate, type ExchangeRateEntry } from "~/pricing/currency";
import { metalBaseFor } from "~/pricing/derived-metal-base";
import type { MetalBasePrice } from "~/pricing/metal-base";

export type PriceImportWarning =
  | { kind: "no-exchange-rate"; currency: string; message: string }
  | {
      kind: "metal-base-derived" | "no-metal-base";
      currency: string;
      conductor: ConductorKey;
      message: string;
    };

export interface PriceImportWarningContext {
  companyCurrency: string;
  /** The day looked at: the latest rate and base dated on or before it count. */
  date: CalendarDate;
  rates: readonly ExchangeRateEntry[];
  bases: readonly MetalBasePrice[];
}

/** Collects the currencies and the adder rows' metals of a file, row by row, keeping one of each. */
export class PriceImportWarningCollector {
  private readonly currencies = new Set<string>();
  private readonly adderBases = new Map<
    string,
    { currency: string; conductor: ConductorKey }
  >();

  /** One row: its currency, and the conductor of its wire when it is priced as an adder. */
  add(currency: string, adderConductor: ConductorKey | null): void {
    this.currencies.add(currency);
    if (adderConductor)
      this.adderBases.set(`${adderConductor} ${currency}`, {
        currency,
        conductor: adderConductor,
      });
  }

  warnings(context: PriceImportWarningContext): PriceImportWarning[] {
    const warnings: PriceImportWarning[] = [];
    for (const currency of [...this.currencies].sort()) {
      if (!hasRate(currency, context))
        warnings.push({
          kind: "no-exchange-rate",
          currency,
          message: `No ${currency} rate into ${context.companyCurrency} (the company currency) on or before ${context.date}: the best prices cannot be compared with other suppliers' for the items this list prices in ${currency} until a rate for ${currency} is entered.`,
        });
      for (const { conductor } of [...this.adderBases.values()]
        .filter((entry) => entry.currency === currency)
        .sort((a, b) => a.conductor.localeCompare(b.conductor))) {
        const warning = metalBaseWarning(conductor, currency, context);
        if (warning) warnings.push(warning);
      }
    }
    return warnings;
  }
}

function hasRate(currency: string, context: PriceImportWarningContext) {
  return (
    currency === context.companyCurrency ||
    findExchangeRate(context.rates, currency, context.date) !== undefined
  );
}

function metalBaseWarning(
  conductor: ConductorKey,
  currency: string,
  context: PriceImportWarningContext,
): PriceImportWarning | null {
  const { companyCurrency, date } = context;
  const found = metalBaseFor({
    conductor,
    currency,
    companyCurrency,
    bases: context.bases,
    rates: context.rates,
    date,
  });
  if (found.source === "kept") return null;
  const base = (inCurrency: string) =>
    `${conductor === "aluminium" ? "an" : "a"} ${conductor} base in ${inCurrency}`;
  const missing = `No ${conductor} base in ${currency} on or before ${date}`;
  const lines = `the wire prices of this list (adder per kg in ${currency})`;
  const warning = (
    kind: "metal-base-derived" | "no-metal-base",
    text: string,
  ) => ({ kind, currency, conductor, message: text }) as const;

  if (found.source === "derived")
    return warning(
      "metal-base-derived",
      `${missing}: ${lines} will be derived from the ${conductor} base in ${companyCurrency} at the ${currency} rate.`,
    );
  if (currency === companyCurrency)
    return warning(
      "no-metal-base",
      `${missing}: ${lines} cannot be computed until ${base(currency)} is entered.`,
    );
  const { rate: noRate, companyBase: noCompanyBase } = found.lacking;
  const [lacking, enter] = noRate
    ? noCompanyBase
      ? [
          `neither a rate for ${currency} nor ${base(companyCurrency)} to derive it from`,
          `${base(currency)} (or a rate for ${currency} and ${base(companyCurrency)})`,
        ]
      : [
          `no ${currency} rate to derive it from the ${conductor} base in ${companyCurrency}`,
          `${base(currency)} or a rate for ${currency}`,
        ]
    : [
        `no ${conductor} base in ${companyCurrency} to derive it from at the ${currency} rate`,
        `${base(currency)} or ${companyCurrency}`,
      ];
  return warning(
    "no-metal-base",
    `${missing}, and ${lacking}: ${lines} cannot be computed until ${enter} is entered.`,
  );
}
