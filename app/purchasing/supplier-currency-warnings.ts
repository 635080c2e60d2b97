/**
 * What a supplier's quoting currency is missing before its prices can be compared: a rate
 * to the company currency, and a copper and an aluminium base in that currency (or the
 * company currency's base and the rate to derive one from, see
 * `pricing/derived-metal-base.ts`). Shown on the supplier forms as the buyer types, and on
 * the supplier's page. Pure: no framework, no I/O.
 */
import type { ConductorKey } from "~/engineering/reference-data";
import { currencyCodeFromText } from "~/price-lists/currencies";

/** The rates and metal bases in force today. */
export interface CurrencyCoverage {
  companyCurrency: string;
  /** Currencies with a rate to the company currency in force. */
  rateCurrencies: readonly string[];
  /** Metal bases in force, as conductor and currency. */
  bases: readonly { conductor: ConductorKey; currency: string }[];
}

const conductors: { key: ConductorKey; name: string }[] = [
  { key: "copper", name: "copper" },
  { key: "aluminium", name: "aluminium" },
];

/** One sentence per thing missing; none for a currency not yet a 3-letter code. */
export function supplierCurrencyWarnings(
  currencyText: string | undefined,
  coverage: CurrencyCoverage,
): string[] {
  const currency = currencyCodeFromText(currencyText ?? "");
  if (!/^[A-Z]{3}$/.test(currency)) return [];
  const company = coverage.companyCurrency;
  const foreign = currency !== company;
  const hasRate = !foreign || coverage.rateCurrencies.includes(currency);
  const hasBase = (conductor: ConductorKey, code: string) =>
    coverage.bases.some(
      (base) => base.conductor === conductor && base.currency === code,
    );
  const warnings: string[] = [];
  if (!hasRate) {
    warnings.push(
      `No rate from ${currency} to ${company} is set: this supplier's prices cannot be converted or compared until one is.`,
    );
  }
  for (const conductor of conductors) {
    if (hasBase(conductor.key, currency)) continue;
    if (!foreign) {
      warnings.push(
        `No ${conductor.name} base in ${currency} is set: wire quoted as an adder on ${conductor.name} cannot be priced until one is.`,
      );
    } else if (hasRate && hasBase(conductor.key, company)) {
      warnings.push(
        `No ${conductor.name} base in ${currency} is set: wire adders on ${conductor.name} will use the ${company} base converted at the rate, marked as derived.`,
      );
    } else {
      warnings.push(
        `No ${conductor.name} base in ${currency} is set${hasRate ? `, nor one in ${company} to derive it from` : `, and without a rate none can be derived from the ${company} base`}: wire quoted as an adder on ${conductor.name} cannot be priced.`,
      );
    }
  }
  return warnings;
}
