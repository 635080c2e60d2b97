import { describe, expect, it } from "vitest";
import { formatMoneyText } from "./money";
import type { PriceLine } from "./price-line";
import { pieces, unitPriceLine } from "./price-line.test-support";
import { applicableBreak, groupByOffer, isValidOn } from "./quantity-breaks";

function priceAt(
  lines: readonly PriceLine[],
  quantity: bigint,
  date = "2026-06-01",
): string {
  const choice = applicableBreak(lines, quantity, date);
  if (choice.kind !== "applies") return choice.kind;
  return choice.line.pricing === "unit-price"
    ? formatMoneyText(choice.line.unitPrice)
    : "adder";
}

// 1–99 pcs 2.40, 100–499 pcs 2.10, 500+ pcs 1.95 (a made-up list, worked by hand).
const breaks = [
  unitPriceLine("2.40", { minQuantity: pieces(1) }),
  unitPriceLine("1.95", { minQuantity: pieces(500) }),
  unitPriceLine("2.10", { minQuantity: pieces(100) }),
];

describe("choosing the quantity break", () => {
  it("applies a break from exactly its minimum, and the one below just under it", () => {
    expect(priceAt(breaks, pieces(1))).toBe("2.4000");
    expect(priceAt(breaks, pieces(99))).toBe("2.4000");
    expect(priceAt(breaks, pieces(100))).toBe("2.1000");
    expect(priceAt(breaks, pieces(499))).toBe("2.1000");
    expect(priceAt(breaks, pieces(500))).toBe("1.9500");
    expect(priceAt(breaks, pieces(100_000))).toBe("1.9500");
  });

  it("works in thousandths, so a wire break at 25.000 kg starts at 25.000 kg, not 24.999", () => {
    const wire = [
      unitPriceLine("14.00", { minQuantity: 0n }),
      unitPriceLine("13.20", { minQuantity: 25_000n }),
    ];
    expect(priceAt(wire, 24_999n)).toBe("14.0000");
    expect(priceAt(wire, 25_000n)).toBe("13.2000");
  });

  it("reports a quantity below every break with the smallest break", () => {
    const fromHundred = breaks.slice(1);
    expect(applicableBreak(fromHundred, pieces(99), "2026-06-01")).toEqual({
      kind: "below-smallest-break",
      smallestMinQuantity: pieces(100),
    });
  });

  it("uses only lines valid on the day, validTo included", () => {
    const lines = [
      unitPriceLine("2.40", { validFrom: "2026-01-01", validTo: "2026-03-31" }),
      unitPriceLine("2.55", { validFrom: "2026-04-01" }),
    ];
    expect(priceAt(lines, pieces(10), "2025-12-31")).toBe("none-valid");
    expect(priceAt(lines, pieces(10), "2026-01-01")).toBe("2.4000");
    expect(priceAt(lines, pieces(10), "2026-03-31")).toBe("2.4000");
    expect(priceAt(lines, pieces(10), "2026-04-01")).toBe("2.5500");
    expect(isValidOn(lines[0]!, "2026-04-01")).toBe(false);
    expect(isValidOn(lines[1]!, "2099-01-01")).toBe(true);
  });

  it("lets the newer list win when two open lines share a break", () => {
    const lines = [
      unitPriceLine("2.55", { validFrom: "2026-04-01" }),
      unitPriceLine("2.40", { validFrom: "2026-01-01" }),
    ];
    expect(priceAt(lines, pieces(10), "2026-03-01")).toBe("2.4000");
    expect(priceAt(lines, pieces(10), "2026-05-01")).toBe("2.5500");
  });

  it("does not fall back to a break from a line that has ended", () => {
    const lines = [
      unitPriceLine("2.40", { minQuantity: pieces(1) }),
      unitPriceLine("1.80", {
        minQuantity: pieces(100),
        validTo: "2026-02-28",
      }),
    ];
    expect(priceAt(lines, pieces(200), "2026-02-28")).toBe("1.8000");
    expect(priceAt(lines, pieces(200), "2026-03-01")).toBe("2.4000");
  });
});

describe("offers", () => {
  it("groups lines by supplier and supplier SKU in order of first appearance", () => {
    const a = unitPriceLine("1", { supplier: "Nordmag", supplierSku: "A" });
    const b = unitPriceLine("1", { supplier: "Nordmag", supplierSku: "B" });
    const c = unitPriceLine("1", {
      supplier: "Aster Magnet",
      supplierSku: "A",
    });
    const a2 = unitPriceLine("2", { supplier: "Nordmag", supplierSku: "A" });
    expect(groupByOffer([a, b, c, a2])).toEqual([[a, a2], [b], [c]]);
  });
});
