import { describe, expect, it } from "vitest";
import { divideHalfAwayFromZero } from "~/lib/decimal-amounts";
import {
  amountForQuantity,
  convertAmount,
  formatExactDecimal,
  formatMoney,
  formatMoneyText,
  formatRateText,
  fromThousandths,
  gramsToKilograms,
  parseExactDecimal,
  parseMoney,
  parseRate,
  rescale,
} from "./money";

describe("money and rates as BigInt", () => {
  it("reads money to the ten-thousandth and rates to the millionth (worked by hand)", () => {
    expect(parseMoney("12.50")).toBe(125000n);
    expect(formatMoneyText(125000n)).toBe("12.5000");
    expect(parseRate("1.085000")).toBe(1085000n);
    expect(parseRate("0.92")).toBe(920000n);
    expect(parseRate("1.08500000")).toBe(1085000n);
    expect(formatRateText(920000n)).toBe("0.920000");
  });

  it("refuses a rate that is zero, negative, too fine or not a number", () => {
    expect(() => parseRate("0")).toThrow(RangeError);
    expect(() => parseRate("-1.2")).toThrow(RangeError);
    expect(() => parseRate("1.0850001")).toThrow(RangeError);
    expect(() => parseRate("1e3")).toThrow(RangeError);
    expect(() => parseMoney("1.23456")).toThrow(RangeError);
  });

  it("keeps any decimal exactly", () => {
    expect(parseExactDecimal("0.0299396")).toEqual({
      digits: 299396n,
      decimals: 7,
    });
    expect(parseExactDecimal("-12")).toEqual({ digits: -12n, decimals: 0 });
    expect(formatExactDecimal({ digits: 299396n, decimals: 7 })).toBe(
      "0.0299396",
    );
    expect(formatExactDecimal({ digits: -5n, decimals: 3 })).toBe("-0.005");
    expect(formatExactDecimal({ digits: 42n, decimals: 0 })).toBe("42");
    expect(gramsToKilograms(parseExactDecimal("29.94"))).toEqual({
      digits: 2994n,
      decimals: 5,
    });
    expect(fromThousandths(4800n)).toEqual({ digits: 4800n, decimals: 3 });
  });
});

describe("rounding half away from zero", () => {
  it("rounds ties away from zero and everything else to the nearest (worked by hand)", () => {
    expect(divideHalfAwayFromZero(5n, 2n)).toBe(3n);
    expect(divideHalfAwayFromZero(-5n, 2n)).toBe(-3n);
    expect(divideHalfAwayFromZero(5n, -2n)).toBe(-3n);
    expect(divideHalfAwayFromZero(7n, 3n)).toBe(2n);
    expect(divideHalfAwayFromZero(8n, 3n)).toBe(3n);
    expect(() => divideHalfAwayFromZero(1n, 0n)).toThrow(RangeError);
    expect(rescale({ digits: 37425n, decimals: 5 }, 4)).toBe(3743n);
    expect(rescale({ digits: 37424n, decimals: 5 }, 4)).toBe(3742n);
    expect(rescale({ digits: 12n, decimals: 1 }, 4)).toBe(12000n);
  });

  it("prices a quantity exactly, then rounds once (worked by hand)", () => {
    // 0.02994 kg × 12.5000 = 0.374250 exactly: a tie, so 0.3743.
    expect(
      amountForQuantity({ digits: 2994n, decimals: 5 }, parseMoney("12.50")),
    ).toBe(3743n);
    // 100 pcs × 2.0240 = 202.4000.
    expect(
      amountForQuantity(fromThousandths(100_000n), parseMoney("2.024")),
    ).toBe(2024000n);
  });

  it("converts at a rate (worked by hand)", () => {
    // 10.00 USD at 0.92 EUR per USD = 9.2000 EUR.
    expect(
      formatMoneyText(convertAmount(parseMoney("10.00"), parseRate("0.92"))),
    ).toBe("9.2000");
    // 3.3333 GBP at 1.172345 = 3.9077775885 → 3.9078 EUR.
    expect(
      formatMoneyText(
        convertAmount(parseMoney("3.3333"), parseRate("1.172345")),
      ),
    ).toBe("3.9078");
    // 1.2345 USD at 0.5 = 0.61725, a tie → 0.6173.
    expect(
      formatMoneyText(convertAmount(parseMoney("1.2345"), parseRate("0.5"))),
    ).toBe("0.6173");
  });
});

describe("money for people", () => {
  it("shows the currency beside the number and groups thousands, without floats", () => {
    expect(formatMoney(parseMoney("1234.5678"), "EUR")).toBe(
      "1,234.5678\u00a0EUR",
    );
    expect(formatMoney(parseMoney("1234.5678"), "EUR", { decimals: 2 })).toBe(
      "1,234.57\u00a0EUR",
    );
    expect(formatMoney(parseMoney("12.5"), "EUR", { per: "kg" })).toBe(
      "12.5000\u00a0EUR/kg",
    );
    expect(
      formatMoney(parseMoney("-1234567.005"), "USD", { decimals: 2 }),
    ).toBe("-1,234,567.01\u00a0USD");
    expect(formatMoney(parseMoney("0.5"), "GBP", { decimals: 0 })).toBe(
      "1\u00a0GBP",
    );
    // 2^53 + 1 cents: beyond what a float holds exactly.
    expect(formatMoney(90071992547409930001n, "EUR", { decimals: 2 })).toBe(
      "9,007,199,254,740,993.00\u00a0EUR",
    );
  });
});
