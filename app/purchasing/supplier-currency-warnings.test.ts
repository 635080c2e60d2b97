import { describe, expect, it } from "vitest";
import {
  supplierCurrencyWarnings,
  type CurrencyCoverage,
} from "./supplier-currency-warnings";

const coverage: CurrencyCoverage = {
  companyCurrency: "EUR",
  rateCurrencies: ["USD"],
  bases: [
    { conductor: "copper", currency: "EUR" },
    { conductor: "aluminium", currency: "EUR" },
    { conductor: "copper", currency: "USD" },
  ],
};

describe("what a supplier's currency is missing", () => {
  it("warns of nothing for the company currency with both bases kept", () => {
    expect(supplierCurrencyWarnings("eur", coverage)).toEqual([]);
  });

  it("warns of nothing until the code has three letters", () => {
    expect(supplierCurrencyWarnings("J", coverage)).toEqual([]);
    expect(supplierCurrencyWarnings(undefined, coverage)).toEqual([]);
  });

  it("names a missing rate and each missing base apart", () => {
    const warnings = supplierCurrencyWarnings("JPY", coverage);
    expect(warnings).toHaveLength(3);
    expect(warnings[0]).toBe(
      "No rate from JPY to EUR is set: this supplier's prices cannot be converted or compared until one is.",
    );
    expect(warnings[1]).toMatch(
      /^No copper base in JPY is set, and without a rate none can be derived/,
    );
    expect(warnings[2]).toMatch(/^No aluminium base in JPY is set/);
  });

  it("says a missing base will be derived when the rate and the company base are there", () => {
    expect(supplierCurrencyWarnings("USD", coverage)).toEqual([
      "No aluminium base in USD is set: wire adders on aluminium will use the EUR base converted at the rate, marked as derived.",
    ]);
  });

  it("reads £ as GBP and € as EUR, as the supplier schema does", () => {
    expect(supplierCurrencyWarnings(" £ ", coverage)).toEqual(
      supplierCurrencyWarnings("GBP", coverage),
    );
    expect(supplierCurrencyWarnings("£", coverage)).toHaveLength(3);
    expect(
      supplierCurrencyWarnings("€", { ...coverage, bases: [] }),
    ).toHaveLength(2);
  });

  it("warns of a missing base in the company currency itself", () => {
    expect(supplierCurrencyWarnings("EUR", { ...coverage, bases: [] })).toEqual(
      [
        "No copper base in EUR is set: wire quoted as an adder on copper cannot be priced until one is.",
        "No aluminium base in EUR is set: wire quoted as an adder on aluminium cannot be priced until one is.",
      ],
    );
  });
});
