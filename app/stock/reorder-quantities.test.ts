import { describe, expect, it } from "vitest";
import { quantityToPrice, suggestedOrderQuantity } from "./reorder-quantities";

// Quantities in thousandths of the unit: 5_000n is 5 kg.
describe("what to order", () => {
  it("suggests the reorder quantity, or the shortfall when that is larger", () => {
    expect(
      suggestedOrderQuantity({
        available: 3_000n,
        reorderPoint: 5_000n,
        reorderQuantity: 10_000n,
      }),
    ).toBe(10_000n);
    // Reserved beyond on hand makes available negative: 5 − (−8) = 13 kg short.
    expect(
      suggestedOrderQuantity({
        available: -8_000n,
        reorderPoint: 5_000n,
        reorderQuantity: 10_000n,
      }),
    ).toBe(13_000n);
  });
});

describe("the quantity an item is priced at", () => {
  it("is the suggested order, or one unit when nothing is to be ordered", () => {
    // Low by 3 kg with no reorder quantity: the shortfall, 3 kg.
    expect(
      quantityToPrice({
        available: 7_000n,
        reorderPoint: 10_000n,
        reorderQuantity: 0n,
      }),
    ).toBe(3_000n);
    // Low by half a kilogram with a 25 kg reorder quantity: the reorder quantity.
    expect(
      quantityToPrice({
        available: 9_500n,
        reorderPoint: 10_000n,
        reorderQuantity: 25_000n,
      }),
    ).toBe(25_000n);
    // Not low, no reorder quantity: one unit, not nothing.
    expect(
      quantityToPrice({
        available: 40_000n,
        reorderPoint: 10_000n,
        reorderQuantity: 0n,
      }),
    ).toBe(1_000n);
  });
});
