import { describe, expect, it } from "vitest";
import {
  formatQuantityText,
  movingAverageAfterReceipt,
  parseQuantity,
  parseUnitCost,
  quantityFromNumber,
  roundedAmountText,
  valueOf,
} from "./decimal-amounts";

describe("quantities in thousandths", () => {
  it("reads and writes DECIMAL(14,3) text exactly", () => {
    expect(parseQuantity("12.345")).toBe(12345n);
    expect(parseQuantity("-0.5")).toBe(-500n);
    expect(parseQuantity("7")).toBe(7000n);
    expect(formatQuantityText(12345n)).toBe("12.345");
    expect(formatQuantityText(-500n)).toBe("-0.500");
  });
  it("refuses a fourth decimal and non-numbers", () => {
    expect(() => parseQuantity("1.2345")).toThrow(RangeError);
    expect(() => parseQuantity("1e3")).toThrow(RangeError);
    expect(quantityFromNumber(1.2345)).toBeNull();
    expect(quantityFromNumber(0.1 + 0.2)).toBe(300n);
  });
  it("adds without the drift of binary floating point", () => {
    // 0.1 + 0.2 in binary floating point is 0.30000000000000004 (IEEE 754, common knowledge).
    let sum = 0n;
    for (let index = 0; index < 1000; index += 1) sum += parseQuantity("0.001");
    expect(formatQuantityText(sum)).toBe("1.000");
  });
});

describe("moving average cost", () => {
  it("weights the old average by what is on hand (worked example)", () => {
    // 10 kg at 12.0000 + 5 kg at 15.0000 → (120 + 75) / 15 = 13.0000 per kg.
    expect(
      movingAverageAfterReceipt({
        onHand: 10_000n,
        averageCost: parseUnitCost("12"),
        received: 5_000n,
        unitCost: parseUnitCost("15"),
      }),
    ).toBe(parseUnitCost("13"));
  });
  it("rounds to the nearest ten-thousandth", () => {
    // 1 kg at 1.0000 + 2 kg at 2.0000 → 5/3 = 1.66666… → 1.6667.
    expect(
      movingAverageAfterReceipt({
        onHand: 1_000n,
        averageCost: 10_000n,
        received: 2_000n,
        unitCost: 20_000n,
      }),
    ).toBe(16_667n);
  });
  it("takes the receipt's cost when nothing was on hand", () => {
    expect(
      movingAverageAfterReceipt({
        onHand: 0n,
        averageCost: 99_999n,
        received: 3_000n,
        unitCost: 123_400n,
      }),
    ).toBe(123_400n);
  });
  it("values stock exactly: 2.500 kg at 14.2000 = 35.5000", () => {
    expect(valueOf(2_500n, 142_000n)).toBe(355_000n);
  });
});

describe("amounts rounded for a file", () => {
  it("rounds half away from zero on the exact amount, never on the float", () => {
    expect(roundedAmountText(1.005, 2)).toBe("1.01");
    expect(roundedAmountText(-1.005, 2)).toBe("-1.01");
    expect(roundedAmountText(2.675, 2)).toBe("2.68");
    expect(roundedAmountText(1.0049, 2)).toBe("1.00");
    expect(roundedAmountText(68.16, 2)).toBe("68.16");
    expect(roundedAmountText(0.00005, 4)).toBe("0.0001");
    expect(roundedAmountText(12.34567, 3)).toBe("12.346");
  });
});
