import { describe, expect, it } from "vitest";
import { parseMoney } from "~/pricing/money";
import { pieces, unitPriceLine } from "~/pricing/price-line.test-support";
import { lineValuesFor, type LineValuesRequest } from "./order-line-values";

const item = { id: 7, sku: "MAG-7", unit: "pcs" };

function request(overrides: Partial<LineValuesRequest>): LineValuesRequest {
  return {
    item,
    quantity: pieces(150),
    requestedDate: null,
    pricingDate: "2026-03-10",
    orderDate: "2026-03-10",
    currency: "EUR",
    pricing: {
      lines: [
        unitPriceLine("2.40", { itemId: "7", leadTimeDays: 21 }),
        unitPriceLine("2.10", {
          itemId: "7",
          minQuantity: pieces(100),
          leadTimeDays: 21,
        }),
      ],
      supplierSku: "N42SH-D10x3",
      supplierLeadTimeDays: 14,
      metalBaseFixedAt: "order",
      bases: [],
      rates: [],
      companyCurrency: "EUR",
    },
    ...overrides,
  };
}

describe("lineValuesFor (worked examples by hand)", () => {
  it("150 pieces from the list: 2.10 EUR, 21 days' lead, expected 31 March", () => {
    const result = lineValuesFor(request({}));
    expect(result).toMatchObject({
      ok: true,
      overrideDetail: null,
      values: {
        unitPrice: parseMoney("2.10"),
        priceSource: "price_list",
        leadTimeDays: 21,
        expectedDate: "2026-03-31",
      },
    });
  });

  it("the buyer's own price is an override naming the list's price and the reason", () => {
    const result = lineValuesFor(
      request({
        unitPrice: parseMoney("1.95"),
        overrideReason: "Agreed by phone",
      }),
    );
    expect(result).toMatchObject({
      ok: true,
      values: {
        unitPrice: parseMoney("1.95"),
        priceSource: "override",
        overrideReason: "Agreed by phone",
      },
      overrideDetail:
        "MAG-7 priced by hand at 1.9500 EUR/piece instead of the price list's 2.1000 EUR/piece: Agreed by phone.",
    });
  });

  it("a price equal to the list's stays a list price", () => {
    const result = lineValuesFor(request({ unitPrice: parseMoney("2.10") }));
    expect(result).toMatchObject({
      ok: true,
      overrideDetail: null,
      values: { priceSource: "price_list" },
    });
  });

  it("no price line: refused without a price, an override with one (supplier's lead time)", () => {
    const bare = request({
      pricing: { ...request({}).pricing, lines: [] },
    });
    const refused = lineValuesFor(bare);
    expect(refused.ok).toBe(false);
    if (!refused.ok)
      expect(refused.message).toBe(
        "MAG-7: The supplier has no price for this item on 2026-03-10. Give a unit price to order it at your own price.",
      );
    const given = lineValuesFor({ ...bare, unitPrice: parseMoney("3") });
    expect(given).toMatchObject({
      ok: true,
      values: {
        supplierSku: "N42SH-D10x3",
        priceSource: "override",
        leadTimeDays: 14,
        expectedDate: "2026-03-24",
      },
    });
  });
});
