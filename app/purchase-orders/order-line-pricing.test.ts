import { describe, expect, it } from "vitest";
import { parseMoney } from "~/pricing/money";
import {
  adderLine,
  pieces,
  unitPriceLine,
} from "~/pricing/price-line.test-support";
import type { MetalBasePrice } from "~/pricing/metal-base";
import {
  convertBetween,
  expectedDateOf,
  lineLeadTimeDays,
  orderDateOf,
  priceOrderLine,
  type OrderLinePricingRequest,
} from "./order-line-pricing";

const magnet = "magnet-n42sh-disc";
const wire = "wire-cu-0.80-grade2";

function request(
  overrides: Partial<OrderLinePricingRequest>,
): OrderLinePricingRequest {
  return {
    lines: [],
    itemId: magnet,
    quantity: pieces(1),
    date: "2026-03-15",
    orderCurrency: "EUR",
    companyCurrency: "EUR",
    rates: [],
    bases: [],
    metalBaseFixedAt: "order",
    ...overrides,
  };
}

const breaks = [
  unitPriceLine("2.40", { minQuantity: pieces(1) }),
  unitPriceLine("2.10", { minQuantity: pieces(100) }),
  unitPriceLine("1.95", { minQuantity: pieces(500) }),
];

const copperBases: MetalBasePrice[] = [
  {
    conductor: "copper",
    currency: "EUR",
    pricePerKg: parseMoney("8.95"),
    validFrom: "2026-03-01",
  },
  {
    conductor: "copper",
    currency: "EUR",
    pricePerKg: parseMoney("9.10"),
    validFrom: "2026-04-01",
  },
];

describe("priceOrderLine: quantity breaks (worked example by hand)", () => {
  // Breaks 1+ pcs 2.40, 100+ 2.10, 500+ 1.95 EUR: 99 pcs pay 2.40, exactly 100 pay 2.10,
  // 750 pay 1.95 (the largest minimum at or below the quantity).
  it.each([
    [99, "2.40"],
    [100, "2.10"],
    [499, "2.10"],
    [750, "1.95"],
  ])("%i pieces cost %s EUR each", (count, price) => {
    const priced = priceOrderLine(
      request({ lines: breaks, quantity: pieces(count) }),
    );
    expect(priced).toMatchObject({
      ok: true,
      unitPrice: parseMoney(price),
      supplierSku: "N42SH-D10x3",
      metalBasePerKg: null,
      adderPerKg: null,
      metalBaseFixedAt: null,
    });
  });

  it("refuses with a sentence when the supplier has no price line for the item", () => {
    const priced = priceOrderLine(request({ lines: [] }));
    expect(priced).toEqual({
      ok: false,
      message: "The supplier has no price for this item on 2026-03-15.",
    });
  });

  it("refuses below the smallest break, naming it", () => {
    const priced = priceOrderLine(
      request({
        lines: [unitPriceLine("2.10", { minQuantity: pieces(100) })],
        quantity: pieces(10),
      }),
    );
    expect(priced.ok).toBe(false);
    if (!priced.ok) expect(priced.message).toMatch(/100/);
  });

  it("orders the cheaper of two articles of the same supplier", () => {
    const priced = priceOrderLine(
      request({
        lines: [
          unitPriceLine("2.40", { supplierSku: "BOX-10" }),
          unitPriceLine("2.25", { supplierSku: "BOX-100" }),
        ],
        quantity: pieces(200),
      }),
    );
    expect(priced).toMatchObject({ ok: true, supplierSku: "BOX-100" });
  });
});

describe("priceOrderLine: wire as metal base + adder (worked example by hand)", () => {
  // Copper base 8.95 EUR/kg from 1 March, 9.10 from 1 April; adder 3.25 EUR/kg.
  // Priced on 15 March: 8.95 + 3.25 = 12.20 EUR/kg; on 2 April: 9.10 + 3.25 = 12.35.
  const adder = adderLine("3.25");
  it("keeps base and adder per kg and when the base is fixed", () => {
    const priced = priceOrderLine(
      request({
        lines: [adder],
        itemId: wire,
        quantity: 25_000n,
        bases: copperBases,
        metalBaseFixedAt: "delivery",
      }),
    );
    expect(priced).toMatchObject({
      ok: true,
      unitPrice: parseMoney("12.20"),
      metalBasePerKg: parseMoney("8.95"),
      adderPerKg: parseMoney("3.25"),
      metalBaseFixedAt: "delivery",
    });
  });

  it("takes the base valid on the pricing day", () => {
    const priced = priceOrderLine(
      request({
        lines: [adder],
        itemId: wire,
        quantity: 25_000n,
        bases: copperBases,
        date: "2026-04-02",
      }),
    );
    expect(priced).toMatchObject({
      ok: true,
      unitPrice: parseMoney("12.35"),
      metalBaseFixedAt: "order",
    });
  });

  it("says so when no base is kept", () => {
    const priced = priceOrderLine(
      request({ lines: [adder], itemId: wire, quantity: 25_000n }),
    );
    expect(priced.ok).toBe(false);
    if (!priced.ok) expect(priced.message).toMatch(/copper/i);
  });

  // A USD adder line (3.50 USD/kg on a 9.80 USD/kg base) ordered in EUR at 0.920000
  // EUR per USD: base 9.80 × 0.92 = 9.016, adder 3.50 × 0.92 = 3.22, price 12.236 EUR/kg.
  it("converts base and adder each into the order's currency", () => {
    const priced = priceOrderLine(
      request({
        lines: [adderLine("3.50", { currency: "USD" })],
        itemId: wire,
        quantity: 10_000n,
        bases: [
          {
            conductor: "copper",
            currency: "USD",
            pricePerKg: parseMoney("9.80"),
            validFrom: "2026-03-01",
          },
        ],
        rates: [{ currency: "USD", date: "2026-01-01", rate: 920_000n }],
      }),
    );
    expect(priced).toMatchObject({
      ok: true,
      metalBasePerKg: parseMoney("9.016"),
      adderPerKg: parseMoney("3.22"),
      unitPrice: parseMoney("12.236"),
      quotedCurrency: "USD",
    });
  });
});

describe("convertBetween (worked examples by hand)", () => {
  const rates = [
    { currency: "USD", date: "2026-01-01", rate: 920_000n },
    { currency: "GBP", date: "2026-01-01", rate: 1_150_000n },
  ];
  const context = {
    companyCurrency: "EUR",
    rates,
    date: "2026-03-15",
  };
  it("2.50 USD is 2.30 EUR at 0.92 EUR per USD", () => {
    expect(
      convertBetween(parseMoney("2.50"), "USD", {
        ...context,
        orderCurrency: "EUR",
      }),
    ).toEqual({ ok: true, amount: parseMoney("2.30") });
  });
  it("10.00 GBP is 11.50 EUR, which is 12.50 USD (11.50 ÷ 0.92)", () => {
    expect(
      convertBetween(parseMoney("10.00"), "GBP", {
        ...context,
        orderCurrency: "USD",
      }),
    ).toEqual({ ok: true, amount: parseMoney("12.50") });
  });
  it("2.30 EUR is 2.50 USD", () => {
    expect(
      convertBetween(parseMoney("2.30"), "EUR", {
        ...context,
        orderCurrency: "USD",
      }),
    ).toEqual({ ok: true, amount: parseMoney("2.50") });
  });
  it("names the missing rate", () => {
    const converted = convertBetween(parseMoney("1"), "CHF", {
      ...context,
      orderCurrency: "EUR",
    });
    expect(converted.ok).toBe(false);
    if (!converted.ok) expect(converted.message).toMatch(/CHF/);
  });
  it("a price line in a currency with no rate cannot be priced in another", () => {
    const priced = priceOrderLine(
      request({ lines: breaks, orderCurrency: "CHF" }),
    );
    expect(priced.ok).toBe(false);
  });
});

describe("lead times and expected dates (worked examples by hand)", () => {
  it("takes the price line's lead time, else the supplier's, else 0", () => {
    expect(lineLeadTimeDays(21, 14)).toBe(21);
    expect(lineLeadTimeDays(null, 14)).toBe(14);
    expect(lineLeadTimeDays(undefined, null)).toBe(0);
    expect(lineLeadTimeDays(0, 14)).toBe(0);
  });

  it("a draft created 10 March 2026 with 21 days' lead time is expected 31 March", () => {
    const orderDate = orderDateOf({
      orderedOn: null,
      createdAt: new Date("2026-03-10T16:30:00Z"),
    });
    expect(orderDate).toBe("2026-03-10");
    expect(
      expectedDateOf({ requestedDate: null, orderDate, leadTimeDays: 21 }),
    ).toBe("2026-03-31");
  });

  it("once sent on 20 March, the same line is expected 10 April", () => {
    const orderDate = orderDateOf({
      orderedOn: "2026-03-20",
      createdAt: new Date("2026-03-10T16:30:00Z"),
    });
    expect(
      expectedDateOf({ requestedDate: null, orderDate, leadTimeDays: 21 }),
    ).toBe("2026-04-10");
  });

  it("a requested date wins over the lead time", () => {
    expect(
      expectedDateOf({
        requestedDate: "2026-05-01",
        orderDate: "2026-03-10",
        leadTimeDays: 21,
      }),
    ).toBe("2026-05-01");
  });

  it("crosses a month and a leap day: 15 Feb 2028 + 20 days is 6 March 2028", () => {
    expect(
      expectedDateOf({
        requestedDate: null,
        orderDate: "2028-02-15",
        leadTimeDays: 20,
      }),
    ).toBe("2028-03-06");
  });
});

describe("priceOrderLine: an order in the supplier's own currency", () => {
  it("needs no exchange rate when every line is quoted in the order's currency", () => {
    const priced = priceOrderLine(
      request({
        lines: breaks.map((line) => ({ ...line, currency: "DKK" })),
        quantity: pieces(100),
        orderCurrency: "DKK",
      }),
    );
    expect(priced).toMatchObject({ ok: true, unitPrice: parseMoney("2.10") });
  });

  it("a base kept only in the company currency is still found through the rate", () => {
    // 9.80 EUR/kg at 0.134 EUR per DKK is 73.1343 DKK/kg (9.80 ÷ 0.134 = 73.13432…);
    // adder 20.00 DKK/kg: 93.1343 DKK/kg.
    const priced = priceOrderLine(
      request({
        lines: [adderLine("20.00", { currency: "DKK" })],
        itemId: wire,
        quantity: 10_000n,
        orderCurrency: "DKK",
        bases: [
          {
            conductor: "copper",
            currency: "EUR",
            pricePerKg: parseMoney("9.80"),
            validFrom: "2026-03-01",
          },
        ],
        rates: [{ currency: "DKK", date: "2026-01-01", rate: 134_000n }],
      }),
    );
    expect(priced).toMatchObject({
      ok: true,
      adderPerKg: parseMoney("20"),
      metalBasePerKg: parseMoney("73.1343"),
      unitPrice: parseMoney("93.1343"),
    });
  });
});
