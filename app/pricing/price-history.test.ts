import { describe, expect, it } from "vitest";
import type { ExchangeRateEntry } from "./currency";
import type { MetalBasePrice } from "./metal-base";
import { formatMoneyText, parseMoney, parseRate } from "./money";
import {
  priceHistory,
  type PriceHistoryRequest,
  type PriceHistorySeries,
} from "./price-history";
import { adderLine, unitPriceLine } from "./price-line.test-support";

const wireItem = "wire-cu-0.80-grade2";

const bases: MetalBasePrice[] = [
  copperBase("9.00", "2026-01-01"),
  copperBase("9.40", "2026-02-01"),
  copperBase("9.40", "2026-03-01"),
  copperBase("8.80", "2026-04-01"),
];
const rates: ExchangeRateEntry[] = [
  { currency: "USD", date: "2026-01-01", rate: parseRate("0.920000") },
  { currency: "USD", date: "2026-02-10", rate: parseRate("0.900000") },
];

function copperBase(pricePerKg: string, validFrom: string): MetalBasePrice {
  return {
    conductor: "copper",
    currency: "EUR",
    pricePerKg: parseMoney(pricePerKg),
    validFrom,
  };
}

// Aster Wire: adder 3.50 until 2026-03-14, then 3.60. Boreal Enamel: 14.00 USD per kg fixed,
// 2026-01-15 to 2026-02-28.
const asterOld = adderLine("3.50", { validTo: "2026-03-14" });
const asterNew = adderLine("3.60", { validFrom: "2026-03-15" });
const boreal = unitPriceLine("14.00", {
  itemId: wireItem,
  supplier: "Boreal Enamel",
  supplierSku: "BE-080",
  currency: "USD",
  minQuantity: 0n,
  validFrom: "2026-01-15",
  validTo: "2026-02-28",
});

function history(
  overrides: Partial<PriceHistoryRequest> = {},
): PriceHistoryRequest {
  return {
    itemId: wireItem,
    quantity: 25_000n,
    lines: [boreal, asterNew, asterOld],
    bases,
    rates,
    companyCurrency: "EUR",
    ...overrides,
  };
}

function chart(series: PriceHistorySeries): string[] {
  return series.points.map(
    (point) =>
      `${point.date} ${point.unitPrice === null ? point.problems.map((problem) => problem.kind).join() : formatMoneyText(point.unitPrice)}`,
  );
}

describe("price history for a chart", () => {
  it("recomputes adder lines on each month's base, one point per change (worked by hand)", () => {
    const [aster, borealSeries] = priceHistory(history());
    expect(aster!.supplier).toBe("Aster Wire");
    // 3.50 + 9.00, 3.50 + 9.40 (the repeated 9.40 on 03-01 adds no point), 3.60 + 9.40, 3.60 + 8.80.
    expect(chart(aster!)).toEqual([
      "2026-01-01 12.5000",
      "2026-02-01 12.9000",
      "2026-03-15 13.0000",
      "2026-04-01 12.4000",
    ]);
    expect(aster!.points[2]!.sourceLine).toEqual(asterNew.sourceLine);

    // 14.00 USD × 0.92 = 12.8800, × 0.90 = 12.6000 EUR; no price after 2026-02-28.
    expect(borealSeries!.currency).toBe("USD");
    expect(chart(borealSeries!)).toEqual([
      "2026-01-15 12.8800",
      "2026-02-10 12.6000",
      "2026-03-01 no-price-on-date",
    ]);
    expect(borealSeries!.points[1]!.quotedUnitPrice).toBe(parseMoney("14.00"));
  });

  it("clips to a span, starting with the price standing on its first day", () => {
    const [aster] = priceHistory(
      history({ from: "2026-02-15", to: "2026-03-31" }),
    );
    expect(chart(aster!)).toEqual(["2026-02-15 12.9000", "2026-03-15 13.0000"]);
  });

  it("shows a gap where the base is missing instead of dropping the line", () => {
    const early = adderLine("3.50", {
      supplierSku: "CU080-G2-EARLY",
      validFrom: "2025-12-15",
    });
    const [series] = priceHistory(history({ lines: [early] }));
    expect(chart(series!)).toEqual([
      "2025-12-15 no-metal-base",
      "2026-01-01 12.5000",
      "2026-02-01 12.9000",
      "2026-04-01 12.3000",
    ]);
    expect(series!.points[0]!.problems[0]!.message).toBe(
      "no copper base price in EUR on or before 2025-12-15",
    );
    expect(series!.points[0]!.sourceLine).toEqual(early.sourceLine);
  });

  it("charts the break for the quantity asked for", () => {
    const smallSpools = adderLine("4.00", {
      supplierSku: "CU080-5KG",
      validFrom: "2026-01-01",
    });
    const bulk = adderLine("3.20", {
      supplierSku: "CU080-5KG",
      minQuantity: 100_000n,
      validFrom: "2026-02-01",
    });
    const line = (quantity: bigint) =>
      chart(
        priceHistory(
          history({ lines: [smallSpools, bulk], quantity, to: "2026-02-28" }),
        )[0]!,
      );
    expect(line(25_000n)).toEqual(["2026-01-01 13.0000", "2026-02-01 13.4000"]);
    // 100 kg: 4.00 + 9.00 in January, the new 100 kg break 3.20 + 9.40 from February.
    expect(line(100_000n)).toEqual([
      "2026-01-01 13.0000",
      "2026-02-01 12.6000",
    ]);
  });

  it("marks days where the quantity is below every break", () => {
    const bulkOnly = adderLine("3.20", { minQuantity: 100_000n });
    const [series] = priceHistory(
      history({ lines: [bulkOnly], to: "2026-01-31" }),
    );
    expect(chart(series!)).toEqual(["2026-01-01 below-smallest-break"]);
  });

  it("ignores other items and returns no series without lines", () => {
    const other = unitPriceLine("2.40");
    expect(priceHistory(history({ lines: [other] }))).toEqual([]);
  });

  it("refuses a span end that is not a day", () => {
    expect(() => priceHistory(history({ to: "2026-13-01" }))).toThrow(
      RangeError,
    );
  });
});
