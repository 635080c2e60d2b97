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
