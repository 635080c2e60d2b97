import { describe, expect, it } from "vitest";
import { receiptUnitCost } from "./receipt-unit-cost";

const rates = [
  { currency: "USD", date: "2026-11-01", rate: 900_000n },
  { currency: "USD", date: "2026-12-01", rate: 920_000n },
];
const bases = [
  {
    conductor: "copper" as const,
    currency: "USD",
    pricePerKg: 91_000n,
    validFrom: "2026-11-01",
  },
  {
    conductor: "copper" as const,
    currency: "USD",
    pricePerKg: 95_000n,
    validFrom: "2026-12-01",
  },
];
const pricing = {
  orderCurrency: "USD",
  companyCurrency: "EUR",
  bases,
  rates,
  receivedOn: "2026-12-03",
};
const fixedAtOrder = {
  unitPrice: 123_457n,
  adderPerKg: 32_000n,
  metalBaseFixedAt: "order" as const,
  conductor: "copper" as const,
};

describe("the unit cost a receipt books (worked examples by hand)", () => {
  it("converts the line's price at the receipt day's rate: 12.3457 USD × 0.92 = 11.04 + 0.318044 = 11.358044 → 11.3580 EUR", () => {
    expect(receiptUnitCost(fixedAtOrder, pricing)).toEqual({
      ok: true,
      unitPrice: 123_457n,
      unitCost: 113_580n,
      rate: 920_000n,
    });
  });

  it("uses the rate in force on the day, not the latest: on 2026-11-20, 12.3457 × 0.90 = 11.11113 → 11.1111 EUR", () => {
    const result = receiptUnitCost(fixedAtOrder, {
      ...pricing,
      receivedOn: "2026-11-20",
    });
    expect(result).toMatchObject({
      ok: true,
      unitCost: 111_111n,
      rate: 900_000n,
    });
  });

  it("prices a base fixed at delivery at that day's base: 9.50 + 3.20 = 12.70 USD/kg × 0.92 = 11.684 EUR/kg", () => {
    const result = receiptUnitCost(
      { ...fixedAtOrder, metalBaseFixedAt: "delivery" },
      pricing,
    );
    expect(result).toEqual({
      ok: true,
      unitPrice: 127_000n,
      unitCost: 116_840n,
      rate: 920_000n,
    });
  });

  it("needs no rate in the company currency", () => {
    expect(
      receiptUnitCost(fixedAtOrder, {
        ...pricing,
        orderCurrency: "EUR",
        rates: [],
      }),
    ).toEqual({
      ok: true,
      unitPrice: 123_457n,
      unitCost: 123_457n,
      rate: null,
    });
  });

  it("says which rate is missing", () => {
    const result = receiptUnitCost(fixedAtOrder, {
      ...pricing,
      receivedOn: "2026-10-31",
    });
    expect(result).toEqual({
      ok: false,
      message:
        "The order is in USD, but there is no USD to EUR rate on or before 2026-10-31: a buyer enters the rate before this delivery is received.",
    });
  });

  it("says which base is missing when the base is fixed at delivery", () => {
    const result = receiptUnitCost(
      { ...fixedAtOrder, metalBaseFixedAt: "delivery", conductor: "aluminium" },
      pricing,
    );
    expect(result.ok).toBe(false);
    expect(!result.ok && result.message).toContain(
      "no aluminium base price in USD on or before 2026-12-03",
    );
  });
});
