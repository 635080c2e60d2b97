import { describe, expect, it } from "vitest";
import {
  decimalsForSignificant,
  formatMass,
  formatPercentPerKelvin,
  formatRange,
  formatSignificant,
} from "./quantity-display";

const plain = (text: string) => text.replace(/\u00a0/g, " ");

describe("quantity display", () => {
  it("keeps four significant figures across magnitudes (wire areas from 4/0 to 0.020 mm)", () => {
    expect(decimalsForSignificant(107.22, 4)).toBe(1);
    expect(decimalsForSignificant(0.5176, 4)).toBe(4);
    expect(decimalsForSignificant(0.000314, 4)).toBe(7);
    expect(decimalsForSignificant(0, 4)).toBe(0);
    expect(plain(formatSignificant(0.51759, "mm²"))).toBe("0.5176 mm²");
    expect(plain(formatSignificant(1234.5, "mm³"))).toBe("1,235 mm³");
  });

  it("shows grams below a kilogram and kilograms above", () => {
    expect(plain(formatMass(0.0075))).toBe("7.50 g");
    expect(plain(formatMass(0.06))).toBe("60.0 g");
    expect(plain(formatMass(0.4567))).toBe("457 g");
    expect(plain(formatMass(1.25))).toBe("1.250 kg");
  });

  it("writes ranges with one unit and coefficients in %/K with a true minus sign", () => {
    expect(plain(formatRange(1.28, 1.32, "T", 2))).toBe("1.28–1.32 T");
    expect(plain(formatRange(1.3, 1.3, "T", 2))).toBe("1.30 T");
    expect(plain(formatPercentPerKelvin(-0.0012))).toBe("−0.120 %/K");
    expect(plain(formatPercentPerKelvin(0))).toBe("0.000 %/K");
  });
});
