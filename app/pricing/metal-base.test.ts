import { describe, expect, it } from "vitest";
import { estimateCoil } from "~/engineering/coil-estimate";
import {
  findMetalBase,
  fullWirePricePerKg,
  massKgFromEstimate,
  repriceForBase,
  wireCost,
  wirePricePerKgOn,
  type MetalBasePrice,
} from "./metal-base";
import {
  formatMoneyText,
  gramsToKilograms,
  parseExactDecimal,
  parseMoney,
} from "./money";
import { adderLine } from "./price-line.test-support";

function base(
  pricePerKg: string,
  validFrom: string,
  overrides: Partial<MetalBasePrice> = {},
): MetalBasePrice {
  return {
    conductor: "copper",
    currency: "EUR",
    pricePerKg: parseMoney(pricePerKg),
    validFrom,
    ...overrides,
  };
}

const bases: MetalBasePrice[] = [
  base("9.00", "2026-09-01"),
  base("9.40", "2026-10-01"),
  base("2.60", "2026-09-01", { conductor: "aluminium" }),
  base("9.90", "2026-09-01", { currency: "USD" }),
];

describe("worked example in the price-list issue", () => {
  it("adder 3.50/kg + copper base 9.00/kg = 12.50/kg; the 29.94 g coil of worked check 4 costs 0.3742", () => {
    const price = wirePricePerKgOn(
      { adderPerKg: parseMoney("3.50"), conductor: "copper", currency: "EUR" },
      bases,
      "2026-09-15",
    );
    expect(price.ok && formatMoneyText(price.pricePerKg)).toBe("12.5000");

    // Worked check 4 of the engineering brief, with its two 150 mm leads: 29.94 g as printed,
    // 29.9396 g unrounded (π · 0.4² mm² · 6700 mm · 8.89 g/cm³ = 29.93963 g, worked by hand).
    const coil = estimateCoil({
      conductor: "copper",
      wire: { standard: "IEC", diameterMm: 0.8 },
      turns: 40,
      activeLengthMm: 50,
      endTurnLengthMm: 30,
      leadLengthMm: 150,
    });
    const woundMass = massKgFromEstimate(coil.perCoil.woundMassKg);
    expect(woundMass).toEqual(parseExactDecimal("0.0299396"));
    // 0.0299396 kg × 12.50 = 0.374245 → 0.3742.
    expect(formatMoneyText(wireCost(woundMass, parseMoney("12.50")))).toBe(
      "0.3742",
    );
  });

  it("rounds the printed 29.94 g, an exact tie at 0.37425, half away from zero to 0.3743 (worked by hand)", () => {
    // The 0.3742 comes from the unrounded mass; priced from the already rounded
    // 29.94 g, 0.02994 × 12.50 = 0.37425 exactly, and the tie rounds up like a spreadsheet's ROUND.
    const printedMass = gramsToKilograms(parseExactDecimal("29.94"));
    expect(formatMoneyText(wireCost(printedMass, parseMoney("12.50")))).toBe(
      "0.3743",
    );
  });
});

describe("dated metal bases", () => {
  it("uses the latest base on or before the day, exactly on its first day too (worked by hand)", () => {
    const on = (date: string) => {
      const found = findMetalBase(bases, "copper", "EUR", date);
      return found.ok
        ? formatMoneyText(found.base.pricePerKg)
        : found.problem.message;
    };
    expect(on("2026-09-01")).toBe("9.0000");
    expect(on("2026-09-30")).toBe("9.0000");
    expect(on("2026-10-01")).toBe("9.4000");
    expect(on("2027-01-15")).toBe("9.4000");
  });

  it("keeps conductors and currencies apart", () => {
    const aluminium = findMetalBase(bases, "aluminium", "EUR", "2026-10-15");
    expect(aluminium.ok && formatMoneyText(aluminium.base.pricePerKg)).toBe(
      "2.6000",
    );
    const dollars = findMetalBase(bases, "copper", "USD", "2026-10-15");
    expect(dollars.ok && formatMoneyText(dollars.base.pricePerKg)).toBe(
      "9.9000",
    );
    const pounds = findMetalBase(bases, "copper", "GBP", "2026-10-15");
    expect(pounds.ok).toBe(false);
  });

  it("says which base is missing instead of throwing", () => {
    const found = findMetalBase(
      [base("9.00", "2026-12-01")],
      "copper",
      "EUR",
      "2026-11-01",
    );
    expect(found).toEqual({
      ok: false,
      problem: {
        kind: "no-metal-base",
        conductor: "copper",
        currency: "EUR",
        date: "2026-11-01",
        message: "no copper base price in EUR on or before 2026-11-01",
      },
    });
    const price = wirePricePerKgOn(
      {
        adderPerKg: parseMoney("1.10"),
        conductor: "aluminium",
        currency: "EUR",
      },
      [],
      "2026-11-01",
    );
    expect(!price.ok && price.problem.message).toBe(
      "no aluminium base price in EUR on or before 2026-11-01",
    );
  });
});

describe("repricing when the base moves", () => {
  it("moves every adder line of that metal and currency with the base (worked by hand)", () => {
    const lines = [
      adderLine("3.50"),
      adderLine("5.20", { supplierSku: "CU020-G2" }),
      adderLine("1.10", { conductor: "aluminium" }),
      adderLine("3.00", { currency: "USD" }),
    ];
    const repriced = repriceForBase(lines, base("9.80", "2026-11-01"));
    expect(repriced.map((entry) => formatMoneyText(entry.pricePerKg))).toEqual([
      "13.3000",
      "15.0000",
    ]);
    expect(repriced.map((entry) => entry.line)).toEqual([lines[0], lines[1]]);
    expect(fullWirePricePerKg(parseMoney("3.50"), parseMoney("9.00"))).toBe(
      parseMoney("12.50"),
    );
  });
});

describe("masses from the engineering estimates", () => {
  it("cuts a float mass to a tenth of a milligram and refuses non-numbers", () => {
    expect(massKgFromEstimate(0.1)).toEqual({ digits: 1000000n, decimals: 7 });
    expect(() => massKgFromEstimate(Number.NaN)).toThrow(RangeError);
  });
});
