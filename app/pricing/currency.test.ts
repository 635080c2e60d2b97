import { describe, expect, it } from "vitest";
import {
  findExchangeRate,
  rateDayFor,
  toCompanyCurrency,
  type ExchangeRateEntry,
} from "./currency";
import { formatMoneyText, parseMoney, parseRate } from "./money";

const rates: ExchangeRateEntry[] = [
  { currency: "USD", date: "2026-01-01", rate: parseRate("0.920000") },
  { currency: "USD", date: "2026-02-01", rate: parseRate("0.950000") },
  { currency: "GBP", date: "2026-01-01", rate: parseRate("1.172345") },
];

function convert(amount: string, currency: string, date: string): string {
  const result = toCompanyCurrency(parseMoney(amount), currency, {
    companyCurrency: "EUR",
    rates,
    date,
  });
  return result.ok ? formatMoneyText(result.amount) : result.problem.message;
}

describe("converting into the company currency", () => {
  it("10.00 USD at 0.92 EUR/USD is 9.2000 EUR (worked by hand)", () => {
    expect(convert("10.00", "USD", "2026-01-15")).toBe("9.2000");
    const result = toCompanyCurrency(parseMoney("10.00"), "USD", {
      companyCurrency: "EUR",
      rates,
      date: "2026-01-15",
    });
    expect(result.ok && result.rate).toEqual(rates[0]);
  });

  it("3.3333 GBP at 1.172345 is 3.9078 EUR, exactly rounded (worked by hand)", () => {
    // 3.3333 × 1.172345 = 3.9077775885.
    expect(convert("3.3333", "GBP", "2026-06-30")).toBe("3.9078");
  });

  it("uses the latest rate on or before the day, including the rate's own day", () => {
    expect(convert("10.00", "USD", "2026-01-31")).toBe("9.2000");
    expect(convert("10.00", "USD", "2026-02-01")).toBe("9.5000");
    expect(findExchangeRate(rates, "USD", "2026-12-31")).toBe(rates[1]);
  });

  it("leaves the company currency unchanged without needing a rate", () => {
    const result = toCompanyCurrency(parseMoney("2.4"), "EUR", {
      companyCurrency: "EUR",
      rates: [],
      date: "2026-01-01",
    });
    expect(result).toEqual({ ok: true, amount: parseMoney("2.4"), rate: null });
  });

  it("names the currency and the day when no rate applies", () => {
    expect(convert("10.00", "USD", "2025-12-31")).toBe(
      "no USD to EUR rate on or before 2025-12-31",
    );
    const result = toCompanyCurrency(parseMoney("500"), "JPY", {
      companyCurrency: "EUR",
      rates,
      date: "2026-03-01",
    });
    expect(result).toEqual({
      ok: false,
      problem: {
        kind: "no-exchange-rate",
        currency: "JPY",
        companyCurrency: "EUR",
        date: "2026-03-01",
        message: "no JPY to EUR rate on or before 2026-03-01",
      },
    });
  });

  it("lets the caller pick the price's own day or the pricing day for the rate", () => {
    expect(rateDayFor("price-date", "2026-01-10", "2026-02-15")).toBe(
      "2026-01-10",
    );
    expect(rateDayFor("pricing-date", "2026-01-10", "2026-02-15")).toBe(
      "2026-02-15",
    );
  });
});
