import { describe, expect, it } from "vitest";
import { bestPrices } from "./best-price";
import type { ExchangeRateEntry } from "./currency";
import {
  deriveMetalBase,
  isDerivedMetalBase,
  type DeriveMetalBaseRequest,
} from "./derived-metal-base";
import type { MetalBasePrice } from "./metal-base";
import { formatMoneyText, parseMoney, parseRate } from "./money";
import { adderLine } from "./price-line.test-support";
import { priceHistory } from "./price-history";

// Expected figures worked with GNU units (`units -t '9 / 0.92'` → 9.7826087), then rounded
// half away from zero to four decimals by hand.

const rates: ExchangeRateEntry[] = [
  { currency: "USD", date: "2026-01-01", rate: parseRate("0.920000") },
  { currency: "USD", date: "2026-02-01", rate: parseRate("0.950000") },
];
const euroCopper: MetalBasePrice = {
  conductor: "copper",
  currency: "EUR",
  pricePerKg: parseMoney("9.00"),
  validFrom: "2026-01-01",
};

function request(
  overrides: Partial<DeriveMetalBaseRequest> = {},
): DeriveMetalBaseRequest {
  return {
    conductor: "copper",
    currency: "USD",
    companyCurrency: "EUR",
    bases: [euroCopper],
    rates,
    date: "2026-01-20",
    ...overrides,
  };
}

describe("a metal base derived from the company currency's base and the rate", () => {
  it("is the company base ÷ the rate (company currency per unit): 9.00 EUR/kg at 0.92 EUR/USD → 9.7826 USD/kg", () => {
    // units -t '9 / 0.92' → 9.7826087 → 9.7826.
    const derived = deriveMetalBase(request());
    expect(derived && formatMoneyText(derived.pricePerKg)).toBe("9.7826");
    expect(derived?.currency).toBe("USD");
    expect(derived?.derivedFrom.base).toBe(euroCopper);
    expect(derived?.derivedFrom.rate).toBe(rates[0]);
    expect(isDerivedMetalBase(derived)).toBe(true);
    expect(isDerivedMetalBase(euroCopper)).toBe(false);
  });

  it("uses the rate valid on the rate day: 0.95 from 2026-02-01 → 9.4737 USD/kg", () => {
    // units -t '9 / 0.95' → 9.4736842 → 9.4737.
    const derived = deriveMetalBase(request({ date: "2026-02-10" }));
    expect(derived && formatMoneyText(derived.pricePerKg)).toBe("9.4737");
    const atQuoteDay = deriveMetalBase(
      request({ date: "2026-02-10", rateDate: "2026-01-15" }),
    );
    expect(atQuoteDay && formatMoneyText(atQuoteDay.pricePerKg)).toBe("9.7826");
  });

  it("rounds half away from zero: 1.0001 EUR/kg at 2.000000 → 0.50005 → 0.5001", () => {
    // units -t '1.0001 / 2' → 0.50005, exactly half a ten-thousandth: rounded up.
    const derived = deriveMetalBase(
      request({
        bases: [{ ...euroCopper, pricePerKg: parseMoney("1.0001") }],
        rates: [{ currency: "USD", date: "2026-01-01", rate: parseRate("2") }],
      }),
    );
    expect(derived && formatMoneyText(derived.pricePerKg)).toBe("0.5001");
  });

  it("derives nothing without a company base, without a rate, or in the company currency", () => {
    expect(deriveMetalBase(request({ bases: [] }))).toBeNull();
    expect(deriveMetalBase(request({ conductor: "aluminium" }))).toBeNull();
    expect(deriveMetalBase(request({ rates: [] }))).toBeNull();
    expect(deriveMetalBase(request({ date: "2025-12-31" }))).toBeNull();
    expect(deriveMetalBase(request({ currency: "EUR" }))).toBeNull();
  });
});

describe("best prices with a derived base", () => {
  const wire = (lines: ReturnType<typeof adderLine>[], bases = [euroCopper]) =>
    bestPrices({
      itemId: "wire-cu-0.80-grade2",
      quantity: 10_000n,
      lines,
      companyCurrency: "EUR",
      rates,
      bases,
      date: "2026-01-20",
    });

  it("prices a USD adder with the EUR base at the rate and says which base it used", () => {
    const dollars = adderLine("3.20", {
      supplier: "Pacific Wire",
      currency: "USD",
    });
    const result = wire([dollars]);
    expect(result.cannotPrice).toEqual([]);
    const [offer] = result.candidates;
    // 3.20 + 9.7826 = 12.9826 USD/kg; units -t '12.9826 * 0.92' → 11.943992 → 11.9440 EUR/kg.
    expect(formatMoneyText(offer!.quotedUnitPrice)).toBe("12.9826");
    expect(formatMoneyText(offer!.convertedUnitPrice)).toBe("11.9440");
    expect(isDerivedMetalBase(offer!.metalBase)).toBe(true);
  });

  it("keeps a base entered in the supplier's currency over a derived one", () => {
    const dollars = adderLine("3.20", { currency: "USD" });
    const usdCopper: MetalBasePrice = {
      ...euroCopper,
      currency: "USD",
      pricePerKg: parseMoney("9.90"),
    };
    const [offer] = wire([dollars], [euroCopper, usdCopper]).candidates;
    // 3.20 + 9.90 = 13.10 USD/kg, the buyer's own USD base.
    expect(formatMoneyText(offer!.quotedUnitPrice)).toBe("13.1000");
    expect(offer!.metalBase).toBe(usdCopper);
  });

  it("lists the missing base and the missing rate as two reasons when neither can be had", () => {
    const yen = adderLine("480", { supplier: "Kiso Wire", currency: "JPY" });
    const [offer] = wire([yen], []).cannotPrice;
    expect(offer!.problems.map((problem) => problem.kind)).toEqual([
      "no-metal-base",
      "no-exchange-rate",
    ]);
  });
});

describe("price history with a derived base", () => {
  it("starts the price on the day the company base it is derived from starts", () => {
    const dollars = adderLine("3.20", {
      supplier: "Pacific Wire",
      currency: "USD",
      validFrom: "2025-12-15",
    });
    const [series] = priceHistory({
      itemId: "wire-cu-0.80-grade2",
      quantity: 10_000n,
      lines: [dollars],
      companyCurrency: "EUR",
      rates: [
        { currency: "USD", date: "2025-12-01", rate: parseRate("0.920000") },
      ],
      bases: [euroCopper],
      to: "2026-01-31",
    });
    expect(
      series!.points.map((point) => [
        point.date,
        point.unitPrice === null
          ? point.problems.map((problem) => problem.kind).join()
          : formatMoneyText(point.unitPrice),
      ]),
    ).toEqual([
      ["2025-12-15", "no-metal-base"],
      // 3.20 + 9.7826 = 12.9826 USD; units -t '12.9826 * 0.92' → 11.943992 → 11.9440 EUR.
      ["2026-01-01", "11.9440"],
    ]);
  });
});
