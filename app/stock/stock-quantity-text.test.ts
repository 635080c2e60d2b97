import { describe, expect, it } from "vitest";
import {
  formatSignedStockQuantity,
  formatStockQuantity,
  formatUnitCost,
} from "./stock-quantity-text";

const nbsp = "\u00a0";

// English: "1 piece", "2 pieces" (CLDR plural rule "one" for the integer 1 only, which
// Intl.PluralRules implements); "kg" and "m" are SI symbols and do not take a plural.
describe("stock quantities as they read", () => {
  it("writes pieces as a word, singular for exactly one", () => {
    expect(formatStockQuantity(1, "pcs")).toBe(`1${nbsp}piece`);
    expect(formatStockQuantity(120, "pcs")).toBe(`120${nbsp}pieces`);
    expect(formatStockQuantity(0, "pcs")).toBe(`0${nbsp}pieces`);
  });

  it("keeps kilograms and metres to three places with their symbol", () => {
    expect(formatStockQuantity(4.8, "kg")).toBe(`4.800${nbsp}kg`);
    expect(formatStockQuantity(1, "m")).toBe(`1.000${nbsp}m`);
  });

  it("keeps the sign of a change and the noun of its size", () => {
    expect(formatSignedStockQuantity(-1, "pcs")).toBe(`−1${nbsp}piece`);
    expect(formatSignedStockQuantity(-2, "pcs")).toBe(`−2${nbsp}pieces`);
    expect(formatSignedStockQuantity(4.8, "kg")).toBe(`+4.800${nbsp}kg`);
  });

  it("names the unit of a unit cost in the singular", () => {
    expect(formatUnitCost(0.85, "pcs")).toBe("0.8500 per piece");
    expect(formatUnitCost(14.2, "kg")).toBe("14.2000 per kg");
  });
});
