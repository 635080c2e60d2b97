import { describe, expect, it } from "vitest";
import {
  monthText,
  offerName,
  pricePerUnit,
  priceHistorySummary,
  shortName,
  type PriceHistoryView,
} from "./price-history-texts";

/** Text with the no-break spaces between numbers and units as plain spaces. */
const readable = (text: string) => text.replace(/\u00a0/g, " ");

describe("the price history's words", () => {
  it("writes months from the one day formatter", () => {
    expect(monthText("2026-09-01")).toBe("Sept 2026");
  });

  it("writes a unit price to the ten-thousandth with its currency and unit", () => {
    expect(readable(pricePerUnit(12.5, "EUR", "kg"))).toBe("12.5000 EUR/kg");
    expect(readable(pricePerUnit(2.4, "EUR", "pcs"))).toBe("2.4000 EUR/piece");
  });

  it("names an article by supplier and article number, cut to 26 characters beside the plot", () => {
    const name = offerName({ supplier: "Aster Wire", supplierSku: "CU112-G2" });
    expect(name).toBe("Aster Wire · CU112-G2");
    expect(shortName(name)).toBe(name);
    expect(shortName("Boreal Enamel Works · BE-112-G2")).toBe(
      "Boreal Enamel Works · BE-…",
    );
  });
});

describe("the price history's summary", () => {
  const history: PriceHistoryView = {
    unit: "kg",
    quantity: 25,
    companyCurrency: "EUR",
    from: "2025-12-03",
    to: "2026-12-03",
    lineCount: 3,
    series: [
      {
        supplier: "Aster Wire",
        supplierSku: "CU112-G2",
        currency: "EUR",
        points: [
          {
            date: "2026-02-06",
            unitPrice: 14.2,
            quotedUnitPrice: 14.2,
            problems: [],
          },
          {
            date: "2026-07-06",
            unitPrice: 14.85,
            quotedUnitPrice: 14.85,
            problems: [],
          },
          {
            date: "2026-10-24",
            unitPrice: 13.9,
            quotedUnitPrice: 13.9,
            problems: [],
          },
        ],
      },
      {
        supplier: "Fjord Kobber",
        supplierSku: "FK 1,12",
        currency: "NOK",
        points: [
          {
            date: "2026-05-17",
            unitPrice: null,
            quotedUnitPrice: null,
            problems: ["no NOK to EUR rate"],
          },
        ],
      },
    ],
  };

  it("gives each article's first price, changes, lowest, highest and now", () => {
    const price = (value: number) => pricePerUnit(value, "EUR", "kg");
    expect(readable(priceHistorySummary(history, price))).toBe(
      "Unit price of 25.000 kg from 3 Dec 2025 to 3 Dec 2026, 2 supplier articles. " +
        "Aster Wire · CU112-G2: 14.2000 EUR/kg from 6 Feb 2026, 2 changes, lowest 13.9000 EUR/kg, highest 14.8500 EUR/kg, now 13.9000 EUR/kg. " +
        "Fjord Kobber · FK 1,12: no price on these days.",
    );
  });
});
