import { describe, expect, it } from "vitest";
import { parseQuantity } from "~/lib/decimal-amounts";
import { unitPriceLine } from "~/pricing/price-line.test-support";
import { chooseOrder, roundUpToPack } from "./order-quantity";

const kg = parseQuantity;
const context = {
  itemId: "wire",
  bases: [],
  rates: [],
  companyCurrency: "EUR",
  date: "2026-12-03",
};
const wire = (price: string, overrides = {}) =>
  unitPriceLine(price, {
    itemId: "wire",
    minQuantity: 0n,
    ...overrides,
  });

describe("roundUpToPack", () => {
  it("rounds up to whole packs and leaves whole packs alone", () => {
    expect(roundUpToPack(kg("10"), kg("4"))).toBe(kg("12"));
    expect(roundUpToPack(kg("12"), kg("4"))).toBe(kg("12"));
    expect(roundUpToPack(kg("0.001"), kg("25"))).toBe(kg("25"));
    expect(roundUpToPack(kg("7.5"), undefined)).toBe(kg("7.5"));
  });
});

describe("chooseOrder", () => {
  it("rounds up to the offer's spool size (worked by hand: 10 kg in 4 kg spools is 3 spools, 12 kg)", () => {
    const choice = chooseOrder({
      ...context,
      atLeast: kg("10"),
      lines: [wire("17.00", { packQuantity: kg("4") })],
    });
    expect(choice?.quantity).toBe(kg("12"));
    expect(choice?.packQuantity).toBe(kg("4"));
    // 12 kg × 17.00 = 204.00 EUR (ten-thousandths)
    expect(choice?.candidate.totalForQuantity).toBe(2_040_000n);
  });

  it("raises to a higher break when the order costs less in total (worked by hand: 90 × 2.40 = 216.00 > 100 × 2.10 = 210.00)", () => {
    const lines = [
      wire("2.40", { minQuantity: 0n }),
      wire("2.10", { minQuantity: kg("100") }),
    ];
    const choice = chooseOrder({ ...context, atLeast: kg("90"), lines });
    expect(choice?.quantity).toBe(kg("100"));
    expect(choice?.raisedToBreak).toBe(true);
    expect(choice?.candidate.totalForQuantity).toBe(2_100_000n);
    // 80 × 2.40 = 192.00 < 210.00: the break is not worth it.
    const small = chooseOrder({ ...context, atLeast: kg("80"), lines });
    expect(small?.quantity).toBe(kg("80"));
    expect(small?.raisedToBreak).toBe(false);
  });

  it("buys the smallest break when the need is below every break", () => {
    const choice = chooseOrder({
      ...context,
      atLeast: kg("3"),
      lines: [wire("5.00", { minQuantity: kg("50") })],
    });
    expect(choice?.quantity).toBe(kg("50"));
  });

  it("takes the offer whose order costs least, not the lowest unit price on a larger pack", () => {
    // Hand-worked: 5 kg need. Spools of 25 kg at 8.00 → 200.00; any quantity at 10.00 → 50.00.
    const choice = chooseOrder({
      ...context,
      atLeast: kg("5"),
      lines: [
        wire("8.00", { supplier: "Big Spool", packQuantity: kg("25") }),
        wire("10.00", { supplier: "Small Lots" }),
      ],
    });
    expect(choice?.candidate.supplier).toBe("Small Lots");
    expect(choice?.quantity).toBe(kg("5"));
  });

  it("answers null when no offer can be priced", () => {
    expect(chooseOrder({ ...context, atLeast: kg("1"), lines: [] })).toBeNull();
  });
});
