import { describe, expect, it } from "vitest";
import {
  currencyRateSchema,
  supplierPatchSchema,
  supplierSchema,
} from "./supplier-schemas";

const supplier = (currency: string) =>
  supplierSchema.safeParse({ name: "Coil mill", currency });

const currencyMessages = (currency: string) => {
  const parsed = supplier(currency);
  return parsed.success
    ? []
    : parsed.error.issues.map((issue) => issue.message);
};

describe("a supplier's currency", () => {
  it("reads € and £ as EUR and GBP, the signs that stand for one currency", () => {
    expect(supplier("€").data?.currency).toBe("EUR");
    expect(supplier(" £ ").data?.currency).toBe("GBP");
    expect(supplierPatchSchema.parse({ currency: "£" })).toEqual({
      currency: "GBP",
    });
    expect(
      currencyRateSchema.parse({
        currency: "£",
        rate: 1.17,
        validFrom: "2026-01-01",
      }).currency,
    ).toBe("GBP");
  });

  it("keeps reading codes in any case", () => {
    expect(supplier(" usd ").data?.currency).toBe("USD");
    expect(supplier("CNY").data?.currency).toBe("CNY");
  });

  it("asks for a code for $ and kr, naming what the sign may stand for", () => {
    expect(currencyMessages("$")).toEqual([
      "$ stands for several currencies (US, Canadian, Australian and other dollars): write a code such as USD, CAD or AUD.",
    ]);
    expect(currencyMessages("kr")[0]).toMatch(/write SEK, NOK or DKK\.$/);
  });

  it("refuses what is not a 3-letter code with the hint", () => {
    for (const text of ["EURO", "E", "", "€€", "12€"])
      expect(currencyMessages(text)).toEqual([
        "Give the currency as a 3-letter ISO 4217 code, e.g. EUR.",
      ]);
  });
});

describe("a supplier's ordering settings", () => {
  const messages = (input: Record<string, unknown>) => {
    const parsed = supplierSchema.safeParse({
      name: "Coil mill",
      currency: "EUR",
      ...input,
    });
    return parsed.success
      ? {}
      : Object.fromEntries(
          parsed.error.issues.map((issue) => [issue.path[0], issue.message]),
        );
  };

  it("starts with the base fixed at order, wire 10 % and pieces 0 % (common practice)", () => {
    const parsed = supplierSchema.parse({ name: "Coil mill", currency: "EUR" });
    expect(parsed).toMatchObject({
      metalBaseFixedAt: "order",
      wireTolerancePercent: 10,
      pieceTolerancePercent: 0,
    });
    expect(parsed.orderEmail).toBeUndefined();
  });

  it("takes tolerances from 0 to 100 % with up to 2 decimals", () => {
    expect(
      messages({ wireTolerancePercent: 0, pieceTolerancePercent: 100 }),
    ).toEqual({});
    expect(messages({ wireTolerancePercent: 7.25 })).toEqual({});
    expect(messages({ wireTolerancePercent: -1 })).toEqual({
      wireTolerancePercent: "The wire tolerance cannot be negative.",
    });
    expect(messages({ pieceTolerancePercent: 100.01 })).toEqual({
      pieceTolerancePercent: "The piece tolerance is at most 100 %.",
    });
    expect(messages({ wireTolerancePercent: 2.125 })).toEqual({
      wireTolerancePercent: "The wire tolerance has at most 2 decimals.",
    });
  });

  it("checks the order address and the fixing, field by field", () => {
    expect(
      messages({ orderEmail: "orders@mill", metalBaseFixedAt: "invoice" }),
    ).toEqual({
      orderEmail: "Give a valid e-mail address for orders.",
      metalBaseFixedAt: "The metal base is fixed at order or at delivery.",
    });
    expect(
      messages({
        orderEmail: "orders@mill.example",
        metalBaseFixedAt: "delivery",
      }),
    ).toEqual({});
  });

  it("patches only what is sent; null clears the order address", () => {
    expect(supplierPatchSchema.parse({ pieceTolerancePercent: 2 })).toEqual({
      pieceTolerancePercent: 2,
    });
    expect(supplierPatchSchema.parse({ orderEmail: null })).toEqual({
      orderEmail: null,
    });
    expect(
      supplierPatchSchema.safeParse({ wireTolerancePercent: 150 }).success,
    ).toBe(false);
  });
});
