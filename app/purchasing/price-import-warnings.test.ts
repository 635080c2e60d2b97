import { describe, expect, it } from "vitest";
import type { ExchangeRateEntry } from "~/pricing/currency";
import { isDerivedMetalBase } from "~/pricing/derived-metal-base";
import { priceLine } from "~/pricing/line-price";
import { adderLine } from "~/pricing/price-line.test-support";
import type { MetalBasePrice } from "~/pricing/metal-base";
import { parseMoney, parseRate } from "~/pricing/money";
import {
  PriceImportWarningCollector,
  type PriceImportWarningContext,
} from "./price-import-warnings";

// Invented rates and bases: only whether one exists on the day matters here.
const rates: ExchangeRateEntry[] = [
  { currency: "USD", date: "2026-01-01", rate: parseRate("0.920000") },
  { currency: "CHF", date: "2026-06-01", rate: parseRate("1.050000") },
];
const bases: MetalBasePrice[] = [
  {
    conductor: "copper",
    currency: "EUR",
    pricePerKg: parseMoney("8.5000"),
    validFrom: "2026-01-01",
  },
];
const context: PriceImportWarningContext = {
  companyCurrency: "EUR",
  date: "2026-03-02",
  rates,
  bases,
};

function warningsFor(
  rows: { currency: string; adderConductor?: "copper" | "aluminium" }[],
) {
  const collector = new PriceImportWarningCollector();
  for (const row of rows)
    collector.add(row.currency, row.adderConductor ?? null);
  return collector.warnings(context);
}

describe("warnings at import", () => {
  it("says nothing for unit prices in the company currency", () => {
    expect(warningsFor([{ currency: "EUR" }, { currency: "EUR" }])).toEqual([]);
  });

  it("names a currency without a rate and what it costs: prices that cannot be compared", () => {
    expect(warningsFor([{ currency: "GBP" }, { currency: "GBP" }])).toEqual([
      {
        kind: "no-exchange-rate",
        currency: "GBP",
        message:
          "No GBP rate into EUR (the company currency) on or before 2026-03-02: the best prices cannot be compared with other suppliers' for the items this list prices in GBP until a rate for GBP is entered.",
      },
    ]);
  });

  it("takes a rate dated after the day for missing", () => {
    expect(warningsFor([{ currency: "CHF" }]).map((w) => w.kind)).toEqual([
      "no-exchange-rate",
    ]);
  });

  it("says a wire base missing in the list's currency is derived from the company currency's base at the rate", () => {
    expect(
      warningsFor([
        { currency: "USD", adderConductor: "copper" },
        { currency: "USD", adderConductor: "copper" },
      ]),
    ).toEqual([
      {
        kind: "metal-base-derived",
        currency: "USD",
        conductor: "copper",
        message:
          "No copper base in USD on or before 2026-03-02: the wire prices of this list (adder per kg in USD) will be derived from the copper base in EUR at the USD rate.",
      },
    ]);
  });

  it("says a wire price cannot be computed when there is no base and nothing to derive it from", () => {
    expect(
      warningsFor([{ currency: "GBP", adderConductor: "copper" }]),
    ).toEqual([
      expect.objectContaining({ kind: "no-exchange-rate", currency: "GBP" }),
      {
        kind: "no-metal-base",
        currency: "GBP",
        conductor: "copper",
        message:
          "No copper base in GBP on or before 2026-03-02, and no GBP rate to derive it from the copper base in EUR: the wire prices of this list (adder per kg in GBP) cannot be computed until a copper base in GBP or a rate for GBP is entered.",
      },
    ]);
    expect(
      warningsFor([{ currency: "USD", adderConductor: "aluminium" }]),
    ).toEqual([
      {
        kind: "no-metal-base",
        currency: "USD",
        conductor: "aluminium",
        message:
          "No aluminium base in USD on or before 2026-03-02, and no aluminium base in EUR to derive it from at the USD rate: the wire prices of this list (adder per kg in USD) cannot be computed until an aluminium base in USD or EUR is entered.",
      },
    ]);
    expect(
      warningsFor([{ currency: "EUR", adderConductor: "aluminium" }]),
    ).toEqual([
      {
        kind: "no-metal-base",
        currency: "EUR",
        conductor: "aluminium",
        message:
          "No aluminium base in EUR on or before 2026-03-02: the wire prices of this list (adder per kg in EUR) cannot be computed until an aluminium base in EUR is entered.",
      },
    ]);
  });

  it("says nothing about a base that exists in the list's currency", () => {
    expect(
      warningsFor([{ currency: "EUR", adderConductor: "copper" }]),
    ).toEqual([]);
  });
});

describe("warnings with no base in the company currency either", () => {
  it("says neither a rate nor a base is there to derive it from", () => {
    const collector = new PriceImportWarningCollector();
    collector.add("GBP", "aluminium");
    expect(collector.warnings(context)[1]).toEqual({
      kind: "no-metal-base",
      currency: "GBP",
      conductor: "aluminium",
      message:
        "No aluminium base in GBP on or before 2026-03-02, and neither a rate for GBP nor an aluminium base in EUR to derive it from: the wire prices of this list (adder per kg in GBP) cannot be computed until an aluminium base in GBP (or a rate for GBP and an aluminium base in EUR) is entered.",
    });
  });
});

describe("warnings and pricing agree on the metal base", () => {
  // Every currency and conductor of the context above: the import warns "derived" exactly
  // when pricing uses a derived base, and "no metal base" exactly when pricing cannot.
  const cases = ["EUR", "USD", "CHF", "GBP"].flatMap((currency) =>
    (["copper", "aluminium"] as const).map((conductor) => ({
      currency,
      conductor,
    })),
  );
  it.each(cases)("$conductor in $currency", ({ currency, conductor }) => {
    const [warning] = warningsFor([
      { currency, adderConductor: conductor },
    ]).filter((entry) => entry.kind !== "no-exchange-rate");
    const priced = priceLine(
      adderLine("1.00", {
        currency,
        conductor,
        validFrom: "2026-01-01",
      }),
      context,
    );
    const pricedBase = priced.ok ? priced.metalBase : null;
    const baseProblem =
      !priced.ok &&
      priced.problems.some((problem) => problem.kind === "no-metal-base");
    expect(warning?.kind ?? "kept").toBe(
      baseProblem
        ? "no-metal-base"
        : isDerivedMetalBase(pricedBase)
          ? "metal-base-derived"
          : "kept",
    );
  });
});
