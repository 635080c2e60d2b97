import { describe, expect, it } from "vitest";
import {
  countText,
  moneyText,
  nounFor,
  perUnitWord,
  quantityText,
  unitWord,
} from "./unit-text";

// English plural rule (CLDR, which Intl.PluralRules implements): "one" only for the
// integer 1 written without decimals; 0, 2, 1.5 and "1.0" are "other".
describe("nounFor", () => {
  it("is singular for exactly 1 and plural otherwise", () => {
    expect(nounFor(1, "motor")).toBe("motor");
    expect(nounFor(0, "motor")).toBe("motors");
    expect(nounFor(2, "motor")).toBe("motors");
    expect(nounFor(1.5, "motor", 1)).toBe("motors");
  });

  it("reads 1 written with decimals as plural, as English does", () => {
    expect(nounFor(1, "kilogram", 3)).toBe("kilograms");
  });

  it("ignores the sign of a signed count (a difference of −1 piece)", () => {
    expect(nounFor(-1, "piece")).toBe("piece");
    expect(nounFor(-2, "piece")).toBe("pieces");
  });

  it("takes an irregular plural", () => {
    expect(nounFor(2, { one: "box", other: "boxes" })).toBe("boxes");
  });
});

describe("countText", () => {
  it("writes the count with its noun, no-break space between", () => {
    expect(countText(1, "motor")).toBe("1\u00a0motor");
    expect(countText(1200, "motor")).toBe("1,200\u00a0motors");
  });
});

describe("stock units in words", () => {
  it("reads pcs as piece or pieces", () => {
    expect(unitWord("pcs", 1)).toBe("piece");
    expect(unitWord("pcs", 3)).toBe("pieces");
    expect(quantityText(1, "pcs")).toBe("1\u00a0piece");
    expect(quantityText(2, "pcs")).toBe("2\u00a0pieces");
  });

  it("leaves unit symbols as they are", () => {
    expect(quantityText(1, "kg", 3)).toBe("1.000\u00a0kg");
    expect(unitWord("m", 2)).toBe("m");
  });

  it("names the unit after per in the singular", () => {
    expect(perUnitWord("pcs")).toBe("piece");
    expect(perUnitWord("kg")).toBe("kg");
  });
});

describe("moneyText", () => {
  // Worked by hand: en-GB grouping, two places, a no-break space before the currency.
  it("writes money to the cent with its currency, per a unit when given", () => {
    expect(moneyText(1234.5, "EUR")).toBe("1,234.50\u00a0EUR");
    expect(moneyText(0.85, "EUR", "pcs")).toBe("0.85\u00a0EUR/piece");
    expect(moneyText(null, "EUR")).toBe("—");
  });
});
