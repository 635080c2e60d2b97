import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import {
  alertChange,
  alertMail,
  alertModeOf,
  coveredText,
  digestMail,
  orderCoverage,
  purchaseRequestCsv,
  type OpenOrderLine,
} from "./low-stock";

// Quantities in thousandths of the unit: 5_000n is 5 kg.
describe("when an alert opens and closes", () => {
  it("opens on a drop below the reorder point, once", () => {
    expect(
      alertChange({
        available: 4_999n,
        reorderPoint: 5_000n,
        alertOpen: false,
      }),
    ).toBe("open");
    expect(
      alertChange({ available: 1_000n, reorderPoint: 5_000n, alertOpen: true }),
    ).toBe("none");
  });

  it("closes when available is back at the reorder point, not before", () => {
    expect(
      alertChange({ available: 4_999n, reorderPoint: 5_000n, alertOpen: true }),
    ).toBe("none");
    expect(
      alertChange({ available: 5_000n, reorderPoint: 5_000n, alertOpen: true }),
    ).toBe("close");
  });

  it("never opens without a reorder point, and closes one that was removed", () => {
    expect(
      alertChange({ available: 0n, reorderPoint: 0n, alertOpen: false }),
    ).toBe("none");
    expect(
      alertChange({ available: 0n, reorderPoint: 0n, alertOpen: true }),
    ).toBe("close");
  });
});

describe("an alert covered by orders already sent", () => {
  // Worked example, done by hand: reorder point 50 kg, today 3 Dec 2026.
  // Open lines: PO 7 20 kg due 10 Dec, PO 5 15 kg due 15 Dec, PO 9 30 kg due 20 Dec,
  // PO 4 nothing left open (due 5 Dec).
  const lines: OpenOrderLine[] = [
    { orderId: 9, expectedDate: "2026-12-20", open: 30_000n },
    { orderId: 5, expectedDate: "2026-12-15", open: 15_000n },
    { orderId: 4, expectedDate: "2026-12-05", open: 0n },
    { orderId: 7, expectedDate: "2026-12-10", open: 20_000n },
  ];
  const base = { reorderPoint: 50_000n, today: "2026-12-03", lines };

  it("is not covered when what is due within the lead time falls short", () => {
    // Lead time 14 days: horizon 17 Dec. 12 + 20 (PO 7) + 15 (PO 5) = 47 kg < 50 kg;
    // PO 9 (20 Dec) comes too late to count.
    expect(
      orderCoverage({ ...base, available: 12_000n, leadTimeDays: 14 }),
    ).toBeNull();
  });

  it("is covered by the order whose line makes it enough, earliest due first", () => {
    // 15 + 20 = 35 kg, + 15 = 50 kg: at the reorder point with PO 5's line (15 Dec).
    expect(
      orderCoverage({ ...base, available: 15_000n, leadTimeDays: 14 }),
    ).toEqual({ orderId: 5, due: "2026-12-15" });
    // Lead time 21 days: horizon 24 Dec, so PO 9 counts: 47 + 30 = 77 kg ≥ 50 kg.
    expect(
      orderCoverage({ ...base, available: 12_000n, leadTimeDays: 21 }),
    ).toEqual({ orderId: 9, due: "2026-12-20" });
  });

  it("counts a line due on the last day of the lead time, not the day after", () => {
    const one = [{ orderId: 3, expectedDate: "2026-12-17", open: 60_000n }];
    expect(
      orderCoverage({ ...base, lines: one, available: 0n, leadTimeDays: 14 }),
    ).toEqual({ orderId: 3, due: "2026-12-17" });
    expect(
      orderCoverage({ ...base, lines: one, available: 0n, leadTimeDays: 13 }),
    ).toBeNull();
  });

  it("takes the older order first when two lines are due the same day", () => {
    const same = [
      { orderId: 12, expectedDate: "2026-12-08", open: 40_000n },
      { orderId: 11, expectedDate: "2026-12-08", open: 40_000n },
    ];
    expect(
      orderCoverage({
        ...base,
        lines: same,
        available: 20_000n,
        leadTimeDays: 7,
      }),
    ).toEqual({ orderId: 11, due: "2026-12-08" });
  });

  it("counts only lines already due when the lead time is unknown", () => {
    const late = [
      { orderId: 2, expectedDate: "2026-12-01", open: 40_000n },
      { orderId: 8, expectedDate: "2026-12-04", open: 40_000n },
    ];
    expect(
      orderCoverage({
        ...base,
        lines: late,
        available: 10_000n,
        leadTimeDays: null,
      }),
    ).toEqual({ orderId: 2, due: "2026-12-01" });
    expect(
      orderCoverage({
        ...base,
        lines: late.slice(1),
        available: 10_000n,
        leadTimeDays: null,
      }),
    ).toBeNull();
  });

  it("says nothing for an item that is not low", () => {
    expect(
      orderCoverage({ ...base, available: 50_000n, leadTimeDays: 14 }),
    ).toBeNull();
    expect(
      orderCoverage({
        ...base,
        reorderPoint: 0n,
        available: 0n,
        leadTimeDays: 14,
      }),
    ).toBeNull();
  });

  it("names the order and the day", () => {
    expect(coveredText({ orderId: 123, due: "2026-12-12" })).toBe(
      "covered by PO-000123 due 12 Dec 2026",
    );
  });

  it("lists covered alerts apart in the digest", () => {
    const mail = digestMail(
      [
        {
          sku: "W-1",
          name: "Copper 0.50",
          unit: "kg",
          available: 5_000n,
          reorderPoint: 20_000n,
          openedAt: new Date("2026-12-01T08:00:00Z"),
          coveredBy: { orderId: 42, due: "2026-12-09" },
        },
        {
          sku: "M-1",
          name: "Block",
          unit: "pcs",
          available: 0n,
          reorderPoint: 100_000n,
          openedAt: new Date("2026-12-02T08:00:00Z"),
          coveredBy: null,
        },
      ],
      "http://localhost:3000/alerts",
    );
    expect(mail.text).toContain(
      "2 items are below the reorder point, 1 covered by sent orders:\n\n- M-1 Block: 0 pieces available",
    );
    expect(mail.text).toContain(
      "Covered by orders already sent (nothing to order):\n- W-1 Copper 0.50: 5.000 kg available, reorder point 20.000 kg (low since 2026-12-01; covered by PO-000042 due 9 Dec 2026)",
    );
  });
});

describe("who hears about alerts", () => {
  const person = (
    roles: string[],
    mode: "each" | "digest" | "none" | null,
  ) => ({
    id: "p",
    email: "p@example.test",
    roles,
    mode,
  });
  it("tells buyers each alert by default, admins only when they opt in", () => {
    expect(alertModeOf(person(["buyer"], null))).toBe("each");
    expect(alertModeOf(person(["buyer"], "digest"))).toBe("digest");
    expect(alertModeOf(person(["admin"], null))).toBe("none");
    expect(alertModeOf(person(["admin"], "each"))).toBe("each");
    // A storekeeper's stored choice does not make them a recipient.
    expect(alertModeOf(person(["storekeeper"], "each"))).toBe("none");
  });
});

describe("the e-mails", () => {
  it("names the item, the figures, the best offer and the build orders waiting", () => {
    const mail = alertMail({
      sku: "CU-050",
      name: "Enamelled copper 0.50 mm",
      unit: "kg",
      available: 2_500n,
      reorderPoint: 5_000n,
      reorderQuantity: 25_000n,
      bestOffer: {
        supplier: "Aster Wire",
        supplierSku: "AW-050",
        unitPrice: 12.5,
        currency: "EUR",
      },
      unpricedOffers: [],
      buildOrders: [{ id: 7, status: "in_progress", stillNeeded: 1_200n }],
      itemUrl: "http://localhost:3000/stock/items/CU-050",
    });
    expect(mail.subject).toBe("Low stock: CU-050 Enamelled copper 0.50 mm");
    expect(mail.text).toContain("Available now: 2.500 kg");
    expect(mail.text).toContain("Reorder point: 5.000 kg");
    expect(mail.text).toContain("Suggested order: 25.000 kg");
    expect(mail.text).toContain(
      "Aster Wire, their SKU AW-050, 12.5000 EUR per kg",
    );
    expect(mail.text).toContain("#7 (in progress, 1.200 kg still to issue)");
  });

  it("writes pieces as words: per piece, 1 piece, 3 pieces", () => {
    const mail = alertMail({
      sku: "BR-608",
      name: "Bearing 608",
      unit: "pcs",
      available: 1_000n,
      reorderPoint: 4_000n,
      reorderQuantity: 3_000n,
      bestOffer: {
        supplier: "Lund Parts",
        supplierSku: "LP-608",
        unitPrice: 1.5,
        currency: "EUR",
      },
      unpricedOffers: [],
      buildOrders: [{ id: 9, status: "reserved", stillNeeded: 1_000n }],
      itemUrl: "http://localhost:3000/stock/items/BR-608",
    });
    expect(mail.text).toContain(
      "Available now: 1 piece (on hand less reserved)",
    );
    expect(mail.text).toContain("Reorder point: 4 pieces");
    // Shortfall 4 − 1 = 3 equals the reorder quantity of 3.
    expect(mail.text).toContain("Suggested order: 3 pieces");
    expect(mail.text).toContain(
      "Lund Parts, their SKU LP-608, 1.5000 EUR per piece",
    );
    expect(mail.text).toContain("#9 (reserved, 1 piece still to issue)");
    expect(mail.text).not.toMatch(/\bpcs\b/);
  });

  it("lists each reason an offer cannot be priced on a line of its own", () => {
    const mail = alertMail({
      sku: "CU-050",
      name: "Enamelled copper 0.50 mm",
      unit: "kg",
      available: 9_500n,
      reorderPoint: 10_000n,
      reorderQuantity: 0n,
      bestOffer: null,
      unpricedOffers: [
        {
          supplier: "Kiso Wire",
          supplierSku: "KW-050",
          reasons: [
            "no copper base price in JPY on or before 2026-01-20",
            "no JPY to EUR rate on or before 2026-01-20",
          ],
        },
      ],
      buildOrders: [],
      itemUrl: "http://localhost:3000/stock/items/CU-050",
    });
    expect(mail.text).toContain(
      "No supplier's price can be worked out for that quantity.",
    );
    expect(mail.text).not.toContain("No supplier quotes");
    expect(mail.text).toContain(
      "- Kiso Wire, their SKU KW-050: no copper base price in JPY on or before 2026-01-20\n- Kiso Wire, their SKU KW-050: no JPY to EUR rate on or before 2026-01-20",
    );
  });

  it("lists every open alert in the digest", () => {
    const mail = digestMail(
      [
        {
          sku: "A",
          name: "One",
          unit: "pcs",
          available: 2_000n,
          reorderPoint: 10_000n,
          openedAt: new Date("2026-12-01T08:00:00Z"),
        },
        {
          sku: "B",
          name: "Two",
          unit: "kg",
          available: 0n,
          reorderPoint: 1_500n,
          openedAt: new Date("2026-11-30T08:00:00Z"),
        },
      ],
      "http://localhost:3000/alerts",
    );
    expect(mail.subject).toBe("Low stock digest: 2 items below reorder point");
    expect(mail.text).toContain(
      "- A One: 2 pieces available, reorder point 10 pieces (low since 2026-12-01)",
    );
    expect(mail.text).toContain(
      "- B Two: 0.000 kg available, reorder point 1.500 kg",
    );
  });
});

describe("the purchase request CSV", () => {
  it("prices each line exactly and neutralises formula-like text", () => {
    const csv = purchaseRequestCsv([
      {
        sku: "CU-050",
        name: '=HYPERLINK("x")',
        supplierSku: "AW-050",
        quantity: 25_000n,
        unit: "kg",
        unitPrice: 125_000n,
        currency: "EUR",
      },
      {
        sku: "BR-608",
        name: "Bearing",
        supplierSku: "+608",
        quantity: 3_000n,
        unit: "pcs",
        unitPrice: 3_333n,
        currency: "EUR",
      },
    ]);
    const parsed = Papa.parse<string[]>(csv.replace(/^\uFEFF/, "").trim()).data;
    expect(parsed[0]).toEqual([
      "our_sku",
      "description",
      "supplier_sku",
      "quantity",
      "unit",
      "unit_price",
      "currency",
      "line_total",
    ]);
    // 25 kg × 12.5000 = 312.50 (by hand).
    expect(parsed[1]).toEqual([
      "CU-050",
      '\'=HYPERLINK("x")',
      "AW-050",
      "25",
      "kg",
      "12.5",
      "EUR",
      "312.5",
    ]);
    // 3 × 0.3333 = 0.9999 → 1.00 to the cent, half away from zero (by hand).
    expect(parsed[2]).toEqual([
      "BR-608",
      "Bearing",
      "'+608",
      "3",
      "pcs",
      "0.3333",
      "EUR",
      "1",
    ]);
  });
});
