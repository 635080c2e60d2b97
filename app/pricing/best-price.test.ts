import { describe, expect, it } from "vitest";
import { bestPrices, type BestPriceRequest } from "./best-price";
import type { ExchangeRateEntry } from "./currency";
import type { MetalBasePrice } from "./metal-base";
import { formatMoneyText, parseMoney, parseRate } from "./money";
import { adderLine, pieces, unitPriceLine } from "./price-line.test-support";

const rates: ExchangeRateEntry[] = [
  { currency: "USD", date: "2026-01-01", rate: parseRate("0.920000") },
  { currency: "USD", date: "2026-02-01", rate: parseRate("0.950000") },
];
const bases: MetalBasePrice[] = [
  {
    conductor: "copper",
    currency: "EUR",
    pricePerKg: parseMoney("9.00"),
    validFrom: "2026-01-01",
  },
];

function request(overrides: Partial<BestPriceRequest>): BestPriceRequest {
  return {
    itemId: "magnet-n42sh-disc",
    quantity: pieces(100),
    lines: [],
    companyCurrency: "EUR",
    rates,
    bases,
    date: "2026-01-20",
    ...overrides,
  };
}

function ranking(result: ReturnType<typeof bestPrices>): string[] {
  return result.candidates.map(
    (candidate) =>
      `${candidate.supplier} ${formatMoneyText(candidate.landedUnitPrice)}`,
  );
}

describe("best price for a magnet at 100 pieces", () => {
  const nordmag = [
    unitPriceLine("2.40", {
      supplier: "Nordmag",
      minQuantity: pieces(1),
      leadTimeDays: 10,
    }),
    unitPriceLine("2.10", {
      supplier: "Nordmag",
      minQuantity: pieces(100),
      leadTimeDays: 10,
    }),
  ];
  const pacific = unitPriceLine("2.20", {
    supplier: "Pacific Magnetics",
    supplierSku: "PM-42SH-10-3",
    currency: "USD",
    leadTimeDays: 21,
    validFrom: "2026-01-10",
  });
  const aster = unitPriceLine("2.024", {
    supplier: "Aster Magnet",
    supplierSku: "AM-1003",
    leadTimeDays: 14,
  });

  it("converts each offer's break and sorts cheapest first (worked by hand)", () => {
    // Pacific 2.20 USD × 0.92 = 2.0240 EUR ties Aster's 2.0240 EUR; Aster delivers in 14 days
    // against 21, so Aster first; Nordmag's 100-piece break 2.10 is last.
    const result = bestPrices(request({ lines: [...nordmag, pacific, aster] }));
    expect(ranking(result)).toEqual([
      "Aster Magnet 2.0240",
      "Pacific Magnetics 2.0240",
      "Nordmag 2.1000",
    ]);
    expect(result.cannotPrice).toEqual([]);

    const pacificCandidate = result.candidates[1]!;
    expect(pacificCandidate).toMatchObject({
      supplier: "Pacific Magnetics",
      supplierSku: "PM-42SH-10-3",
      currency: "USD",
      minQuantity: pieces(1),
      leadTimeDays: 21,
      quotedUnitPrice: parseMoney("2.20"),
      convertedUnitPrice: parseMoney("2.024"),
      landedCostPerUnit: 0n,
      landedUnitPrice: parseMoney("2.024"),
      adderPerKg: null,
      metalBase: null,
      rate: rates[0],
      sourceLine: pacific.sourceLine,
    });
    // 100 pcs × 2.0240 EUR = 202.4000 EUR.
    expect(formatMoneyText(pacificCandidate.totalForQuantity)).toBe("202.4000");
    expect(result.candidates[0]!.rate).toBeNull();
  });

  it("takes the break below just under 100 pieces", () => {
    const result = bestPrices(
      request({ quantity: pieces(99), lines: nordmag }),
    );
    expect(ranking(result)).toEqual(["Nordmag 2.4000"]);
  });

  it("breaks equal prices and lead times by supplier name, and puts an unknown lead time last", () => {
    const lines = [
      unitPriceLine("2.00", { supplier: "Corvid Magnets", leadTimeDays: 7 }),
      unitPriceLine("2.00", { supplier: "Birch Magnetics", leadTimeDays: 7 }),
      unitPriceLine("2.00", { supplier: "Alder Supply" }),
      unitPriceLine("2.00", { supplier: "Dune Magnet", leadTimeDays: 5 }),
    ];
    expect(ranking(bestPrices(request({ lines })))).toEqual([
      "Dune Magnet 2.0000",
      "Birch Magnetics 2.0000",
      "Corvid Magnets 2.0000",
      "Alder Supply 2.0000",
    ]);
  });

  it("converts at the pricing day's rate, or at the price's own date when asked (worked by hand)", () => {
    const onFebruary15 = { lines: [pacific], date: "2026-02-15" };
    // 2.20 × 0.95 = 2.0900; 2.20 × 0.92 (rate of the line's validFrom, 2026-01-10) = 2.0240.
    expect(ranking(bestPrices(request(onFebruary15)))).toEqual([
      "Pacific Magnetics 2.0900",
    ]);
    expect(
      ranking(bestPrices(request({ ...onFebruary15, rateDay: "price-date" }))),
    ).toEqual(["Pacific Magnetics 2.0240"]);
  });

  it("adds a landed cost per unit through the hook, and sorts on the landed price", () => {
    const result = bestPrices(
      request({
        lines: [...nordmag, pacific, aster],
        landedCostPerUnit: (line) =>
          line.currency === "USD" ? 0n : parseMoney("0.10"),
      }),
    );
    expect(ranking(result)).toEqual([
      "Pacific Magnetics 2.0240",
      "Aster Magnet 2.1240",
      "Nordmag 2.2000",
    ]);
    expect(result.candidates[1]!.convertedUnitPrice).toBe(parseMoney("2.024"));
  });

  it("leaves out lines that are not valid on the day and lines of other items", () => {
    const lines = [
      unitPriceLine("1.00", { supplier: "Expired", validTo: "2026-01-19" }),
      unitPriceLine("1.00", { supplier: "Future", validFrom: "2026-01-21" }),
      unitPriceLine("1.00", {
        supplier: "Other item",
        itemId: "magnet-n52-block",
      }),
      unitPriceLine("2.10", { supplier: "Nordmag" }),
    ];
    const result = bestPrices(request({ lines }));
    expect(ranking(result)).toEqual(["Nordmag 2.1000"]);
    expect(result.cannotPrice).toEqual([]);
  });

  it("lists offers it cannot price with the reason, never dropping them", () => {
    const yen = unitPriceLine("330", {
      supplier: "Kobalt Works",
      currency: "JPY",
    });
    const minimum = unitPriceLine("1.50", {
      supplier: "Bulk Only",
      minQuantity: pieces(1000),
    });
    const result = bestPrices(request({ lines: [...nordmag, yen, minimum] }));
    expect(ranking(result)).toEqual(["Nordmag 2.1000"]);
    expect(result.cannotPrice).toEqual([
      {
        supplier: "Bulk Only",
        supplierSku: minimum.supplierSku,
        currency: "EUR",
        sourceLine: null,
        problems: [
          {
            kind: "below-smallest-break",
            quantity: pieces(100),
            smallestMinQuantity: pieces(1000),
            date: "2026-01-20",
            message:
              "100.000 is below the smallest quantity break valid on 2026-01-20 (1000.000)",
          },
        ],
      },
      {
        supplier: "Kobalt Works",
        supplierSku: yen.supplierSku,
        currency: "JPY",
        sourceLine: yen.sourceLine,
        problems: [
          {
            kind: "no-exchange-rate",
            currency: "JPY",
            companyCurrency: "EUR",
            date: "2026-01-20",
            message: "no JPY to EUR rate on or before 2026-01-20",
          },
        ],
      },
    ]);
  });

  it("refuses a pricing day that is not a day", () => {
    expect(() => bestPrices(request({ date: "20/01/2026" }))).toThrow(
      RangeError,
    );
  });
});

describe("best price for wire priced on the metal base", () => {
  const wireRequest = (overrides: Partial<BestPriceRequest>) =>
    request({ itemId: "wire-cu-0.80-grade2", quantity: 25_000n, ...overrides });

  it("prices adder lines on the day's base and compares them with fixed prices (worked example in the price-list issue)", () => {
    const adder = adderLine("3.50", { supplier: "Aster Wire" });
    const fixed = unitPriceLine("12.60", {
      itemId: "wire-cu-0.80-grade2",
      supplier: "Boreal Enamel",
    });
    const result = bestPrices(wireRequest({ lines: [fixed, adder] }));
    // 3.50 + 9.00 = 12.50 per kg, under Boreal's fixed 12.60.
    expect(ranking(result)).toEqual([
      "Aster Wire 12.5000",
      "Boreal Enamel 12.6000",
    ]);
    expect(result.candidates[0]).toMatchObject({
      adderPerKg: parseMoney("3.50"),
      metalBase: bases[0],
      quotedUnitPrice: parseMoney("12.50"),
      rate: null,
    });
    // 25.000 kg × 12.50 = 312.5000.
    expect(formatMoneyText(result.candidates[0]!.totalForQuantity)).toBe(
      "312.5000",
    );
  });

  it("moves the adder line when the base moves", () => {
    const adder = adderLine("3.50");
    const withNewBase = [
      ...bases,
      {
        conductor: "copper",
        currency: "EUR",
        pricePerKg: parseMoney("9.40"),
        validFrom: "2026-02-01",
      },
    ] satisfies MetalBasePrice[];
    const on = (date: string) =>
      ranking(
        bestPrices(wireRequest({ lines: [adder], bases: withNewBase, date })),
      );
    expect(on("2026-01-31")).toEqual(["Aster Wire 12.5000"]);
    expect(on("2026-02-01")).toEqual(["Aster Wire 12.9000"]);
  });

  it("reports a missing base, and a missing rate beside it, for the line that would apply", () => {
    const dollars = adderLine("3.20", {
      supplier: "Pacific Wire",
      currency: "USD",
    });
    const yen = adderLine("480", { supplier: "Kiso Wire", currency: "JPY" });
    // No copper base in any currency: nothing to derive a USD base from either.
    const result = bestPrices(
      wireRequest({ lines: [dollars, yen], bases: [] }),
    );
    expect(result.candidates).toEqual([]);
    expect(
      result.cannotPrice.map((offer) => [
        offer.supplier,
        offer.sourceLine,
        offer.problems.map((problem) => problem.message),
      ]),
    ).toEqual([
      [
        "Kiso Wire",
        yen.sourceLine,
        [
          "no copper base price in JPY on or before 2026-01-20",
          "no JPY to EUR rate on or before 2026-01-20",
        ],
      ],
      [
        "Pacific Wire",
        dollars.sourceLine,
        ["no copper base price in USD on or before 2026-01-20"],
      ],
    ]);
  });
});
